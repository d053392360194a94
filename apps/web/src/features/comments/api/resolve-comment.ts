import { useMutation, useQueryClient } from '@tanstack/react-query';
import { commentSchema, type Comment } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { commentsPath, commentsQueryOptions } from './list-comments';

/** `POST .../comments/:commentId/resolve`: resolve or reopen. */
export function resolveComment(missionId: string, commentId: string, resolved: boolean): Promise<Comment> {
  return apiRequest(`${commentsPath(missionId)}/${encodeURIComponent(commentId)}/resolve`, commentSchema, { method: 'POST', body: { resolved } });
}

export function useResolveComment(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ commentId, resolved }: { commentId: string; resolved: boolean }) => resolveComment(missionId, commentId, resolved),
    onSuccess: async (comment) => {
      await queryClient.invalidateQueries({ queryKey: commentsQueryOptions(missionId, comment.subjectType, comment.subjectId).queryKey });
    },
  });
}
