import { queryOptions, useQuery } from '@tanstack/react-query';
import { coefficientTableSummarySchema, type CoefficientTableSummary } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { coefficientTableApiPath } from './mesh-paths';

/** `GET /api/missions/:missionId/coefficient-tables/:tableId`: status, progress, chunks, cost. */
export function getCoefficientTable(missionId: string, tableId: string, signal?: AbortSignal): Promise<CoefficientTableSummary> {
  return apiRequest(coefficientTableApiPath(missionId, tableId), coefficientTableSummarySchema, { signal });
}

/** Milliseconds between refreshes of a queued or running table. */
export const TABLE_POLL_MS = 1000;

/** Whether a table is still being computed. */
export function isTableActive(table: Pick<CoefficientTableSummary, 'status'>): boolean {
  return table.status === 'queued' || table.status === 'running';
}

/** Query options of one table, polled every second while queued or running; the only place its key is written. */
export function coefficientTableQueryOptions(missionId: string, tableId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'coefficient-tables', 'detail', tableId] as const,
    queryFn: ({ signal }) => getCoefficientTable(missionId, tableId, signal),
    refetchInterval: (query) => (query.state.data && isTableActive(query.state.data) ? TABLE_POLL_MS : false),
  });
}

/** One coefficient table, live while it is computed. */
export function useCoefficientTable(
  missionId: string,
  tableId: string,
  options: { initialData?: CoefficientTableSummary | undefined; enabled?: boolean } = {},
) {
  return useQuery({
    ...coefficientTableQueryOptions(missionId, tableId),
    enabled: options.enabled ?? true,
    ...(options.initialData ? { initialData: options.initialData, initialDataUpdatedAt: 0 } : {}),
  });
}
