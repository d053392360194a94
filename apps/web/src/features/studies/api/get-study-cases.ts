import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { studyCasePageSchema, type StudyCase, type StudyCasePage, type StudyCaseStatus } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studyPath } from './study-path';

/** What the case table asks for. */
export interface CaseTableQuery {
  sort: string;
  dir: 'asc' | 'desc';
  status?: StudyCaseStatus | undefined;
  line?: string | undefined;
  min?: string | undefined;
  max?: string | undefined;
  limit?: number;
}

export const caseQueryParams = (q: CaseTableQuery): Record<string, string | undefined> => ({
  sort: q.sort,
  dir: q.dir,
  status: q.status,
  line: q.min || q.max ? q.line : undefined,
  min: q.min || undefined,
  max: q.max || undefined,
  ...(q.limit ? { limit: String(q.limit) } : {}),
});

/** A case row; its id is the subject of comments on the case (subjectType 'case'). */
export type StudyCaseRow = StudyCase;
const casePageSchema = studyCasePageSchema;
export type StudyCaseRowPage = StudyCasePage;

/** `GET .../studies/:studyId/cases`: sorted and filtered case table. */
export function getStudyCases(missionId: string, studyId: string, q: CaseTableQuery, signal?: AbortSignal): Promise<StudyCaseRowPage> {
  return apiRequest(`${studyPath(missionId, studyId)}/cases`, casePageSchema, { signal, query: caseQueryParams(q) });
}

export function studyCasesQueryOptions(missionId: string, studyId: string, q: CaseTableQuery, refreshMs: number | false) {
  return queryOptions({
    queryKey: [...studyKeyPrefix(missionId), 'cases', studyId, q] as const,
    queryFn: ({ signal }) => getStudyCases(missionId, studyId, q, signal),
    placeholderData: keepPreviousData,
    refetchInterval: refreshMs,
  });
}

export function useStudyCases(missionId: string, studyId: string, q: CaseTableQuery, refreshMs: number | false) {
  return useQuery(studyCasesQueryOptions(missionId, studyId, q, refreshMs));
}
