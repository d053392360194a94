import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioDetailSchema, type ScenarioBody, type ScenarioDetail } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { scenarioQueryOptions } from './get-scenario';
import { scenariosQueryOptions } from './list-scenarios';

/** `PUT /api/missions/:missionId/scenarios/:scenarioId`: replaces the scenario (runs keep their snapshot). */
export function updateScenario(missionId: string, scenarioId: string, body: ScenarioBody): Promise<ScenarioDetail> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/scenarios/${encodeURIComponent(scenarioId)}`,
    scenarioDetailSchema,
    { method: 'PUT', body },
  );
}

/** Saves a scenario, then caches the answer and refreshes the mission's list. */
export function useUpdateScenario(missionId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ScenarioBody) => updateScenario(missionId, scenarioId, body),
    onSuccess: async (scenario) => {
      queryClient.setQueryData(scenarioQueryOptions(missionId, scenarioId).queryKey, scenario);
      await queryClient.invalidateQueries({ queryKey: scenariosQueryOptions(missionId).queryKey });
    },
  });
}
