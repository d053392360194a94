import { queryOptions, useQuery } from '@tanstack/react-query';
import { studySchema, type Study } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { STUDY_POLL_MS, studyPath } from './study-path';

/** `GET .../studies/:studyId`: definition, status and progress. */
export function getStudy(missionId: string, studyId: string, signal?: AbortSignal): Promise<Study> {
  return apiRequest(studyPath(missionId, studyId), studySchema, { signal });
}

export const isStudyActive = (study: Study) => study.status === 'running' || study.status === 'cancelling';

export function studyQueryOptions(missionId: string, studyId: string) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'detail', studyId] as const,
    queryFn: ({ signal }) => getStudy(missionId, studyId, signal),
    refetchInterval: (query) => (query.state.data && isStudyActive(query.state.data) ? STUDY_POLL_MS : false),
  });
}

/** One study, polled every second while it has cases to compute. */
export function useStudy(missionId: string, studyId: string) {
  return useQuery(studyQueryOptions(missionId, studyId));
}
