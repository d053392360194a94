import { useMutation, useQueryClient } from '@tanstack/react-query';
import { reviewSchema, type Review, type ReviewAction, type ReviewSubjectType } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { reviewPath, reviewQueryOptions } from './get-review';

/** `POST .../submit | approve | send-back`: one transition (send-back needs `reason`). */
export function transitionReview(
  missionId: string,
  subjectType: ReviewSubjectType,
  subjectId: string,
  action: ReviewAction,
  body: { note?: string; reason?: string },
): Promise<Review> {
  return apiRequest(`${reviewPath(missionId, subjectType, subjectId)}/${action}`, reviewSchema, { method: 'POST', body });
}

/** A transition; the answer replaces the cached review. */
export function useTransitionReview(missionId: string, subjectType: ReviewSubjectType, subjectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ action, body }: { action: ReviewAction; body: { note?: string; reason?: string } }) =>
      transitionReview(missionId, subjectType, subjectId, action, body),
    onSuccess: (review) => {
      queryClient.setQueryData(reviewQueryOptions(missionId, subjectType, subjectId).queryKey, review);
    },
  });
}
