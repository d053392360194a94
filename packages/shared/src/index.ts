export { roleKeys, roleSchema } from './roles';
export type { Role } from './roles';
export { errorCodes, errorCodeSchema, apiErrorSchema, fieldErrors } from './errors';
export type { ErrorCode, ApiError } from './errors';
export {
  loginRequestSchema,
  userSchema,
  meResponseSchema,
  demoAccountSchema,
  publicConfigSchema,
} from './auth';
export type { LoginRequest, User, MeResponse, DemoAccount, PublicConfig } from './auth';
export {
  missionRegimes,
  missionRegimeSchema,
  missionCreateSchema,
  missionMemberSchema,
  missionSchema,
  missionDetailSchema,
  missionListQuerySchema,
  missionListSchema,
  missionParamsSchema,
  memberAddSchema,
} from './missions';
export type {
  MissionRegime,
  MissionCreate,
  MissionMember,
  Mission,
  MissionDetail,
  MissionListQuery,
  MissionList,
  MemberAdd,
} from './missions';
export { demoDataSchema } from './demo';
export type { DemoData } from './demo';
export { healthSchema } from './health';
export type { Health } from './health';
