import { queryOptions, useQuery } from '@tanstack/react-query';
import { runEventsSchema, type RunEvents } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/runs/:runId/events`: eclipse edges, node and radius crossings. */
export function getPlaybackEvents(missionId: string, runId: string, signal?: AbortSignal): Promise<RunEvents> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/runs/${encodeURIComponent(runId)}/events`, runEventsSchema, { signal });
}

/** Query options of a run's events for the playback's time strip; the only place its key is written. */
export function playbackEventsQueryOptions(missionId: string, runId: string) {
  return queryOptions({
    queryKey: ['runs', missionId, runId, 'playback-events'] as const,
    queryFn: ({ signal }) => getPlaybackEvents(missionId, runId, signal),
    staleTime: Infinity,
  });
}

/** A run's located events. */
export function usePlaybackEvents(missionId: string, runId: string) {
  return useQuery(playbackEventsQueryOptions(missionId, runId));
}
