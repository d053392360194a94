/**
 * Two-body (Keplerian) orbits: classical elements ↔ Cartesian state, Kepler's equation, and
 * analytic propagation, for elliptic and hyperbolic orbits (parabolic e = 1 is refused).
 *
 * Frame: whatever inertial frame the state is in (ECI or HCI, EQJ axes); the reference plane is
 * its xy-plane and the reference direction its x-axis. SI: m, m/s, rad, m³/s².
 *
 * Singular cases, resolved as Vallado does (Fundamentals of Astrodynamics and Applications,
 * 4th ed., 2013, Algorithm 9 "RV2COE", special cases; from memory):
 * - circular (e < CIRCULAR_TOLERANCE): the argument of periapsis is 0 and the "true anomaly"
 *   is the argument of latitude u, measured from the ascending node in the direction of motion;
 * - equatorial (sin i < EQUATORIAL_TOLERANCE, prograde or retrograde): the RAAN is 0 and the
 *   "argument of periapsis" is the longitude of periapsis, measured from the x-axis in the
 *   direction of motion;
 * - circular and equatorial: RAAN = 0, argument of periapsis = 0, and the "true anomaly" is the
 *   true longitude, measured from the x-axis in the direction of motion.
 * With these definitions elements → state works unchanged (Ω = 0 and/or ω = 0 are ordinary
 * values there), so a round trip is exact up to rounding, and the position depends continuously
 * on the elements across the thresholds.
 */
import { SrpError } from '../errors';

/** Classical (Keplerian) elements, SI; angles in radians. */
export interface KeplerianElements {
  /** Semi-major axis a (m): > 0 for an ellipse, < 0 for a hyperbola. */
  semiMajorAxisM: number;
  /** Eccentricity e (-): [0, 1) ellipse, > 1 hyperbola. */
  eccentricity: number;
  /** Inclination i (rad), [0, π]. */
  inclinationRad: number;
  /** Right ascension of the ascending node Ω (rad), [0, 2π); 0 for an equatorial orbit. */
  raanRad: number;
  /** Argument of periapsis ω (rad), [0, 2π); longitude of periapsis if equatorial; 0 if circular. */
  argPeriapsisRad: number;
  /** True anomaly ν (rad), [0, 2π) (hyperbola: (−π, π)); argument of latitude or true longitude if circular. */
  trueAnomalyRad: number;
}

/** Below this eccentricity an orbit is treated as circular (see the file comment). */
export const CIRCULAR_TOLERANCE = 1e-11;
/** Below this sin(inclination) an orbit is treated as equatorial (see the file comment). */
export const EQUATORIAL_TOLERANCE = 1e-11;

const TWO_PI = 2 * Math.PI;

/** Allocates a zeroed elements record (to reuse as an output). */
export function createKeplerianElements(): KeplerianElements {
  return { semiMajorAxisM: 0, eccentricity: 0, inclinationRad: 0, raanRad: 0, argPeriapsisRad: 0, trueAnomalyRad: 0 };
}

function wrapTwoPi(x: number): number {
  const y = x % TWO_PI;
  return y < 0 ? y + TWO_PI : y;
}

function requireFinite(value: number, field: string, unit: string): void {
  if (!Number.isFinite(value)) {
    throw new SrpError('invalid_input', `${field} must be a finite number (${unit}); got ${String(value)}`, {
      field,
      value,
    });
  }
}

function requireMu(mu: number): void {
  requireFinite(mu, 'mu', 'm^3/s^2');
  if (!(mu > 0)) {
    throw new SrpError('out_of_range', `mu must be greater than 0 (m^3/s^2); got ${mu}`, {
      field: 'mu',
      value: mu,
      limit: '> 0',
    });
  }
}

/**
 * Checks elements for a conic the functions here handle and returns p = a (1 − e²) (m).
 * @throws SrpError naming the field: e < 0 or e = 1 (parabola), a of the wrong sign for e, i outside [0, π],
 *   or a hyperbolic true anomaly beyond the asymptotes
 */
