import type { Scenario } from '@photon-ledger/shared';
import {
  compileVehicle,
  createAttitudeLaw,
  createCentralBodyForce,
  createDragForce,
  createGeocentricEphemeris,
  createHeliocentricEphemeris,
  createLocallyOptimalSteering,
  createMoonThirdBodyForce,
  createPlanetThirdBodyForce,
  createSailConeClockLaw,
  createShadowEvents,
  createSrpForce,
  createSunThirdBodyForce,
  createZonalForce,
  createNodeCrossingEvents,
  createRadiusCrossingEvents,
  SOLAR_CONSTANT,
  type AttitudeLaw,
  type AttitudeProfile,
  type CompiledVehicle,
  type ForceModel,
  type PropagationRequest,
  type SrpForce,
  type StepEvent,
  type VehicleSpec,
  characteristicAcceleration,
  ASTRONOMICAL_UNIT,
} from '../src/index';
import type { BudgetContext } from '../src/budgets/compute-budget';
import { attitudeFromDefinition } from './attitude-adapter';
import { orbitFromFile } from './orbit-adapter';

const DAY = 86_400;
// Ephemeris tables reach a little past the span: the integrator may evaluate just beyond its end.
const EPHEMERIS_PAD_SECONDS = 2 * DAY;

/** A scenario turned into a propagation request, with what budgets need to know about the vehicle. */
export interface ScenarioRun {
  request: PropagationRequest;
  vehicle: CompiledVehicle;
  /** Solar constant used (W/m²). */
  s0: number;
  /** What the budgets need besides the samples. */
  budgetContext: BudgetContext;
}

/**
 * Builds the propagation request of a scenario (parsed with the shared schema) for a resolved
 * vehicle spec. A tabulated attitude naming an uploaded profile needs that profile.
 * @throws SrpError naming the offending field of the vehicle or the attitude
 */
export function buildScenarioRun(scenario: Scenario, vehicleSpec: VehicleSpec, attitudeProfile?: AttitudeProfile): ScenarioRun {
  const orbit = orbitFromFile(scenario.orbit);
  const vehicle = compileVehicle(vehicleSpec);
  const span = scenario.spanDays * DAY;
  const s0 = scenario.s0WM2 ?? SOLAR_CONSTANT;
  const f = scenario.forces;
  const earth = orbit.centralBody === 'earth';

  const attitude: AttitudeLaw =
    scenario.attitude.law === 'sail-locally-optimal'
      ? createSailConeClockLaw(
          {
            normalAxisBody: scenario.attitude.normalAxisBody,
            // Maximising the energy rate raises (or lowers) the orbit radius fastest on a near-circular spiral.
            steering: createLocallyOptimalSteering({ goal: scenario.attitude.direction, along: 'velocity' }),
          },
          'attitude',
        )
      : createAttitudeLaw(attitudeFromDefinition(scenario.attitude, attitudeProfile), 'attitude');

  const forces: ForceModel[] = [];
  const events: StepEvent[] = [];
  let srp: SrpForce | null = null;
  if (earth) {
    const ephemeris = createGeocentricEphemeris(orbit.epoch, 0, span + EPHEMERIS_PAD_SECONDS);
    forces.push(createCentralBodyForce(orbit.mu));
    if (f.zonalDegree >= 2) forces.push(createZonalForce({ degree: f.zonalDegree }));
    if (f.sun) forces.push(createSunThirdBodyForce(ephemeris));
    if (f.moon) forces.push(createMoonThirdBodyForce(ephemeris));
    if (f.drag) forces.push(createDragForce({ cd: f.drag.cd, areaM2: f.drag.areaM2, massKg: vehicle.massKg }));
    if (f.srp) {
      const shadowModel = scenario.shadow.model;
      const bodies = [...scenario.shadow.bodies];
      srp = createSrpForce({ vehicle, attitude, shadowModel, centralBody: 'earth', ephemeris, s0, shadowBodies: bodies });
      forces.push(srp);
      events.push(...createShadowEvents({ ephemeris, shadowModel, bodies }));
    }
  } else {
    forces.push(createCentralBodyForce(orbit.mu));
    if (f.planets.length > 0) {
      const planets = createHeliocentricEphemeris(orbit.epoch, 0, span + EPHEMERIS_PAD_SECONDS, { planets: f.planets });
      for (const p of f.planets) forces.push(createPlanetThirdBodyForce(p, planets));
    }
    if (f.srp) {
      srp = createSrpForce({ vehicle, attitude, shadowModel: 'none', centralBody: 'sun', ephemeris: null, s0 });
      forces.push(srp);
    }
  }

  if (scenario.events.nodes) events.push(...createNodeCrossingEvents());
  for (const km of scenario.events.radiiKm) events.push(...createRadiusCrossingEvents(km * 1000, `radius-${km}km`));

  const request: PropagationRequest = {
    epoch: orbit.epoch,
    centralBody: orbit.centralBody,
    mu: orbit.mu,
    state0: orbit.state,
    spanSeconds: span,
    outputStepSeconds: scenario.outputStepS,
    forces,
    srp,
    events,
    integrator: {
      relTol: scenario.tolerances.relTol,
      absTol: scenario.tolerances.absTol,
      ...(scenario.tolerances.maxStepS ? { maxStepSeconds: scenario.tolerances.maxStepS } : {}),
    },
  };
  const budgetContext: BudgetContext = {
    epoch: orbit.epoch,
    mu: orbit.mu,
    centralBody: orbit.centralBody,
    massKg: vehicle.massKg,
    ...(scenario.momentum ? { momentum: scenario.momentum } : {}),
    ...(vehicleSpec.kind === 'sail'
      ? {
          sail: {
            characteristicAccelMps2: characteristicAcceleration(vehicle, undefined, s0),
            sailAreaM2: vehicleSpec.areaM2,
            ...(scenario.sail ? { targetHeliocentricRadiusM: scenario.sail.targetRadiusAu * ASTRONOMICAL_UNIT } : {}),
          },
        }
      : {}),
  };
  return { request, vehicle, s0, budgetContext };
}
