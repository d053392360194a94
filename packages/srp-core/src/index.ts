export { SOLAR_CONSTANT, ASTRONOMICAL_UNIT, SPEED_OF_LIGHT } from './constants';
export { SrpError, srpErrorCodes } from './errors';
export type { SrpErrorCode, SrpErrorDetails } from './errors';
export {
  createVec3,
  setVec3,
  dotVec3,
  normVec3,
  addVec3,
  subVec3,
  scaleVec3,
  crossVec3,
  normalizeVec3,
  copyVec3,
} from './math/vec3';
export type { Vec3, ReadonlyVec3 } from './math/vec3';
export { irradianceAt, radiationPressureAt } from './radiation/flux';
export { checkSurfaceOptics, OPTICS_SUM_TOLERANCE } from './vehicles/surface-optics';
export type { SurfaceOptics } from './vehicles/surface-optics';
export { createFlatPlate, flatPlateForce } from './vehicles/flat-plate';
export type { FlatPlate, FlatPlateSpec } from './vehicles/flat-plate';
export {
  createQuat,
  multiplyQuat,
  conjugateQuat,
  normalizeQuat,
  rotateInertialToBody,
  rotateBodyToInertial,
  quatFromAxisAngle,
  quatFromBodyAxes,
  slerpQuat,
} from './attitude/quaternion';
export type { Quat, ReadonlyQuat } from './attitude/quaternion';
export { attitudeAt, createAttitudeLaw, attitudeLawKinds } from './attitude/attitude-law';
export type { AttitudeLaw, AttitudeLawSpec, AttitudeLawKind } from './attitude/attitude-law';
export { QUATERNION_NORM_TOLERANCE } from './attitude/attitude-input';
export { secondaryReferences } from './attitude/reference-direction';
export type { SecondaryReference } from './attitude/reference-direction';
export { createInertialLaw } from './attitude/inertial-law';
export type { InertialLaw, InertialLawOptions, InertialLawSpec } from './attitude/inertial-law';
export { createSunPointingLaw } from './attitude/sun-pointing-law';
export type { SunPointingLaw, SunPointingLawOptions, SunPointingLawSpec } from './attitude/sun-pointing-law';
export { createLvlhLaw, lvlhQuat } from './attitude/lvlh-law';
export type { LvlhLaw, LvlhLawOptions, LvlhLawSpec } from './attitude/lvlh-law';
export { createSailConeClockLaw } from './attitude/sail-cone-clock-law';
export type {
  SailConeClockLaw,
  SailConeClockLawOptions,
  SailConeClockLawSpec,
  ConeClockAngles,
  SailSteering,
} from './attitude/sail-cone-clock-law';
export { createTabulatedLaw } from './attitude/tabulated-law';
export type {
  TabulatedLaw,
  TabulatedLawOptions,
  TabulatedLawSpec,
  AttitudeProfileData,
  OutsideTable,
} from './attitude/tabulated-law';
export { parseAttitudeCsv } from './attitude/attitude-csv';
export type { AttitudeProfile, AttitudeCsvOptions, AttitudeCsvErrorDetails } from './attitude/attitude-csv';
export { INERTIAL_FRAME, INERTIAL_FRAME_LABEL } from './frames/inertial';
export {
  parseUtcEpoch,
  epochPlusSeconds,
  secondsBetween,
  formatUtc,
  astroTimeAt,
  ttMinusUtcSeconds,
} from './time/epoch';
export type { Epoch } from './time/epoch';
export { taiMinusUtcSeconds, TT_MINUS_TAI_SECONDS } from './time/leap-seconds';
export {
  EARTH_EQUATORIAL_RADIUS,
  EARTH_GM,
  MOON_RADIUS,
  MOON_GM,
  SUN_RADIUS,
  SUN_GM,
} from './bodies/body-constants';
export { sunPositionEci, moonPositionEci, planetPositionHci, planetNames } from './bodies/ephemeris';
export type { PlanetName } from './bodies/ephemeris';
export { fitChebyshevTable, evaluateChebyshevTable } from './bodies/chebyshev-table';
export type { ChebyshevTable } from './bodies/chebyshev-table';
export {
  createGeocentricEphemeris,
  DEFAULT_SUN_SEGMENT_SECONDS,
  DEFAULT_MOON_SEGMENT_SECONDS,
  DEFAULT_EPHEMERIS_DEGREE,
} from './bodies/geocentric-ephemeris';
export type { GeocentricEphemeris, GeocentricEphemerisOptions } from './bodies/geocentric-ephemeris';
export {
  shadowModels,
  apparentDiscs,
  createApparentDiscs,
  visibleSolarDiscFraction,
  cylindricalShadowFraction,
  conicalShadowFraction,
  twoBodyConicalShadowFraction,
  earthMoonShadowFraction,
} from './radiation/shadow';
export type { ShadowModel, ApparentDiscs } from './radiation/shadow';
export {
  keplerianToCartesian,
  cartesianToKeplerian,
  createKeplerianElements,
  solveKeplerEquation,
  trueToMeanAnomaly,
  meanToTrueAnomaly,
  orbitalPeriod,
  propagateKepler,
  CIRCULAR_TOLERANCE,
  EQUATORIAL_TOLERANCE,
} from './propagation/kepler';
export type { KeplerianElements } from './propagation/kepler';
export { findEclipseEvents, summarizeEclipses, occultingBodies, eclipseEventKinds } from './propagation/eclipse-events';
export type {
  EclipseEvent,
  EclipseEventKind,
  OccultingBody,
  ShadowPhase,
  SunMoonPositions,
  EclipseSearchOptions,
  EclipseSearchResult,
  EclipsePass,
  EclipseSummary,
} from './propagation/eclipse-events';
export { surfaceForceCoefficients } from './vehicles/surface-optics';
export { materialPresetNames, materialPresets, isMaterialPresetName } from './vehicles/material-presets';
export type { MaterialPresetName, MaterialPreset } from './vehicles/material-presets';
export { resolvePlateOptics } from './vehicles/plate-optics';
export type { SurfaceOpticsInput, PlateOptics } from './vehicles/plate-optics';
export type {
  VehicleSpec,
  VehicleSpecBase,
  VehicleKind,
  CannonballSpec,
  PlateSpec,
  PlateVehicleSpec,
  SailSpec,
  SailOpticalCoefficients,
  SailOpticsInput,
} from './vehicles/vehicle-spec';
export { sailOpticsPresetNames, sailOpticsPresets, resolveSailOptics, sailForceCoefficients } from './vehicles/sail-optics';
export type { SailOpticsPresetName, SailOpticsPreset, ResolvedSailOptics } from './vehicles/sail-optics';
export { CompiledVehicle } from './vehicles/compiled-vehicle';
export { compileVehicle } from './vehicles/compile-vehicle';
export { surfaceNormalBody } from './vehicles/sun-tracking';
export {
  SURFACE_STRIDE,
  createSrpResult,
  createSrpInertialResult,
  evaluateSrp,
  evaluateSrpInertial,
  srpResultToInertial,
  centreOfPressureBody,
} from './vehicles/evaluate-srp';
export type { SrpResult, SrpInertialResult, SrpResultOptions } from './vehicles/evaluate-srp';
export {
  SUN_GRAVITY_AT_1AU,
  characteristicAcceleration,
  sailLoading,
  lightnessNumber,
  idealSailCharacteristicAcceleration,
  criticalSailLoading,
} from './vehicles/sail-performance';
