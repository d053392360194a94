import { Router } from 'express';
import { commentCreateSchema, commentEditSchema, commentListQuerySchema, commentParamsSchema, commentResolveSchema, missionParamsSchema } from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { createComment, editComment, listComments, resolveComment } from '../services/comment-service';
import { notifyMentioned } from '../services/mail-service';
import type { RouteContext } from './route-context';

/** Threaded comments on studies, cases and budget lines. Expects `requireUser` in front. */
export function commentRoutes(ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/comments', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const query = parseInput(commentListQuerySchema, req.query, 'query');
    res.json({ comments: await listComments(currentUser(res), missionId, query) });
  });

  router.post('/missions/:missionId/comments', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const input = parseInput(commentCreateSchema, req.body, 'body');
    const user = currentUser(res);
    const { comment, mentioned } = await createComment(user, missionId, input);
    const where = input.subjectType === 'budget' ? `a budget${input.lineKey ? ` (line ${input.lineKey})` : ''}` : `a ${input.subjectType === 'case' ? 'study case' : 'trade study'}`;
    await notifyMentioned(ctx.config, ctx.jobs, { missionId, recipients: mentioned.map((m) => m.email), author: user.displayName, where, body: input.body });
    res.status(201).json(comment);
  });

  router.put('/missions/:missionId/comments/:commentId', async (req, res) => {
    const { missionId, commentId } = parseInput(commentParamsSchema, req.params, 'path');
    const { body } = parseInput(commentEditSchema, req.body, 'body');
    res.json(await editComment(currentUser(res), missionId, commentId, body));
  });

  router.post('/missions/:missionId/comments/:commentId/resolve', async (req, res) => {
    const { missionId, commentId } = parseInput(commentParamsSchema, req.params, 'path');
    const { resolved } = parseInput(commentResolveSchema, req.body, 'body');
    res.json(await resolveComment(currentUser(res), missionId, commentId, resolved));
  });

  return router;
}
