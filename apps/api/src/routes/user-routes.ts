import { Router } from 'express';
import { UserModel, toUser } from '../models';
import { requireRole } from '../middleware/auth';

/** User administration (admin only). Expects `requireUser` in front. */
export function userRoutes(): Router {
  const router = Router();
  router.get('/users', requireRole('admin'), async (_req, res) => {
    const rows = await UserModel.findAll({ order: [['displayName', 'ASC']] });
    res.json({ users: rows.map(toUser) });
  });
  return router;
}
