/**
 * Boundary adapters: files and HTTP bodies described by packages/shared (km, degrees, UTC strings)
 * to srp-core's SI specs. Kept out of `src/` so that the library itself imports nothing from the
 * workspace.
 */
export { vehicleFromFile } from './vehicle-adapter';
export { orbitFromFile } from './orbit-adapter';
export type { OrbitState } from './orbit-adapter';
export { attitudeFromDefinition } from './attitude-adapter';
export { buildScenarioRun } from './scenario-adapter';
export type { ScenarioRun } from './scenario-adapter';
