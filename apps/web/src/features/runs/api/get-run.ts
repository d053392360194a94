import { queryOptions, useQuery } from '@tanstack/react-query';
import { runSchema, type Run } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { isRunActive } from './list-runs';
import { runPath } from './run-path';

/** `GET /api/missions/:missionId/runs/:runId`: status, progress (0..1), timings, error, worker. */
export function getRun(missionId: string, runId: string, signal?: AbortSignal): Promise<Run> {
  return apiRequest(runPath(missionId, runId), runSchema, { signal });
}

/** Milliseconds between refreshes of a queued or running run. */
export const RUN_POLL_MS = 1000;

/** Query options of one run, polled every second while queued or running; the only place its key is written. */
export function runQueryOptions(missionId: string, runId: string) {
  return queryOptions({
    queryKey: ['runs', 'detail', missionId, runId] as const,
    queryFn: ({ signal }) => getRun(missionId, runId, signal),
    refetchInterval: (query) => (query.state.data && isRunActive(query.state.data) ? RUN_POLL_MS : false),
  });
}

/** One run, live while it is queued or running. */
export function useRun(missionId: string, runId: string) {
  return useQuery(runQueryOptions(missionId, runId));
}
