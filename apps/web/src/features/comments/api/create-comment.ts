import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema, type Comment, type CommentCreate } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { commentsPath, commentsQueryOptions } from './list-comments';

/** `POST /api/missions/:missionId/comments`: a comment or a reply. */
export function createComment(missionId: string, input: CommentCreate): Promise<Comment> {
  return apiRequest(commentsPath(missionId), commentSchema, { method: 'POST', body: input });
}

export function useCreateComment(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CommentCreate) => createComment(missionId, input),
    onSuccess: async (comment) => {
      await queryClient.invalidateQueries({ queryKey: commentsQueryOptions(missionId, comment.subjectType, comment.subjectId).queryKey });
    },
  });
}
