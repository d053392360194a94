import { Router } from 'express';
import {
  missionParamsSchema,
  reviewApproveSchema,
  reviewListQuerySchema,
  reviewParamsSchema,
  reviewSendBackSchema,
  reviewSubmitSchema,
} from '@photon-ledger/shared';
import { currentUser } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { notifyReviewDecided, notifyReviewRequested } from '../services/mail-service';
import { getReview, listReviews, transitionReview } from '../services/review-service';
import type { RouteContext } from './route-context';

const base = '/missions/:missionId/reviews/:subjectType/:subjectId';

/** Reviews and approvals of studies and run budgets. Expects `requireUser` in front. */
export function reviewRoutes(ctx: RouteContext): Router {
  const router = Router();

  router.get('/missions/:missionId/reviews', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const query = parseInput(reviewListQuerySchema, req.query, 'query');
    res.json({ reviews: await listReviews(currentUser(res), missionId, query) });
  });

  router.get(`${base}`, async (req, res) => {
    const params = parseInput(reviewParamsSchema, req.params, 'path');
    res.json(await getReview(currentUser(res), params));
  });

  router.post(`${base}/submit`, async (req, res) => {
    const params = parseInput(reviewParamsSchema, req.params, 'path');
    const { note } = parseInput(reviewSubmitSchema, req.body, 'body');
    const user = currentUser(res);
    const outcome = await transitionReview(user, params, 'submit', note);
    await notifyReviewRequested(ctx.config, ctx.jobs, { missionId: params.missionId, subjectLabel: outcome.subjectLabel, submitter: user.displayName, note });
    res.json(outcome.review);
  });

  router.post(`${base}/approve`, async (req, res) => {
    const params = parseInput(reviewParamsSchema, req.params, 'path');
    const { note } = parseInput(reviewApproveSchema, req.body, 'body');
    const user = currentUser(res);
    const outcome = await transitionReview(user, params, 'approve', note);
    await notifyReviewDecided(ctx.config, ctx.jobs, {
      missionId: params.missionId,
      subjectLabel: outcome.subjectLabel,
      submitterId: outcome.submitterId,
      decision: 'approved',
      lead: user.displayName,
      reason: note,
    });
    res.json(outcome.review);
  });

  router.post(`${base}/send-back`, async (req, res) => {
    const params = parseInput(reviewParamsSchema, req.params, 'path');
    const { reason } = parseInput(reviewSendBackSchema, req.body, 'body');
    const user = currentUser(res);
    const outcome = await transitionReview(user, params, 'send-back', reason);
    await notifyReviewDecided(ctx.config, ctx.jobs, {
      missionId: params.missionId,
      subjectLabel: outcome.subjectLabel,
      submitterId: outcome.submitterId,
      decision: 'changes-requested',
      lead: user.displayName,
      reason,
    });
    res.json(outcome.review);
  });

  return router;
}
