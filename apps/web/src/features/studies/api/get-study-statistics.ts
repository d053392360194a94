import { queryOptions, useQuery } from '@tanstack/react-query';
import { studyStatisticsSchema, type StudyStatistics } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studyPath } from './study-path';

/** `GET .../studies/:studyId/statistics`: mean, SD, p95, p99 of the compared lines. */
export function getStudyStatistics(missionId: string, studyId: string, signal?: AbortSignal): Promise<StudyStatistics> {
  return apiRequest(`${studyPath(missionId, studyId)}/statistics`, studyStatisticsSchema, { signal });
}

export function studyStatisticsQueryOptions(missionId: string, studyId: string, refreshMs: number | false) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'statistics', studyId] as const,
    queryFn: ({ signal }) => getStudyStatistics(missionId, studyId, signal),
    refetchInterval: refreshMs,
  });
}

export function useStudyStatistics(missionId: string, studyId: string, refreshMs: number | false) {
  return useQuery(studyStatisticsQueryOptions(missionId, studyId, refreshMs));
}
