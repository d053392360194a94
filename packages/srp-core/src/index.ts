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
export { createDynamics } from './propagation/forces/dynamics';
export type { ForceModel, ForceDerivative } from './propagation/forces/force-model';
export { createCentralBodyForce } from './propagation/forces/central-body';
export { createZonalForce, EARTH_ZONAL_J } from './propagation/forces/earth-zonal';
export type { ZonalForceOptions } from './propagation/forces/earth-zonal';
export {
  createThirdBodyForce,
  createSunThirdBodyForce,
  createMoonThirdBodyForce,
  createPlanetThirdBodyForce,
  thirdBodyAcceleration,
} from './propagation/forces/third-body';
export { createPositionMemo } from './propagation/forces/ephemeris-cache';
export type { PositionMemo } from './propagation/forces/ephemeris-cache';
export {
  createDragForce,
  exponentialDensity,
  EXPONENTIAL_ATMOSPHERE_TABLE,
  ATMOSPHERE_TOP_M,
  EARTH_ROTATION_RATE,
} from './propagation/forces/drag';
export type { DragForceOptions } from './propagation/forces/drag';
export { createSrpForce, createSrpDetail } from './propagation/forces/srp-force';
export type { SrpForce, SrpDetail, SrpForceOptions } from './propagation/forces/srp-force';
export { createShadowEvents } from './propagation/forces/shadow-events';
export type { ShadowStepEvent, ShadowEventOptions } from './propagation/forces/shadow-events';
export {
  createHeliocentricEphemeris,
  planetGm,
  DEFAULT_PLANET_SEGMENT_SECONDS,
  DEFAULT_PLANET_DEGREE,
} from './bodies/heliocentric-ephemeris';
export type { HeliocentricEphemeris, HeliocentricEphemerisOptions } from './bodies/heliocentric-ephemeris';
export { createLocallyOptimalSteering, optimalConeAngle } from './attitude/sail-optimal-steering';
export type {
  LocallyOptimalSteeringOptions,
  SailSteeringGoal,
  SailSteeringDirection,
} from './attitude/sail-optimal-steering';
export { createDop853 } from './propagation/integrator/dop853';
export type { Derivative, IntegratorOptions, Dop853, Dop853Stepper } from './propagation/integrator/dop853';
export { createEventLocator } from './propagation/integrator/event-locator';
export type { StepEvent, LocatedEvent, EventLocator, EventLocatorOptions } from './propagation/integrator/event-locator';
export { integrate } from './propagation/integrator/integrate';
export type { IntegrateHooks, IntegrateResult } from './propagation/integrator/integrate';
export { propagate } from './propagation/propagate';
export type { PropagationRequest, PropagationResult } from './propagation/propagate';
export {
  createSampleLayout,
  forceColumn,
  SAMPLE_T,
  SAMPLE_R,
  SAMPLE_V,
  SAMPLE_SRP_ACCEL_INERTIAL,
  SAMPLE_SRP_ACCEL_BODY,
  SAMPLE_SRP_TORQUE_BODY,
  SAMPLE_ILLUMINATED_FRACTION,
  SAMPLE_SUN_DISTANCE,
  SAMPLE_FORCE_ACCEL,
} from './propagation/sample-layout';
export type { SampleLayout, SampleHistory } from './propagation/sample-layout';
export {
  budgetLineKeys,
  budgetLineDefinitions,
  marginPercent,
  budgetLine,
  applyRequirement,
  applyRequirements,
  MARGIN_RELATIVE_TOLERANCE,
} from './budgets/budget-line';
export type { BudgetLineKey, BudgetLine, BudgetLineStatus, BudgetComparator, BudgetRequirement } from './budgets/budget-line';
export { computeBudget } from './budgets/compute-budget';
export type { BudgetContext, SrpBudget } from './budgets/compute-budget';
export { checkHistory, timeStatistics } from './budgets/sample-history';
export type { TimeStatistics } from './budgets/sample-history';
export { srpAccelerationStatistics, perturbationTable } from './budgets/srp-acceleration';
export type { PerturbationRow } from './budgets/srp-acceleration';
export { srpDeltaV } from './budgets/srp-delta-v';
export type { SrpDeltaV } from './budgets/srp-delta-v';
export { secularDrift } from './budgets/secular-drift';
export type { SecularDrift } from './budgets/secular-drift';
export { torqueStatistics, momentumBudget, timeToLevel as momentumTimeToLevel } from './budgets/momentum';
export type { TorqueStatistics, MomentumOptions, MomentumBudget, DumpCriterion } from './budgets/momentum';
export { sailBudget, timeToHeliocentricRadius } from './budgets/sail-budget';
export type { SailContext, SailBudget } from './budgets/sail-budget';
export { EXPORT_CAUTION } from './exports/caution';
export { EPHEMERIS_CSV_COLUMNS, ephemerisCsvHeader, ephemerisCsvChunks, ephemerisCsv, parseEphemerisCsv } from './exports/csv-ephemeris';
export type { EphemerisCsvOptions, ParsedEphemerisCsv } from './exports/csv-ephemeris';
export { OEM_MANDATORY_HEADER_KEYWORDS, OEM_MANDATORY_METADATA_KEYWORDS, oemChunks, oemText, parseOem } from './exports/oem';
export type { OemOptions, OemSegment, ParsedOem } from './exports/oem';
export { createNodeCrossingEvents, createRadiusCrossingEvents } from './propagation/orbit-events';
export { ephemerisCsvRows, createUtcLabeller } from './exports/csv-ephemeris';
export type { EphemerisCsvRowOptions } from './exports/csv-ephemeris';
export { oemHeader, oemDataLines } from './exports/oem';
export type { OemDataLineOptions } from './exports/oem';
export { ephemerisCsvRowBytes } from './exports/csv-ephemeris';
export { readMesh, detectMeshFileFormat, meshRotationMatrix, DEGENERATE_AREA_FRACTION } from './mesh/read-mesh';
export type {
  ReadMeshOptions,
  MeshImport,
  MeshGroupSummary,
  MeshLengthUnit,
  MeshFileFormat,
  MeshFileErrorDetails,
} from './mesh/read-mesh';
export type { MeshTableSpec } from './vehicles/vehicle-spec';
export type {
  TriangleMesh,
  MeshGroupOpticsInput,
  MeshOpticsInput,
  CoefficientTableSettings,
  SrpCoefficientTable,
} from './mesh/mesh-types';
export { createMeshScene, FRONT_UNSHADOWABLE, BACK_UNSHADOWABLE, RAY_OFFSET_RELATIVE } from './mesh/mesh-scene';
export type { MeshScene } from './mesh/mesh-scene';
export { illuminateMesh, createMeshIllumination, samplePattern, MAX_SAMPLES_PER_SIDE } from './mesh/illuminate-mesh';
export type { IlluminateOptions, MeshIllumination } from './mesh/illuminate-mesh';
export {
  coefficientTableShape,
  tableNodeDirection,
  computeCoefficientTableRows,
  assembleCoefficientTable,
  computeCoefficientTable,
  checkCoefficientTable,
  interpolateCoefficientTable,
  TABLE_NODE_STRIDE,
} from './mesh/coefficient-table';
export type { CoefficientTableShape, CoefficientTableRows, TableProgressHooks } from './mesh/coefficient-table';
export { buildMeshBvh, anyHit, closestHit, createMeshRay } from './mesh/mesh-bvh';
export type { MeshBvh, MeshRay } from './mesh/mesh-bvh';
