import { queryOptions, useQuery } from '@tanstack/react-query';
import { runEventsSchema, type RunEvents } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runPath } from './run-path';

/** `GET .../runs/:runId/events`: located events (eclipse edges, node and radius crossings) in time order. */
export function getRunEvents(missionId: string, runId: string, signal?: AbortSignal): Promise<RunEvents> {
  return apiRequest(`${runPath(missionId, runId)}/events`, runEventsSchema, { signal });
}

/** Query options of a run's events (immutable once stored); the only place its key is written. */
export function runEventsQueryOptions(missionId: string, runId: string) {
  return queryOptions({
    queryKey: ['runs', 'events', missionId, runId] as const,
    queryFn: ({ signal }) => getRunEvents(missionId, runId, signal),
    staleTime: Infinity,
  });
}

/** A succeeded run's events; pass `enabled: false` until the run has succeeded. */
export function useRunEvents(missionId: string, runId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...runEventsQueryOptions(missionId, runId), enabled });
}
