import { queryOptions, useQuery } from '@tanstack/react-query';
import { studyBestSchema, type StudyBest } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studyPath } from './study-path';

/** `GET .../studies/:studyId/best`: the best succeeded case for one line. */
export function getStudyBest(missionId: string, studyId: string, line: string, dir: 'min' | 'max', signal?: AbortSignal): Promise<StudyBest> {
  return apiRequest(`${studyPath(missionId, studyId)}/best`, studyBestSchema, { signal, query: { line, dir } });
}

export function studyBestQueryOptions(missionId: string, studyId: string, line: string, dir: 'min' | 'max', refreshMs: number | false) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'best', studyId, line, dir] as const,
    queryFn: ({ signal }) => getStudyBest(missionId, studyId, line, dir, signal),
    refetchInterval: refreshMs,
  });
}

export function useStudyBest(missionId: string, studyId: string, line: string, dir: 'min' | 'max', refreshMs: number | false) {
  return useQuery(studyBestQueryOptions(missionId, studyId, line, dir, refreshMs));
}
