import { queryOptions, useQuery } from '@tanstack/react-query';
import { auditPageSchema, type AuditEntry, type AuditPage, type ReviewSubjectType } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** Audit pages read at most to find a subject's review history (200 entries each). */
const MAX_PAGES = 5;

/**
 * The review history of one subject, oldest first: its `review-submitted | -approved | -sent-back`
 * lines of the mission's audit log (which records every state change with its reason, note and,
 * for an approval, the content hash). The audit route has no subject filter, so the newest pages
 * are read and filtered here.
 */
export async function getReviewHistory(missionId: string, subjectType: ReviewSubjectType, subjectId: string, signal?: AbortSignal): Promise<AuditEntry[]> {
  const found: AuditEntry[] = [];
  let before: string | null = null;
  for (let page = 0; page < MAX_PAGES; page += 1) {
    const answer: AuditPage = await apiRequest(`/api/missions/${encodeURIComponent(missionId)}/audit`, auditPageSchema, {
      signal,
      query: { limit: '200', ...(before ? { before } : {}) },
    });
    for (const e of answer.entries) if (e.entityType === subjectType && e.entityId === subjectId && e.action.startsWith('review-')) found.push(e);
    before = answer.nextBefore;
    if (!before) break;
  }
  return found.reverse();
}

/** Query options of a review history; the only place its key is written. */
export function reviewHistoryQueryOptions(missionId: string, subjectType: ReviewSubjectType, subjectId: string, version: string | null) {
  return queryOptions({
    // The review's updatedAt is part of the key: a transition refetches the history.
    queryKey: ['review-history', missionId, subjectType, subjectId, version] as const,
    queryFn: ({ signal }) => getReviewHistory(missionId, subjectType, subjectId, signal),
    staleTime: 15_000,
  });
}

export function useReviewHistory(missionId: string, subjectType: ReviewSubjectType, subjectId: string, version: string | null) {
  return useQuery(reviewHistoryQueryOptions(missionId, subjectType, subjectId, version));
}
