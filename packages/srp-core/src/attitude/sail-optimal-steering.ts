/**
 * Locally optimal solar-sail steering: at each instant, the cone and clock angles that maximise
 * the component of an ideal sail's acceleration along a chosen unit direction λ.
 *
 * An ideal sail's acceleration is a = a₀ cos²α n (n the sail normal, α its cone angle from the
 * Sun-to-sail direction u). With θ the angle between u and λ and n in the plane of u and λ,
 * a·λ = a₀ cos²α cos(θ − α); setting the derivative to zero gives tan(θ − α) = 2 tan α, whose
 * root in [0, π/2] is
 *
 *   tan α* = (−3 cos θ + √(9 cos²θ + 8 sin²θ)) / (4 sin θ)
 *
 * (derived here; the same law is McInnes, Solar Sailing, Springer-Praxis 1999, §4.4 "locally
 * optimal" steering, eq. 4.40 or near it: section and equation number from memory). For
 * θ = 90° it gives α* = atan(1/√2) = 35.26°.
 *
 * What is maximised (the objective), λ relative to the central body:
 * - along 'velocity' (default): λ = ±v̂, so the law maximises (raise) or minimises (lower)
 *   v·a = dE/dt, the rate of change of orbital energy and hence of the semi-major axis,
 *   da/dt = 2a² v·a / μ (Gauss's equation). On a near-circular orbit this is the secular rate of
 *   change of the orbit radius (the instantaneous dr/dt = v·r̂ does not depend on the thrust).
 * - along 'transverse': λ = ±θ̂ = ±ĥ × r̂, the rate of change of the orbital angular momentum
 *   dh/dt = r a_θ; on a circular orbit the two coincide.
 * The sail spirals outwards under 'raise', inwards under 'lower'.
 *
 * For a non-ideal sail (optics other than 'ideal') this is the ideal-sail optimum, a good
 * steering law but not the exact optimum of the optical model (which shifts α* by a few degrees).
 * The clock angle is expressed in the frame `sailConeClockAttitude` builds (sail-cone-clock-law.ts:
 * e1 = orbit normal ⊥ u, e2 = e1 × u), computed here by the same function, so the law's normal is
 * the optimal one exactly.
 */
import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3 } from '../math/vec3';
import { perpendicularReference } from './reference-direction';
import type { ConeClockAngles, SailSteering } from './sail-cone-clock-law';

/** Which way to push the orbit. */
export type SailSteeringGoal = 'raise' | 'lower';
/** The direction whose acceleration component is maximised (file comment). */
export type SailSteeringDirection = 'velocity' | 'transverse';

/** Options of `createLocallyOptimalSteering`. */
export interface LocallyOptimalSteeringOptions {
  /** 'raise' maximises, 'lower' minimises the rate (semi-major axis for 'velocity'). */
  goal: SailSteeringGoal;
  /** λ = ±v̂ ('velocity', default) or ±ĥ × r̂ ('transverse'). */
  along?: SailSteeringDirection;
}

/**
 * The ideal sail's optimal cone angle α* (rad, [0, π/2]) for a direction λ at angle θ from the
 * Sun-to-sail line (file comment). Written as 2 sin θ / (3 cos θ + √(…)) when cos θ ≥ 0 (the
 * same value, rationalised) so that small θ loses no digits.
 * @param thetaRad angle between the Sun-to-sail direction and λ (rad), [0, π]
 * @returns α* (rad): 0 at θ = 0, 35.26° at θ = 90°, π/2 at θ = π (edge-on: no useful thrust)
 */
export function optimalConeAngle(thetaRad: number): number {
  const c = Math.cos(thetaRad);
  const s = Math.sin(thetaRad);
  return optimalConeFromCosSin(c, s);
}

function optimalConeFromCosSin(c: number, s: number): number {
  const root = Math.sqrt(9 * c * c + 8 * s * s);
  // atan2 of a non-negative pair keeps α* in [0, π/2] and handles s = 0.
  return c >= 0 ? Math.atan2(2 * s, 3 * c + root) : Math.atan2(-3 * c + root, 4 * s);
}

const uScratch = createVec3();
const e1Scratch = createVec3();
const goals: readonly SailSteeringGoal[] = ['raise', 'lower'];
const directions: readonly SailSteeringDirection[] = ['velocity', 'transverse'];

