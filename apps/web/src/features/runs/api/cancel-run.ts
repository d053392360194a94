import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runSchema, type Run } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runQueryOptions } from './get-run';
import { runListKeyPrefix } from './list-runs';
import { runPath } from './run-path';

/** `POST .../runs/:runId/cancel`: a queued run stops at once, a running one within about a second (409 when finished). */
export function cancelRun(missionId: string, runId: string): Promise<Run> {
  return apiRequest(`${runPath(missionId, runId)}/cancel`, runSchema, { method: 'POST' });
}

/** Cancels the run; the answer replaces the cached run at once. */
export function useCancelRun(missionId: string, runId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelRun(missionId, runId),
    onSuccess: (run) => {
      queryClient.setQueryData(runQueryOptions(missionId, runId).queryKey, run);
      return queryClient.invalidateQueries({ queryKey: runListKeyPrefix(missionId) });
    },
  });
}
