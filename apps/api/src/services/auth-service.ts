import { createSecretKey, type KeyObject } from 'node:crypto';
import bcrypt from 'bcryptjs';
import jwt from 'jsonwebtoken';
import { QueryTypes } from 'sequelize';
import type { User } from '@photon-ledger/shared';
import { UserModel, toUser } from '../models';
import { AppError } from '../errors/app-error';

/** bcrypt work factor: about 50-100 ms per hash here (common practice: 10-12). */
export const BCRYPT_ROUNDS = 11;

// Compared against when the e-mail is unknown, so both paths take the same time.
const DUMMY_HASH = bcrypt.hashSync('photon-ledger-timing-equaliser', BCRYPT_ROUNDS);

/** Hashes a password for storage. */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

/** Checks e-mail and password; the same message for an unknown e-mail and a wrong password. */
export async function authenticate(email: string, password: string): Promise<User> {
  const row = await UserModel.findOne({ where: { email: email.toLowerCase() } });
  const ok = await bcrypt.compare(password, row?.passwordHash ?? DUMMY_HASH);
  if (!row || !ok) throw new AppError('unauthenticated', 'e-mail or password is wrong');
  return toUser(row);
}

/** Claims carried by the session token. */
interface SessionClaims {
  sub: string;
}

const keys = new Map<string, KeyObject>();
/**
 * The HMAC key of a secret, made once: given a plain string, jsonwebtoken first tries to read it
 * as a PEM public key on every verify (measured: a fifth of a signed-in request's CPU).
 */
function hmacKey(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    key = createSecretKey(Buffer.from(secret, 'utf8'));
    keys.set(secret, key);
  }
  return key;
}

/** Signs a session token for a user, valid for `hours`. */
export function signSession(userId: string, secret: string, hours: number): string {
  return jwt.sign({} satisfies Partial<SessionClaims>, hmacKey(secret), {
    subject: userId,
    expiresIn: Math.round(hours * 3600),
    algorithm: 'HS256',
  });
}

/** Verifies a session token and loads its user; the user's current role is read from the database. */
export async function userFromSession(token: string, secret: string): Promise<User> {
  let claims: SessionClaims;
  try {
    claims = jwt.verify(token, hmacKey(secret), { algorithms: ['HS256'] }) as SessionClaims;
  } catch (cause) {
    throw new AppError('unauthenticated', 'session expired or invalid: sign in again', { cause });
  }
  const now = Date.now();
  const cached = recentUsers.get(claims.sub);
  if (cached && cached.until > now) return cached.user;
  // Every signed-in request comes through here: one bound statement, no model building (measured:
  // Sequelize's finder machinery cost more CPU than the rest of a small read).
  const [row] = await UserModel.sequelize!.query<{ id: string; email: string; display_name: string; role: User['role'] }>(
    'SELECT id, email, display_name, role FROM users WHERE id = $1',
    { bind: [claims.sub], type: QueryTypes.SELECT },
  );
  if (!row) {
    recentUsers.delete(claims.sub);
    throw new AppError('unauthenticated', 'session user no longer exists: sign in again');
  }
  const user: User = { id: row.id, email: row.email, displayName: row.display_name, role: row.role };
  if (recentUsers.size >= USER_CACHE_MAX) recentUsers.clear();
  recentUsers.set(user.id, { user, until: now + USER_CACHE_MS });
  return user;
}

/**
 * How long a session's user row is reused before it is read again (ms). A database round trip is
 * the largest cost of a small read on loopback (measured with bench/read-latency.bench.ts), so a
 * burst of requests from one user pays it once; a role change or a deleted user takes effect
 * within this time on every API process.
 */
export const USER_CACHE_MS = 2000;
const USER_CACHE_MAX = 10_000;
const recentUsers = new Map<string, { user: User; until: number }>();

/** Forgets every cached user (tests that change a user in the database). */
export function forgetCachedUsers(): void {
  recentUsers.clear();
}
