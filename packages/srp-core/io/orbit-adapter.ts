import type { InitialOrbit } from '@photon-ledger/shared';
import { EARTH_GM, SUN_GM, keplerianToCartesian, parseUtcEpoch, type Epoch } from '../src/index';

const DEG = Math.PI / 180;
const KM = 1000;

/** An initial orbit in SI: the epoch, the central body's GM and the Cartesian state. */
export interface OrbitState {
  epoch: Epoch;
  centralBody: 'earth' | 'sun';
  /** Gravitational parameter of the central body (m³/s²). */
  mu: number;
  /** Position (m) and velocity (m/s), EQJ, packed [x, y, z, vx, vy, vz]. */
  state: Float64Array;
}

/** Converts an orbit file (shared schema, already parsed; km, km/s, degrees) to SI state. */
export function orbitFromFile(orbit: InitialOrbit): OrbitState {
  const mu = orbit.centralBody === 'earth' ? EARTH_GM : SUN_GM;
  const state = new Float64Array(6);
  if (orbit.kind === 'keplerian') {
    keplerianToCartesian(
      state,
      {
        semiMajorAxisM: orbit.semiMajorAxisKm * KM,
        eccentricity: orbit.eccentricity,
        inclinationRad: orbit.inclinationDeg * DEG,
        raanRad: orbit.raanDeg * DEG,
        argPeriapsisRad: orbit.argPeriapsisDeg * DEG,
        trueAnomalyRad: orbit.trueAnomalyDeg * DEG,
      },
      mu,
    );
  } else {
    state.set([...orbit.positionKm.map((c) => c * KM), ...orbit.velocityKmS.map((c) => c * KM)]);
  }
  return { epoch: parseUtcEpoch(orbit.epochUtc, 'epochUtc'), centralBody: orbit.centralBody, mu, state };
}
