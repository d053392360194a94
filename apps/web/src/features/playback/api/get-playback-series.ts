import { queryOptions, useQuery } from '@tanstack/react-query';
import { seriesSchema, type Series } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** What the playback asks of `GET .../series`. */
export interface PlaybackSeriesRequest {
  missionId: string;
  runId: string;
  /** Column names, at most 16. */
  columns: readonly string[];
  /** Points per column at most (4 to 20000). */
  maxPoints: number;
}

/** `GET /api/missions/:missionId/runs/:runId/series`: decimated columns of a succeeded run. */
export function getPlaybackSeries(request: PlaybackSeriesRequest, signal?: AbortSignal): Promise<Series> {
  const { missionId, runId, columns, maxPoints } = request;
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/runs/${encodeURIComponent(runId)}/series`, seriesSchema, {
    query: { columns: columns.join(','), maxPoints: String(maxPoints) },
    signal,
  });
}

/** Query options of the playback's series; the only place its key is written. A succeeded run never changes. */
export function playbackSeriesQueryOptions(request: PlaybackSeriesRequest) {
  return queryOptions({
    queryKey: ['runs', request.missionId, request.runId, 'playback-series', request.columns.join(','), request.maxPoints] as const,
    queryFn: ({ signal }) => getPlaybackSeries(request, signal),
    staleTime: Infinity,
  });
}

/** The columns the 3D playback draws. */
export function usePlaybackSeries(request: PlaybackSeriesRequest) {
  return useQuery(playbackSeriesQueryOptions(request));
}
