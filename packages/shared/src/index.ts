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
export {
  ATTITUDE_QUATERNION_NORM_TOLERANCE,
  MAX_INLINE_PROFILE_ROWS,
  attitudeLawKinds,
  attitudeLawKindSchema,
  secondaryReferences,
  secondaryReferenceSchema,
  inertialLawSchema,
  sunPointingLawSchema,
  lvlhLawSchema,
  sailConeClockLawSchema,
  attitudeProfileRowSchema,
  tabulatedLawSchema,
  attitudeLawSchema,
} from './attitude';
export type { AttitudeLawKind, SecondaryReference, AttitudeProfileRow, AttitudeLawDefinition } from './attitude';
export {
  orbitFrames,
  orbitFrameSchema,
  ORBIT_FRAME_LABEL,
  centralBodies,
  centralBodySchema,
  epochUtcSchema,
  keplerianOrbitSchema,
  cartesianOrbitSchema,
  initialOrbitSchema,
} from './orbit';
export type { OrbitFrame, CentralBody, KeplerianOrbit, CartesianOrbit, InitialOrbit } from './orbit';
export {
  vehicleSpecSchema,
  vehicleKinds,
  materialPresetKeys,
  sailOpticsPresetKeys,
  meshTableStepsDeg,
  meshSamplesPerFacet,
  meshGroupOpticsSchema,
  meshTableSettingsSchema,
} from './vehicle';
export type { VehicleSpec, MeshGroupOptics, MeshTableSettings } from './vehicle';
export { forceCommandSchema, eclipsesCommandSchema, shadowModelNames, eclipseBodyChoices } from './cli';
export type { ForceCommand, EclipsesCommand } from './cli';
export {
  budgetLineUnits,
  budgetLineKeys,
  budgetLineKeySchema,
  budgetComparators,
  budgetComparatorSchema,
  budgetRequirementSchema,
  budgetRequirementsSchema,
  requirementSchema,
  budgetLineStatuses,
  budgetLineStatusSchema,
  budgetLineResultSchema,
} from './budget';
export type { BudgetLineKey, BudgetRequirement, BudgetLineResult } from './budget';
export {
  scenarioSchema,
  scenarioAttitudeSchema,
  sailLocallyOptimalLawSchema,
  forceSwitchesSchema,
  tolerancesSchema,
  thirdBodyPlanets,
} from './scenario';
export type { Scenario } from './scenario';
export * from './runs';
export * from './api-vehicles';
export * from './api-meshes';
export * from './api-runs';
export * from './api-results';
export * from './api-studies';
export * from './api-reviews';