function semiLatusRectum(el: KeplerianElements, mu: number): number {
  requireMu(mu);
  const { semiMajorAxisM: a, eccentricity: e } = el;
  requireFinite(a, 'semiMajorAxisM', 'm');
  requireFinite(e, 'eccentricity', '-');
  requireFinite(el.inclinationRad, 'inclinationRad', 'rad');
  requireFinite(el.raanRad, 'raanRad', 'rad');
  requireFinite(el.argPeriapsisRad, 'argPeriapsisRad', 'rad');
  requireFinite(el.trueAnomalyRad, 'trueAnomalyRad', 'rad');
  if (e < 0) {
    throw new SrpError('out_of_range', `eccentricity must be ≥ 0; got ${e}`, {
      field: 'eccentricity',
      value: e,
      limit: '>= 0',
    });
  }
  if (Math.abs(e - 1) < 1e-12) {
    throw new SrpError('out_of_range', `eccentricity must not be 1 (parabolic orbits are not supported); got ${e}`, {
      field: 'eccentricity',
      value: e,
      limit: '!= 1',
    });
  }
  if (e < 1 ? !(a > 0) : !(a < 0)) {
    throw new SrpError(
      'out_of_range',
      `semiMajorAxisM must be ${e < 1 ? 'positive for an ellipse (e < 1)' : 'negative for a hyperbola (e > 1)'}; got ${a}`,
      { field: 'semiMajorAxisM', value: a, limit: e < 1 ? '> 0' : '< 0' },
    );
  }
  if (el.inclinationRad < 0 || el.inclinationRad > Math.PI) {
    throw new SrpError('out_of_range', `inclinationRad must be in [0, π]; got ${el.inclinationRad}`, {
      field: 'inclinationRad',
      value: el.inclinationRad,
      limit: '[0, pi]',
    });
  }
  if (e > 1 && 1 + e * Math.cos(el.trueAnomalyRad) <= 0) {
    const message = `trueAnomalyRad lies beyond the asymptotes of the hyperbola (|ν| < acos(−1/e)); got ${el.trueAnomalyRad}`;
    throw new SrpError('out_of_range', message, {
      field: 'trueAnomalyRad',
      value: el.trueAnomalyRad,
      limit: `|nu| < ${Math.acos(-1 / e)}`,
    });
  }
  return a * (1 - e * e);
}

/**
 * Cartesian state from classical elements: r = p/(1 + e cos ν) in the perifocal frame, rotated by
 * R3(−Ω) R1(−i) R3(−ω). Allocates nothing.
 * Source: Vallado (2013), Algorithm 10 "COE2RV" (from memory); any orbital mechanics text.
 * @param out state [x, y, z (m), vx, vy, vz (m/s)] in the elements' inertial frame, length ≥ 6
 * @param mu gravitational parameter of the central body (m³/s²)
 * @throws SrpError for elements outside their domain (naming the field)
 */
export function keplerianToCartesian(out: Float64Array, elements: KeplerianElements, mu: number): Float64Array {
  const p = semiLatusRectum(elements, mu);
  const e = elements.eccentricity;
  const nu = elements.trueAnomalyRad;
  const cosNu = Math.cos(nu);
  const sinNu = Math.sin(nu);
  const r = p / (1 + e * cosNu);
  const sqrtMuP = Math.sqrt(mu / p);
  // Perifocal position and velocity.
  const xp = r * cosNu;
  const yp = r * sinNu;
  const vxp = -sqrtMuP * sinNu;
  const vyp = sqrtMuP * (e + cosNu);
  const cO = Math.cos(elements.raanRad);
  const sO = Math.sin(elements.raanRad);
  const cw = Math.cos(elements.argPeriapsisRad);
  const sw = Math.sin(elements.argPeriapsisRad);
  const ci = Math.cos(elements.inclinationRad);
  const si = Math.sin(elements.inclinationRad);
  // Columns P and Q of the perifocal-to-inertial rotation.
  const px = cO * cw - sO * sw * ci;
  const py = sO * cw + cO * sw * ci;
  const pz = sw * si;
  const qx = -cO * sw - sO * cw * ci;
  const qy = -sO * sw + cO * cw * ci;
  const qz = cw * si;
  out[0] = px * xp + qx * yp;
  out[1] = py * xp + qy * yp;
  out[2] = pz * xp + qz * yp;
  out[3] = px * vxp + qx * vyp;
  out[4] = py * vxp + qy * vyp;
  out[5] = pz * vxp + qz * vyp;
  return out;
}

