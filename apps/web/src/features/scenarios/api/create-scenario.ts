import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioDetailSchema, type ScenarioBody, type ScenarioDetail } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { scenarioQueryOptions } from './get-scenario';
import { scenariosQueryOptions } from './list-scenarios';

/** `POST /api/missions/:missionId/scenarios`: a new scenario (201); 400 with field errors when refused. */
export function createScenario(missionId: string, body: ScenarioBody): Promise<ScenarioDetail> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/scenarios`, scenarioDetailSchema, {
    method: 'POST',
    body,
  });
}

/** Creates a scenario, then caches it and refreshes the mission's list. */
export function useCreateScenario(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ScenarioBody) => createScenario(missionId, body),
    onSuccess: async (scenario) => {
      queryClient.setQueryData(scenarioQueryOptions(missionId, scenario.id).queryKey, scenario);
      await queryClient.invalidateQueries({ queryKey: scenariosQueryOptions(missionId).queryKey });
    },
  });
}
