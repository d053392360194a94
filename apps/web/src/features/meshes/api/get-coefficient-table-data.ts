import { queryOptions, useQuery } from '@tanstack/react-query';
import { coefficientTableDataSchema, type CoefficientTableData } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { coefficientTableApiPath } from './mesh-paths';

/** `GET .../coefficient-tables/:tableId/data`: force and torque per unit pressure at every grid node (succeeded tables). */
export function getCoefficientTableData(missionId: string, tableId: string, signal?: AbortSignal): Promise<CoefficientTableData> {
  return apiRequest(`${coefficientTableApiPath(missionId, tableId)}/data`, coefficientTableDataSchema, { signal });
}

/** Query options of a table's values (never change once succeeded); the only place its key is written. */
export function coefficientTableDataQueryOptions(missionId: string, tableId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'coefficient-tables', 'data', tableId] as const,
    queryFn: ({ signal }) => getCoefficientTableData(missionId, tableId, signal),
    staleTime: Infinity,
  });
}

/** A succeeded table's values; `enabled` false until it has succeeded. */
export function useCoefficientTableData(missionId: string, tableId: string, enabled: boolean) {
  return useQuery({ ...coefficientTableDataQueryOptions(missionId, tableId), enabled });
}
