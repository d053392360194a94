import { queryOptions, useQuery } from '@tanstack/react-query';
import { commentListSchema, type CommentList, type CommentSubjectType } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

export const commentsPath = (missionId: string) => `/api/missions/${encodeURIComponent(missionId)}/comments`;

/** `GET /api/missions/:missionId/comments`: comments on one subject, oldest first. */
export function listComments(missionId: string, subjectType: CommentSubjectType, subjectId: string, signal?: AbortSignal): Promise<CommentList> {
  return apiRequest(commentsPath(missionId), commentListSchema, { signal, query: { subjectType, subjectId } });
}

/** Query options of a subject's comments; the only place their key is written. */
export function commentsQueryOptions(missionId: string, subjectType: CommentSubjectType, subjectId: string) {
  return queryOptions({
    queryKey: ['comments', missionId, subjectType, subjectId] as const,
    queryFn: ({ signal }) => listComments(missionId, subjectType, subjectId, signal),
    staleTime: 15_000,
  });
}

export function useComments(missionId: string, subjectType: CommentSubjectType, subjectId: string) {
  return useQuery(commentsQueryOptions(missionId, subjectType, subjectId));
}
