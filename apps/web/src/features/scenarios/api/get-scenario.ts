import { queryOptions, useQuery } from '@tanstack/react-query';
import { scenarioDetailSchema, type ScenarioDetail } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/scenarios/:scenarioId`: one scenario with its spec; 404 when unknown. */
export function getScenario(missionId: string, scenarioId: string, signal?: AbortSignal): Promise<ScenarioDetail> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/scenarios/${encodeURIComponent(scenarioId)}`,
    scenarioDetailSchema,
    { signal },
  );
}

/** Query options of one scenario; the only place its key is written. */
export function scenarioQueryOptions(missionId: string, scenarioId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'scenarios', 'detail', scenarioId] as const,
    queryFn: ({ signal }) => getScenario(missionId, scenarioId, signal),
  });
}

/** One scenario with its spec. */
export function useScenario(missionId: string, scenarioId: string) {
  return useQuery(scenarioQueryOptions(missionId, scenarioId));
}
