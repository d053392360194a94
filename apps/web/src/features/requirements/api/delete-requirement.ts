import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BudgetLineKey } from '@photon-ledger/shared';
import { apiRequestNoContent } from '../../../lib/api-client';
import { requirementsQueryOptions } from './list-requirements';

/** `DELETE /api/missions/:missionId/requirements/:line`: the line no longer has a requirement (leads only). */
export function deleteRequirement(missionId: string, line: BudgetLineKey): Promise<void> {
  return apiRequestNoContent(
    `/api/missions/${encodeURIComponent(missionId)}/requirements/${encodeURIComponent(line)}`,
    { method: 'DELETE' },
  );
}

/** Removes a requirement, then refreshes the mission's list. */
export function useDeleteRequirement(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (line: BudgetLineKey) => deleteRequirement(missionId, line),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: requirementsQueryOptions(missionId).queryKey });
    },
  });
}