/** Angle (rad, [0, 2π)) from unit-free direction f to g, measured about the axis h (right-handed). */
function angleAbout(
  fx: number,
  fy: number,
  fz: number,
  gx: number,
  gy: number,
  gz: number,
  hx: number,
  hy: number,
  hz: number,
): number {
  const cx = fy * gz - fz * gy;
  const cy = fz * gx - fx * gz;
  const cz = fx * gy - fy * gx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  const sin = (cx * hx + cy * hy + cz * hz) / hn;
  const cos = fx * gx + fy * gy + fz * gz;
  return wrapTwoPi(Math.atan2(sin, cos));
}

/**
 * Classical elements from a Cartesian state, with the singular cases resolved as in the file
 * comment. Angles come from atan2 of sines and cosines (no acos), so every quadrant and the
 * near-singular cases keep full precision. Writes into `out` and returns it.
 * Source: Vallado (2013), Algorithm 9 "RV2COE" (from memory).
 * @param state [x, y, z (m), vx, vy, vz (m/s)], inertial
 * @param mu gravitational parameter of the central body (m³/s²)
 * @throws SrpError `invalid_input` for a non-finite or zero position, a rectilinear state (r × v = 0);
 *   `out_of_range` for a parabolic state (e = 1 within 1e-12)
 */
export function cartesianToKeplerian(out: KeplerianElements, state: ArrayLike<number>, mu: number): KeplerianElements {
  const rx = state[0] as number;
  const ry = state[1] as number;
  const rz = state[2] as number;
  const vx = state[3] as number;
  const vy = state[4] as number;
  const vz = state[5] as number;
  for (let k = 0; k < 6; k += 1) requireFinite(state[k] as number, `state.${k}`, k < 3 ? 'm' : 'm/s');
  requireMu(mu);
  const r = Math.sqrt(rx * rx + ry * ry + rz * rz);
  const v2 = vx * vx + vy * vy + vz * vz;
  const hx = ry * vz - rz * vy;
  const hy = rz * vx - rx * vz;
  const hz = rx * vy - ry * vx;
  const h = Math.sqrt(hx * hx + hy * hy + hz * hz);
  if (!(r > 0) || !(h > 1e-12 * r * Math.sqrt(v2))) {
    throw new SrpError('invalid_input', 'state must have a non-zero position not parallel to the velocity (r × v ≠ 0)', {
      field: 'state',
      value: Array.from({ length: 6 }, (_, k) => state[k]),
    });
  }
  const rv = rx * vx + ry * vy + rz * vz;
  // Eccentricity vector e = ((v² − μ/r) r − (r·v) v) / μ.
  const k1 = v2 - mu / r;
  const ex = (k1 * rx - rv * vx) / mu;
  const ey = (k1 * ry - rv * vy) / mu;
  const ez = (k1 * rz - rv * vz) / mu;
  const e = Math.sqrt(ex * ex + ey * ey + ez * ez);
  if (Math.abs(e - 1) < 1e-12) {
    const message = `the state is parabolic (e = ${e}); only elliptic and hyperbolic orbits are supported`;
    throw new SrpError('out_of_range', message, {
      field: 'state',
      value: e,
      limit: 'e != 1',
    });
  }
  const energy = v2 / 2 - mu / r;
  out.semiMajorAxisM = -mu / (2 * energy);
  out.eccentricity = e;
  // Node vector n = ẑ × h = (−h_y, h_x, 0).
  const nx = -hy;
  const ny = hx;
  const nxy = Math.sqrt(nx * nx + ny * ny);
  out.inclinationRad = Math.atan2(nxy, hz);
  const equatorial = nxy / h < EQUATORIAL_TOLERANCE;
  const circular = e < CIRCULAR_TOLERANCE;
  // Reference direction in the orbit plane: the ascending node, or the x-axis if equatorial.
  let fx = 1;
  let fy = 0;
  if (equatorial) {
    out.raanRad = 0;
  } else {
    out.raanRad = wrapTwoPi(Math.atan2(ny, nx));
    fx = nx / nxy;
    fy = ny / nxy;
  }
  if (circular) {
    out.argPeriapsisRad = 0;
    out.trueAnomalyRad = angleAbout(fx, fy, 0, rx / r, ry / r, rz / r, hx, hy, hz);
  } else {
    out.argPeriapsisRad = angleAbout(fx, fy, 0, ex / e, ey / e, ez / e, hx, hy, hz);
    out.trueAnomalyRad = angleAbout(ex / e, ey / e, ez / e, rx / r, ry / r, rz / r, hx, hy, hz);
  }
  if (e > 1 && out.trueAnomalyRad > Math.PI) out.trueAnomalyRad -= TWO_PI;
  return out;
}

