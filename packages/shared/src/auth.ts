import { z } from 'zod';
import { roleSchema } from './roles';

/** Body of `POST /api/auth/login`. */
export const loginRequestSchema = z.object({
  email: z.email({ message: 'email must be an e-mail address, e.g. name@example.org' }).max(254),
  password: z.string().min(1, 'password is required').max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** A signed-in user as the API shows it (never the password hash). */
export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
});
export type User = z.infer<typeof userSchema>;

/** Answer of `GET /api/me` and `POST /api/auth/login`. */
export const meResponseSchema = z.object({ user: userSchema });
export type MeResponse = z.infer<typeof meResponseSchema>;

/** A demo account listed on the sign-in page when the server runs in demo mode. */
export const demoAccountSchema = z.object({
  email: z.string(),
  password: z.string(),
  role: roleSchema,
  displayName: z.string(),
});
export type DemoAccount = z.infer<typeof demoAccountSchema>;

/** Answer of `GET /api/public-config`: what the sign-in page may know before sign-in. */
export const publicConfigSchema = z.object({
  demoMode: z.boolean(),
  demoAccounts: z.array(demoAccountSchema),
});
export type PublicConfig = z.infer<typeof publicConfigSchema>;
