import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { loginRequestSchema, type MeResponse } from '@photon-ledger/shared';
import type { Config } from '../config';
import { parseInput } from '../middleware/validate';
import { SESSION_COOKIE, currentUser, requireUser } from '../middleware/auth';
import { AppError } from '../errors/app-error';
import { authenticate, signSession } from '../services/auth-service';

/** Sign-in, sign-out and the current user. */
export function authRoutes(config: Config): Router {
  const router = Router();
  const loginLimiter = rateLimit({
    windowMs: config.PL_LOGIN_WINDOW_S * 1000,
    limit: config.PL_LOGIN_LIMIT,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new AppError('rate_limited', `too many sign-in attempts: wait ${Math.ceil(config.PL_LOGIN_WINDOW_S / 60)} minutes and try again`)),
  });

  router.post('/auth/login', loginLimiter, async (req, res) => {
    const { email, password } = parseInput(loginRequestSchema, req.body, 'body');
    const user = await authenticate(email, password);
    const token = signSession(user.id, config.PL_JWT_SECRET, config.PL_SESSION_HOURS);
    res.cookie(SESSION_COOKIE, token, {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.PL_COOKIE_SECURE,
      maxAge: config.PL_SESSION_HOURS * 3600 * 1000,
      path: '/',
    });
    res.json({ user } satisfies MeResponse);
  });

  router.post('/auth/logout', (_req, res) => {
    res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', secure: config.PL_COOKIE_SECURE, path: '/' });
    res.status(204).end();
  });

  router.get('/me', requireUser(config.PL_JWT_SECRET), (_req, res) => {
    res.json({ user: currentUser(res) } satisfies MeResponse);
  });

  return router;
}