/**
 * Solves Kepler's equation M = E − e sin E (ellipse) for the eccentric anomaly E, or
 * M = e sinh H − H (hyperbola) for the hyperbolic anomaly H, by Newton's method from a starting
 * value that converges for every M and e: E₀ = M + 0.85 e sign(sin M) (Danby), and
 * H₀ = sign(M) ln(2|M|/e + 1.8) (Danby).
 * Source: Danby, Fundamentals of Celestial Mechanics, 2nd ed. (1988), §6.6 (from memory);
 * Vallado (2013), Algorithms 2 and 4 (from memory).
 * @param meanAnomalyRad M (rad); any real for an ellipse (reduced to [−π, π] internally)
 * @param eccentricity e ≥ 0, ≠ 1
 * @returns E (rad, same revolution as M) or H (-)
 * @throws SrpError `not_converged` if 60 Newton steps bring neither the step below 1e-15
 *   relative nor the residual down to the rounding of its terms
 */
export function solveKeplerEquation(meanAnomalyRad: number, eccentricity: number): number {
  const e = eccentricity;
  const M = meanAnomalyRad;
  if (e < 1) {
    // Reduce to [−π, π] and add the whole turns back at the end, for precision.
    const turns = Math.round(M / TWO_PI);
    const m = M - turns * TWO_PI;
    if (e === 0) return M;
    let E = m + 0.85 * e * Math.sign(Math.sin(m));
    for (let iter = 0; iter < 60; iter += 1) {
      const eSin = e * Math.sin(E);
      const f = E - eSin - m;
      // Converged when the residual is down to the rounding of its own terms.
      if (Math.abs(f) <= 4 * Number.EPSILON * (Math.abs(E) + Math.abs(eSin) + Math.abs(m))) return E + turns * TWO_PI;
      const dE = f / (1 - e * Math.cos(E));
      E -= dE;
      if (Math.abs(dE) <= 1e-15 * Math.max(1, Math.abs(E))) return E + turns * TWO_PI;
    }
    throw new SrpError('not_converged', `Kepler's equation did not converge for M = ${M}, e = ${e}`, {
      field: 'meanAnomalyRad',
      value: M,
    });
  }
  let H = Math.sign(M) * Math.log((2 * Math.abs(M)) / e + 1.8);
  for (let iter = 0; iter < 60; iter += 1) {
    const eSinh = e * Math.sinh(H);
    const f = eSinh - H - M;
    if (Math.abs(f) <= 4 * Number.EPSILON * (Math.abs(eSinh) + Math.abs(H) + Math.abs(M))) return H;
    const dH = f / (e * Math.cosh(H) - 1);
    H -= dH;
    if (Math.abs(dH) <= 1e-15 * Math.max(1, Math.abs(H))) return H;
  }
  throw new SrpError('not_converged', `the hyperbolic Kepler equation did not converge for M = ${M}, e = ${e}`, {
    field: 'meanAnomalyRad',
    value: M,
  });
}

