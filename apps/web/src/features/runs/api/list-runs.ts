import { queryOptions, useQuery } from '@tanstack/react-query';
import { runListSchema, type Run, type RunList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** Filters of the run list. */
export interface RunListFilter {
  /** Only runs of this scenario. */
  scenarioId?: string | undefined;
}

/** `GET /api/missions/:missionId/runs`: the mission's runs, newest first. */
export function listRuns(missionId: string, filter: RunListFilter = {}, signal?: AbortSignal): Promise<RunList> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/runs`, runListSchema, {
    query: { scenarioId: filter.scenarioId },
    signal,
  });
}

/** True while a run still waits for or holds a worker. */
export function isRunActive(run: Pick<Run, 'status'>): boolean {
  return run.status === 'queued' || run.status === 'running';
}

/** Milliseconds between refreshes while any run is queued or running. */
export const RUN_LIST_POLL_MS = 2000;

/** Query options of a mission's run list; the only place its key is written. */
export function runListQueryOptions(missionId: string, filter: RunListFilter = {}) {
  return queryOptions({
    queryKey: ['runs', 'list', missionId, { scenarioId: filter.scenarioId ?? null }] as const,
    queryFn: ({ signal }) => listRuns(missionId, filter, signal),
    refetchInterval: (query) => (query.state.data?.runs.some(isRunActive) ? RUN_LIST_POLL_MS : false),
  });
}

/** Prefix of every run-list key of a mission, to refresh them after a run starts. */
export function runListKeyPrefix(missionId: string) {
  return ['runs', 'list', missionId] as const;
}

/** A mission's runs (optionally of one scenario), refreshed every 2 s while any is queued or running. */
export function useRuns(missionId: string, filter: RunListFilter = {}) {
  return useQuery(runListQueryOptions(missionId, filter));
}
