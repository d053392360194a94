import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { MAX_SERIES_POINTS, seriesSchema, type Series } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { runPath } from './run-path';

/** What to ask the series route for. */
export interface SeriesRequest {
  /** Stored or derived column names (at most 16). */
  columns: readonly string[];
  /** Points per column at most (4..20000); the API keeps each bucket's minimum and maximum. */
  maxPoints: number;
}

/** Points to ask for a chart `widthPx` wide: two per pixel (a minimum and a maximum), in steps of 500. */
export function pointsForWidth(widthPx: number): number {
  const wanted = Math.ceil((2 * Math.max(200, widthPx)) / 500) * 500;
  return Math.min(MAX_SERIES_POINTS, wanted);
}

/** `GET .../runs/:runId/series`: decimated columns for charts. */
export function getRunSeries(missionId: string, runId: string, request: SeriesRequest, signal?: AbortSignal): Promise<Series> {
  return apiRequest(`${runPath(missionId, runId)}/series`, seriesSchema, {
    query: { columns: request.columns.join(','), maxPoints: String(Math.round(request.maxPoints)) },
    signal,
  });
}

/** Query options of some series of a run (immutable once stored); the only place its key is written. */
export function runSeriesQueryOptions(missionId: string, runId: string, request: SeriesRequest) {
  return queryOptions({
    queryKey: ['runs', 'series', missionId, runId, request.columns.join(','), request.maxPoints] as const,
    queryFn: ({ signal }) => getRunSeries(missionId, runId, request, signal),
    staleTime: Infinity,
    // A wider window asks for more points; the chart keeps the coarser ones meanwhile.
    placeholderData: keepPreviousData,
  });
}

/** Decimated series of a succeeded run; `enabled: false` until the chart knows its width. */
export function useRunSeries(missionId: string, runId: string, request: SeriesRequest, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...runSeriesQueryOptions(missionId, runId, request), enabled });
}
