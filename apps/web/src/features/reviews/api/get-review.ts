import { queryOptions, useQuery } from '@tanstack/react-query';
import { reviewSchema, type Review, type ReviewSubjectType } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** API path of one subject's review. */
export function reviewPath(missionId: string, subjectType: ReviewSubjectType, subjectId: string): string {
  return `/api/missions/${encodeURIComponent(missionId)}/reviews/${subjectType}/${encodeURIComponent(subjectId)}`;
}

/** `GET .../reviews/:subjectType/:subjectId`: the review state (draft when never submitted). */
export function getReview(missionId: string, subjectType: ReviewSubjectType, subjectId: string, signal?: AbortSignal): Promise<Review> {
  return apiRequest(reviewPath(missionId, subjectType, subjectId), reviewSchema, { signal });
}

/** Query options of a review; the only place its key is written. */
export function reviewQueryOptions(missionId: string, subjectType: ReviewSubjectType, subjectId: string) {
  return queryOptions({
    queryKey: ['reviews', missionId, subjectType, subjectId] as const,
    queryFn: ({ signal }) => getReview(missionId, subjectType, subjectId, signal),
    staleTime: 15_000,
  });
}

export function useReview(missionId: string, subjectType: ReviewSubjectType, subjectId: string) {
  return useQuery(reviewQueryOptions(missionId, subjectType, subjectId));
}