/**
 * The locally optimal steering law (file comment) as a `SailSteering` for
 * `createSailConeClockLaw({ normalAxisBody, steering })`. Allocates nothing per evaluation.
 * @throws SrpError naming `goal` or `along`; at evaluation `invalid_input` naming `vSatEci` when
 *   the velocity (or, for 'transverse', r × v) is zero
 */
export function createLocallyOptimalSteering(options: LocallyOptimalSteeringOptions): SailSteering {
  const along = options.along ?? 'velocity';
  if (!goals.includes(options.goal)) {
    throw new SrpError('invalid_input', `goal must be 'raise' or 'lower'; got ${String(options.goal)}`, {
      field: 'goal',
      value: options.goal,
      limit: goals.join(' | '),
    });
  }
  if (!directions.includes(along)) {
    throw new SrpError('invalid_input', `along must be 'velocity' or 'transverse'; got ${String(along)}`, {
      field: 'along',
      value: along,
      limit: directions.join(' | '),
    });
  }
  const sign = options.goal === 'raise' ? 1 : -1;
  const transverse = along === 'transverse';
  return (
    out: ConeClockAngles,
    _tSeconds: number,
    rSatEci: ReadonlyVec3,
    vSatEci: ReadonlyVec3,
    sunPosEci: ReadonlyVec3,
  ): ConeClockAngles => {
    const rx = rSatEci[0];
    const ry = rSatEci[1];
    const rz = rSatEci[2];
    const vx = vSatEci[0];
    const vy = vSatEci[1];
    const vz = vSatEci[2];
    let lx: number;
    let ly: number;
    let lz: number;
    if (transverse) {
      // θ̂ ∝ (r × v) × r = v r² − r (r·v).
      const r2 = rx * rx + ry * ry + rz * rz;
      const rv = rx * vx + ry * vy + rz * vz;
      lx = vx * r2 - rx * rv;
      ly = vy * r2 - ry * rv;
      lz = vz * r2 - rz * rv;
    } else {
      lx = vx;
      ly = vy;
      lz = vz;
    }
    const ln = Math.sqrt(lx * lx + ly * ly + lz * lz);
    if (!(ln > 0 && ln < Infinity)) {
      throw new SrpError('invalid_input', `vSatEci must give a finite, non-zero ${along} direction; got [${vx}, ${vy}, ${vz}]`, {
        field: 'vSatEci',
        value: [vx, vy, vz],
        limit: transverse ? 'finite, not parallel to rSatEci' : 'finite, non-zero',
      });
    }
    const k = sign / ln;
    lx *= k;
    ly *= k;
    lz *= k;
    // u: Sun-to-sail unit vector (as the cone/clock law defines it).
    const ux = rx - sunPosEci[0];
    const uy = ry - sunPosEci[1];
    const uz = rz - sunPosEci[2];
    const un = Math.sqrt(ux * ux + uy * uy + uz * uz);
    if (!(un > 0 && un < Infinity)) {
      throw new SrpError('invalid_input', `rSatEci - sunPosEci must be a finite, non-zero vector (m); got [${ux}, ${uy}, ${uz}]`, {
        field: 'sunPosEci',
        value: [sunPosEci[0], sunPosEci[1], sunPosEci[2]],
        limit: 'finite, != rSatEci',
      });
    }
    const u = uScratch;
    u[0] = ux / un;
    u[1] = uy / un;
    u[2] = uz / un;
    const cosTheta = lx * u[0] + ly * u[1] + lz * u[2];
    // m = λ − (λ·u) u: the in-plane direction the normal tilts towards; |m| = sin θ.
    const mx = lx - cosTheta * u[0];
    const my = ly - cosTheta * u[1];
    const mz = lz - cosTheta * u[2];
    const sinTheta = Math.sqrt(mx * mx + my * my + mz * mz);
    out.coneRad = optimalConeFromCosSin(cosTheta, sinTheta);
    const e1 = e1Scratch;
    perpendicularReference(e1, 'orbit-normal', u, rSatEci, vSatEci);
    // e2 = e1 × u; δ = atan2(m·e2, m·e1) (0 when m = 0: any clock angle is as good).
    const e2x = e1[1] * u[2] - e1[2] * u[1];
    const e2y = e1[2] * u[0] - e1[0] * u[2];
    const e2z = e1[0] * u[1] - e1[1] * u[0];
    out.clockRad = Math.atan2(mx * e2x + my * e2y + mz * e2z, mx * e1[0] + my * e1[1] + mz * e1[2]);
    return out;
  };
}
