import { queryOptions, useQuery } from '@tanstack/react-query';
import { studyListSchema, type StudyList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { STUDY_POLL_MS, studiesPath } from './study-path';

/** `GET /api/missions/:missionId/studies`: studies with progress, newest first. */
export function listStudies(missionId: string, signal?: AbortSignal): Promise<StudyList> {
  return apiRequest(studiesPath(missionId), studyListSchema, { signal });
}

/** Key prefix of everything about a mission's studies (invalidated after a create or cancel). */
export const studyKeyPrefix = (missionId: string) => ['missions', missionId, 'studies'] as const;

export function studiesQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'list'] as const,
    queryFn: ({ signal }) => listStudies(missionId, signal),
    refetchInterval: (query) => (query.state.data?.studies.some((s) => s.status === 'running' || s.status === 'cancelling') ? STUDY_POLL_MS * 3 : false),
  });
}

/** The studies of a mission, refreshed while one is running. */
export function useStudies(missionId: string) {
  return useQuery(studiesQueryOptions(missionId));
}
