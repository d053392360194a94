import { useMutation, useQueryClient } from '@tanstack/react-query';
import { coefficientTableSummarySchema, type CoefficientTableSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { coefficientTableQueryOptions } from './get-coefficient-table';
import { coefficientTableApiPath } from './mesh-paths';

/** `POST /api/missions/:missionId/coefficient-tables/:tableId/cancel`: stops the table's queued chunks. */
export function cancelCoefficientTable(missionId: string, tableId: string): Promise<CoefficientTableSummary> {
  return apiRequest(`${coefficientTableApiPath(missionId, tableId)}/cancel`, coefficientTableSummarySchema, { method: 'POST' });
}

/** Cancels a table; its query takes the answer. */
export function useCancelCoefficientTable(missionId: string, tableId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelCoefficientTable(missionId, tableId),
    onSuccess: (table) => queryClient.setQueryData(coefficientTableQueryOptions(missionId, table.id).queryKey, table),
  });
}
