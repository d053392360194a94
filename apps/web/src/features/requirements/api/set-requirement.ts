import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  missionRequirementSchema,
  type BudgetLineKey,
  type MissionRequirement,
  type RequirementUpsert,
} from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { requirementsQueryOptions } from './list-requirements';

/** What a lead sends for one line (the line itself is in the path). */
export type RequirementInput = Omit<RequirementUpsert, 'line'>;

/** `PUT /api/missions/:missionId/requirements/:line`: sets or replaces a line's requirement (leads only). */
export function setRequirement(missionId: string, line: BudgetLineKey, input: RequirementInput): Promise<MissionRequirement> {
  return apiRequest(
    `/api/missions/${encodeURIComponent(missionId)}/requirements/${encodeURIComponent(line)}`,
    missionRequirementSchema,
    { method: 'PUT', body: input },
  );
}

/** Sets a requirement, then refreshes the mission's list (and so every budget read after it). */
export function useSetRequirement(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ line, input }: { line: BudgetLineKey; input: RequirementInput }) => setRequirement(missionId, line, input),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: requirementsQueryOptions(missionId).queryKey });
    },
  });
}