/**
 * Mean anomaly (rad) from true anomaly (rad): ellipse M = E − e sin E with
 * E = 2 atan2(√(1−e) sin(ν/2), √(1+e) cos(ν/2)) in (−π, π]; hyperbola M = e sinh H − H with
 * H = 2 atanh(√((e−1)/(e+1)) tan(ν/2)).
 */
export function trueToMeanAnomaly(trueAnomalyRad: number, eccentricity: number): number {
  const e = eccentricity;
  const half = trueAnomalyRad / 2;
  if (e < 1) {
    const E = 2 * Math.atan2(Math.sqrt(1 - e) * Math.sin(half), Math.sqrt(1 + e) * Math.cos(half));
    return E - e * Math.sin(E);
  }
  const H = 2 * Math.atanh(Math.sqrt((e - 1) / (e + 1)) * Math.tan(half));
  return e * Math.sinh(H) - H;
}

/**
 * True anomaly (rad) from mean anomaly (rad) through Kepler's equation; in [−π, π] (hyperbola:
 * between the asymptotes).
 */
export function meanToTrueAnomaly(meanAnomalyRad: number, eccentricity: number): number {
  const e = eccentricity;
  if (e < 1) {
    let E = solveKeplerEquation(meanAnomalyRad, e);
    E -= TWO_PI * Math.round(E / TWO_PI);
    return 2 * Math.atan2(Math.sqrt(1 + e) * Math.sin(E / 2), Math.sqrt(1 - e) * Math.cos(E / 2));
  }
  const H = solveKeplerEquation(meanAnomalyRad, e);
  return 2 * Math.atan(Math.sqrt((e + 1) / (e - 1)) * Math.tanh(H / 2));
}

/**
 * Orbital period T = 2π √(a³/μ) (s) of an elliptic orbit.
 * @param semiMajorAxisM a (m), > 0
 * @param mu gravitational parameter (m³/s²)
 */
export function orbitalPeriod(semiMajorAxisM: number, mu: number): number {
  return TWO_PI * Math.sqrt((semiMajorAxisM * semiMajorAxisM * semiMajorAxisM) / mu);
}

const scratchElements = createKeplerianElements();

/**
 * Propagates a state by `dtSeconds` on the two-body orbit it defines: elements, mean anomaly
 * advanced by n·dt (n = √(μ/|a|³)), Kepler's equation, back to a state. Circular and equatorial
 * orbits need nothing special: their angles are then argument of latitude or true longitude,
 * which advance the same way. Allocates nothing; `out` may alias `state`.
 * @param out propagated state [m, m/s], inertial
 * @param state initial state [x, y, z (m), vx, vy, vz (m/s)], same frame
 * @param dtSeconds time step (s), any sign
 * @param mu gravitational parameter of the central body (m³/s²)
 * @throws SrpError as `cartesianToKeplerian` and `solveKeplerEquation`
 */
export function propagateKepler(out: Float64Array, state: ArrayLike<number>, dtSeconds: number, mu: number): Float64Array {
  requireFinite(dtSeconds, 'dtSeconds', 's');
  const el = cartesianToKeplerian(scratchElements, state, mu);
  const e = el.eccentricity;
  const a = el.semiMajorAxisM;
  const n = Math.sqrt(mu / Math.abs(a * a * a));
  const M0 = trueToMeanAnomaly(el.trueAnomalyRad, e);
  const M = M0 + n * dtSeconds;
  el.trueAnomalyRad = meanToTrueAnomaly(M, e);
  return keplerianToCartesian(out, el, mu);
}
