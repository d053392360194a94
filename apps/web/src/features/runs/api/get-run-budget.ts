import { queryOptions, useQuery } from '@tanstack/react-query';
import { runBudgetReportSchema, type RunBudgetReport } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runPath } from './run-path';

/** `GET .../runs/:runId/budget`: the budget of a succeeded run with the mission's current requirements (409 while not succeeded). */
export function getRunBudget(missionId: string, runId: string, signal?: AbortSignal): Promise<RunBudgetReport> {
  return apiRequest(`${runPath(missionId, runId)}/budget`, runBudgetReportSchema, { signal });
}

/** Query options of a run's budget; the only place its key is written. */
export function runBudgetQueryOptions(missionId: string, runId: string) {
  return queryOptions({
    queryKey: ['runs', 'budget', missionId, runId] as const,
    queryFn: ({ signal }) => getRunBudget(missionId, runId, signal),
    // Requirements can change under a finished run; a minute is fresh enough.
    staleTime: 60_000,
  });
}

/** A succeeded run's budget; pass `enabled: false` while the run is not succeeded. */
export function useRunBudget(missionId: string, runId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...runBudgetQueryOptions(missionId, runId), enabled });
}
