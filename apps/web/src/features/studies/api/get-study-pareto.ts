import { queryOptions, useQuery } from '@tanstack/react-query';
import { studyParetoSchema, type StudyPareto } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studyPath } from './study-path';

export interface ParetoQuery {
  x: string;
  xDir: 'min' | 'max';
  y: string;
  yDir: 'min' | 'max';
}

/** `GET .../studies/:studyId/pareto`: the non-dominated cases for two lines. */
export function getStudyPareto(missionId: string, studyId: string, q: ParetoQuery, signal?: AbortSignal): Promise<StudyPareto> {
  return apiRequest(`${studyPath(missionId, studyId)}/pareto`, studyParetoSchema, { signal, query: { ...q } });
}

export function studyParetoQueryOptions(missionId: string, studyId: string, q: ParetoQuery, refreshMs: number | false) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'pareto', studyId, q] as const,
    queryFn: ({ signal }) => getStudyPareto(missionId, studyId, q, signal),
    refetchInterval: refreshMs,
  });
}

export function useStudyPareto(missionId: string, studyId: string, q: ParetoQuery, refreshMs: number | false) {
  return useQuery(studyParetoQueryOptions(missionId, studyId, q, refreshMs));
}
