import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runSchema, type Run } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runListKeyPrefix } from './list-runs';

/** `POST /api/missions/:missionId/runs`: queues a run of a scenario (snapshot of the scenario and its vehicle revision). */
export function startRun(missionId: string, scenarioId: string): Promise<Run> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/runs`, runSchema, {
    method: 'POST',
    body: { scenarioId },
  });
}

/** Starts a run; refreshes the mission's run lists when it is queued. */
export function useStartRun(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (scenarioId: string) => startRun(missionId, scenarioId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runListKeyPrefix(missionId) }),
  });
}
