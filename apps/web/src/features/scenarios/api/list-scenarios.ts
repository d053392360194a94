import { queryOptions, useQuery } from '@tanstack/react-query';
import { scenarioListSchema, type ScenarioList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/scenarios`: the mission's scenarios, by name. */
export function listScenarios(missionId: string, signal?: AbortSignal): Promise<ScenarioList> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/scenarios`, scenarioListSchema, { signal });
}

/** Query options of a mission's scenario list; the only place its key is written. */
export function scenariosQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'scenarios', 'list'] as const,
    queryFn: ({ signal }) => listScenarios(missionId, signal),
  });
}

/** The scenarios of a mission. */
export function useScenarios(missionId: string) {
  return useQuery(scenariosQueryOptions(missionId));
}
