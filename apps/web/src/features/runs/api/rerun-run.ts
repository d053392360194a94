import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runSchema, type Run } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runQueryOptions } from './get-run';
import { runListKeyPrefix } from './list-runs';
import { runPath } from './run-path';

/** `POST .../runs/:runId/rerun`: a new run from the same snapshot of scenario and vehicle revision. */
export function rerunRun(missionId: string, runId: string): Promise<Run> {
  return apiRequest(`${runPath(missionId, runId)}/rerun`, runSchema, { method: 'POST' });
}

/** Queues a re-run; the new run is put in the cache so its page opens without a wait. */
export function useRerunRun(missionId: string, runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => rerunRun(missionId, runId),
    onSuccess: (run) => {
      queryClient.setQueryData(runQueryOptions(missionId, run.id).queryKey, run);
      return queryClient.invalidateQueries({ queryKey: runListKeyPrefix(missionId) });
    },
  });
}
