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
