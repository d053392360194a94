import bcrypt from 'bcryptjs';
import jwt from 'jsonwebtoken';
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

/** Signs a session token for a user, valid for `hours`. */
export function signSession(userId: string, secret: string, hours: number): string {
  return jwt.sign({} satisfies Partial<SessionClaims>, secret, {
    subject: userId,
    expiresIn: Math.round(hours * 3600),
    algorithm: 'HS256',
  });
}

/** Verifies a session token and loads its user; the user's current role is read from the database. */
export async function userFromSession(token: string, secret: string): Promise<User> {
  let claims: SessionClaims;
  try {
    claims = jwt.verify(token, secret, { algorithms: ['HS256'] }) as SessionClaims;
  } catch (cause) {
    throw new AppError('unauthenticated', 'session expired or invalid: sign in again', { cause });
  }
  const row = await UserModel.findByPk(claims.sub);
  if (!row) throw new AppError('unauthenticated', 'session user no longer exists: sign in again');
  return toUser(row);
}
