import { z } from 'zod';
import { roleSchema } from './roles';

/** Where a mission flies: it decides the central body of propagation. */
export const missionRegimes = ['earth-orbit', 'heliocentric'] as const;
export const missionRegimeSchema = z.enum(missionRegimes);
export type MissionRegime = z.infer<typeof missionRegimeSchema>;

const slugSchema = z
  .string()
  .min(2, 'slug must have at least 2 characters')
  .max(60, 'slug must have at most 60 characters')
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'slug must be lower-case letters, digits and single hyphens, e.g. corvina-2');

/** Body of `POST /api/missions`. */
export const missionCreateSchema = z.object({
  slug: slugSchema,
  name: z.string().trim().min(1, 'name is required').max(120, 'name must have at most 120 characters'),
  regime: missionRegimeSchema,
  summary: z.string().max(2000, 'summary must have at most 2000 characters').default(''),
});
export type MissionCreate = z.infer<typeof missionCreateSchema>;

/** A mission member as listed with a mission. */
export const missionMemberSchema = z.object({
  userId: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: roleSchema,
});
export type MissionMember = z.infer<typeof missionMemberSchema>;

/** A mission as the API shows it. */
export const missionSchema = z.object({
  id: z.uuid(),
  slug: z.string(),
  name: z.string(),
  regime: missionRegimeSchema,
  summary: z.string(),
  createdAt: z.iso.datetime(),
});
export type Mission = z.infer<typeof missionSchema>;

/** A mission with its members, `GET /api/missions/:missionId`. */
export const missionDetailSchema = missionSchema.extend({ members: z.array(missionMemberSchema) });
export type MissionDetail = z.infer<typeof missionDetailSchema>;

/** Query of `GET /api/missions`. */
export const missionListQuerySchema = z.object({
  regime: missionRegimeSchema.optional(),
  q: z.string().max(120, 'q must have at most 120 characters').optional(),
});
export type MissionListQuery = z.infer<typeof missionListQuerySchema>;

/** Answer of `GET /api/missions`. */
export const missionListSchema = z.object({ missions: z.array(missionSchema) });
export type MissionList = z.infer<typeof missionListSchema>;

/** Path parameter naming a mission. */
export const missionParamsSchema = z.object({
  missionId: z.uuid({ message: 'missionId must be a UUID' }),
});

/** Body of `POST /api/missions/:missionId/members` (admin only). */
export const memberAddSchema = z.object({ userId: z.uuid({ message: 'userId must be a UUID' }) });
export type MemberAdd = z.infer<typeof memberAddSchema>;
