import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestNoContent } from '../../../lib/api-client';
import { scenarioQueryOptions } from './get-scenario';
import { scenariosQueryOptions } from './list-scenarios';

/** `DELETE /api/missions/:missionId/scenarios/:scenarioId`: only a scenario without runs (409 otherwise). */
export function deleteScenario(missionId: string, scenarioId: string): Promise<void> {
  return apiRequestNoContent(
    `/api/missions/${encodeURIComponent(missionId)}/scenarios/${encodeURIComponent(scenarioId)}`,
    { method: 'DELETE' },
  );
}

/** Deletes a scenario, forgets it and refreshes the mission's list. */
export function useDeleteScenario(missionId: string, scenarioId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteScenario(missionId, scenarioId),
    onSuccess: async () => {
      queryClient.removeQueries({ queryKey: scenarioQueryOptions(missionId, scenarioId).queryKey });
      await queryClient.invalidateQueries({ queryKey: scenariosQueryOptions(missionId).queryKey });
    },
  });
}
