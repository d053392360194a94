import { useMutation, useQueryClient } from '@tanstack/react-query';
import { coefficientTableSummarySchema, type CoefficientTableRequest, type CoefficientTableSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { coefficientTableQueryOptions } from './get-coefficient-table';
import { meshApiPath } from './mesh-paths';

/**
 * `POST /api/missions/:missionId/meshes/:meshId/tables`: the table of these optics and settings —
 * the cached one when it exists (200), else a new one queued (201).
 */
export function requestCoefficientTable(missionId: string, meshId: string, body: CoefficientTableRequest): Promise<CoefficientTableSummary> {
  return apiRequest(`${meshApiPath(missionId, meshId)}/tables`, coefficientTableSummarySchema, { method: 'POST', body });
}

/** Asks for a coefficient table; the answer seeds that table's query. */
export function useRequestCoefficientTable(missionId: string, meshId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CoefficientTableRequest) => requestCoefficientTable(missionId, meshId, body),
    onSuccess: (table) => queryClient.setQueryData(coefficientTableQueryOptions(missionId, table.id).queryKey, table),
  });
}
