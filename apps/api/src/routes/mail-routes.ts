import { Router } from 'express';
import { mailListQuerySchema } from '@photon-ledger/shared';
import { requireRole } from '../middleware/auth';
import { parseInput } from '../middleware/validate';
import { MailMessageModel } from '../models';
import type { RouteContext } from './route-context';

/** Captured outgoing e-mail (administrators). Expects `requireUser` in front. */
export function mailRoutes(_ctx: RouteContext): Router {
  const router = Router();

  // What the local capture server received (the start command points PL_SMTP_URL at it).
  router.get('/admin/mail', requireRole('admin'), async (req, res) => {
    const { limit } = parseInput(mailListQuerySchema, req.query, 'query');
    const rows = await MailMessageModel.findAll({ order: [['receivedAt', 'DESC'], ['id', 'DESC']], limit });
    res.json({
      messages: rows.map((m) => ({ id: String(m.id), to: m.toAddresses, from: m.fromAddress, subject: m.subject, text: m.text, receivedAt: m.receivedAt.toISOString() })),
    });
  });

  return router;
}
