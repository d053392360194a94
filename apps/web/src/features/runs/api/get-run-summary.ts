import { queryOptions, useQuery } from '@tanstack/react-query';
import { runSummarySchema, type RunSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runPath } from './run-path';

/** `GET .../runs/:runId/summary`: what a succeeded run stored (409 while it is not succeeded). */
export function getRunSummary(missionId: string, runId: string, signal?: AbortSignal): Promise<RunSummary> {
  return apiRequest(`${runPath(missionId, runId)}/summary`, runSummarySchema, { signal });
}

/** Query options of a run's summary (immutable once stored); the only place its key is written. */
export function runSummaryQueryOptions(missionId: string, runId: string) {
  return queryOptions({
    queryKey: ['runs', 'summary', missionId, runId] as const,
    queryFn: ({ signal }) => getRunSummary(missionId, runId, signal),
    staleTime: Infinity,
  });
}

/** A succeeded run's summary; pass `enabled: false` until the run has succeeded. */
export function useRunSummary(missionId: string, runId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...runSummaryQueryOptions(missionId, runId), enabled });
}
