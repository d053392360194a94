import { z } from 'zod';
import { roleSchema } from './roles';
import { missionCreateSchema } from './missions';

/** The demo data file in `fixtures/demo`: an invented organisation, its people and missions. */
export const demoDataSchema = z.object({
  organisation: z.object({ name: z.string().min(1), domain: z.string().min(1) }),
  users: z
    .array(
      z.object({
        email: z.email(),
        displayName: z.string().min(1),
        role: roleSchema,
        /** Demo-only password; printed in the README and on the sign-in page in demo mode. */
        password: z.string().min(8),
      }),
    )
    .min(1),
  missions: z.array(
    missionCreateSchema.extend({
      /** E-mail addresses of the members. */
      members: z.array(z.email()),
    }),
  ),
});
export type DemoData = z.infer<typeof demoDataSchema>;
