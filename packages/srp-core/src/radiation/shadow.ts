/**
 * Shadow: the illuminated fraction ν ∈ [0, 1] of the solar disc seen from a spacecraft, under no
 * shadow, a cylindrical shadow, or a conical shadow (umbra, penumbra, antumbra) of one or two
 * occulting spheres (the Earth and the Moon). Multiply the unshadowed irradiance by ν.
 *
 * Conventions. All positions in one inertial frame (ECI EQJ in practice), in metres; what matters
 * is differences. Angles in radians. The solar disc is uniformly bright (no limb darkening, which
 * shifts ν by a few per cent inside the penumbra only).
 *
 * Source: Montenbruck & Gill, Satellite Orbits (Springer, 2000), §3.4.2 "Shadow Models": the
 * cylindrical model and the conical model with apparent radii a = asin(R⊙/|r⊙ − r|),
 * b = asin(R_B/|r_B − r|), separation c, and the occulted area
 * A = a² acos(x/a) + b² acos((c − x)/b) − c y, x = (c² + a² − b²)/(2c), y = √(a² − x²),
 * ν = 1 − A/(π a²) (eqs. 3.79–3.87 or thereabouts; the equation numbers are from memory, the
 * formulas are re-derived in the tests by an independent route). Like that book, the discs are
 * treated as plane circles of angular radius a and b; for a large body (b of tens of degrees, a
 * low orbit) the limb's curvature is then 1/b instead of cot b, which moves ν by at most ~6e-4
 * inside the penumbra (against exact ray casting in the tests: ≤ 1.4e-4 for a 60° Moon).
 */
import { EARTH_EQUATORIAL_RADIUS, MOON_RADIUS, SUN_RADIUS } from '../bodies/body-constants';
import type { ReadonlyVec3 } from '../math/vec3';

/** The shadow models offered. */
export const shadowModels = ['none', 'cylindrical', 'conical'] as const;
/** `none`: always lit; `cylindrical`: lit or not behind a cylinder; `conical`: umbra and penumbra. */
export type ShadowModel = (typeof shadowModels)[number];

/** The apparent geometry of the Sun and one occulting body, seen from the spacecraft. */
export interface ApparentDiscs {
  /** Apparent (angular) radius of the Sun, a (rad). */
  sunRadiusRad: number;
  /** Apparent (angular) radius of the occulting body, b (rad); π/2 when inside it. */
  bodyRadiusRad: number;
  /** Angle between the directions to the Sun's and the body's centres, c (rad). */
  separationRad: number;
}

/** Allocates an `ApparentDiscs` record to reuse as the output of `apparentDiscs`. */
export function createApparentDiscs(): ApparentDiscs {
  return { sunRadiusRad: 0, bodyRadiusRad: 0, separationRad: 0 };
}

/**
 * The apparent radii a, b and separation c of the Sun and an occulting body seen from `rSat`.
 * Allocates nothing. The separation is atan2(|u × v|, u · v), accurate at every angle (acos of
 * a dot product loses half the digits near 0).
 * @param rSat spacecraft position (m)
 * @param sunPos Sun centre (m), same frame
 * @param bodyPos occulting body centre (m), same frame
 * @param bodyRadiusM body radius (m)
 * @param sunRadiusM solar radius (m); default SUN_RADIUS (IAU 2015 B3 nominal)
 */
export function apparentDiscs(
  out: ApparentDiscs,
  rSat: ReadonlyVec3,
  sunPos: ReadonlyVec3,
  bodyPos: ReadonlyVec3,
  bodyRadiusM: number,
  sunRadiusM: number = SUN_RADIUS,
): ApparentDiscs {
  const ux = sunPos[0] - rSat[0];
  const uy = sunPos[1] - rSat[1];
  const uz = sunPos[2] - rSat[2];
  const vx = bodyPos[0] - rSat[0];
  const vy = bodyPos[1] - rSat[1];
  const vz = bodyPos[2] - rSat[2];
  // Written exactly as in conicalShadowFraction so both give bit-identical angles.
  const invDu = 1 / Math.sqrt(ux * ux + uy * uy + uz * uz);
  const invDv = 1 / Math.sqrt(vx * vx + vy * vy + vz * vz);
  // Ratios above 1 mean the spacecraft is inside the sphere: cap at 1 (half the sky covered).
  out.sunRadiusRad = Math.asin(Math.min(1, sunRadiusM * invDu));
  out.bodyRadiusRad = Math.asin(Math.min(1, bodyRadiusM * invDv));
  const cx = uy * vz - uz * vy;
  const cy = uz * vx - ux * vz;
  const cz = ux * vy - uy * vx;
  out.separationRad = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ux * vx + uy * vy + uz * vz);
  return out;
}

/**
 * Visible fraction of a uniformly bright disc of angular radius a when a disc of angular radius b
 * lies with its centre at angular distance c from the disc's centre (plane circles).
 * Source: Montenbruck & Gill (2000) §3.4.2 (see the file comment).
 * @param a apparent solar radius (rad), > 0
 * @param b apparent occulting-body radius (rad), ≥ 0
 * @param c centre separation (rad), ≥ 0
 * @returns ν in [0, 1]: 1 in sunlight, 0 in the umbra, 1 − b²/a² in the antumbra (annular)
 */
export function visibleSolarDiscFraction(a: number, b: number, c: number): number {
  if (c >= a + b) return 1;
  if (c <= b - a) return 0;
  if (c <= a - b) return 1 - (b * b) / (a * a);
  const x = (c * c + a * a - b * b) / (2 * c);
  // Rounding can push |x| past a or the acos arguments past 1 at the contacts: clamp.
  const y = Math.sqrt(Math.max(0, a * a - x * x));
  const area =
    a * a * Math.acos(Math.min(1, Math.max(-1, x / a))) + b * b * Math.acos(Math.min(1, Math.max(-1, (c - x) / b))) - c * y;
  const nu = 1 - area / (Math.PI * a * a);
  return nu < 0 ? 0 : nu > 1 ? 1 : nu;
}

/**
 * Cylindrical shadow: 0 when the spacecraft is on the night side of the body and within the
 * cylinder of the body's radius along the Sun–body line, 1 otherwise (no penumbra).
 * Source: Montenbruck & Gill (2000) §3.4.2, cylindrical model (from memory).
 * @param rSat spacecraft position (m)
 * @param sunPos Sun centre (m), same frame
 * @param bodyPos occulting body centre (m), same frame
 * @param bodyRadiusM body radius (m)
 * @returns 0 or 1
 */
export function cylindricalShadowFraction(
  rSat: ReadonlyVec3,
  sunPos: ReadonlyVec3,
  bodyPos: ReadonlyVec3,
  bodyRadiusM: number,
): number {
  const sx = sunPos[0] - bodyPos[0];
  const sy = sunPos[1] - bodyPos[1];
  const sz = sunPos[2] - bodyPos[2];
  const rx = rSat[0] - bodyPos[0];
  const ry = rSat[1] - bodyPos[1];
  const rz = rSat[2] - bodyPos[2];
  const s2 = sx * sx + sy * sy + sz * sz;
  const rs = rx * sx + ry * sy + rz * sz;
  if (rs >= 0) return 1;
  // Squared distance from the shadow axis: |r|² − (r·ŝ)²; compared squared to avoid a root.
  const perp2 = rx * rx + ry * ry + rz * rz - (rs * rs) / s2;
  return perp2 < bodyRadiusM * bodyRadiusM ? 0 : 1;
}

/**
 * Conical shadow of one spherical body: the visible fraction of the solar disc, with umbra,
 * penumbra and antumbra. Allocates nothing; in full sunlight it returns after square roots only
 * (c ≥ a + b tested as cos c ≤ cos(a + b)).
 * Source: Montenbruck & Gill (2000) §3.4.2 (see the file comment).
 * @param rSat spacecraft position (m)
 * @param sunPos Sun centre (m), same frame
 * @param bodyPos occulting body centre (m), same frame
 * @param bodyRadiusM body radius (m)
 * @param sunRadiusM solar radius (m); default SUN_RADIUS (IAU 2015 B3 nominal)
 * @returns ν in [0, 1]
 */
export function conicalShadowFraction(
  rSat: ReadonlyVec3,
  sunPos: ReadonlyVec3,
  bodyPos: ReadonlyVec3,
  bodyRadiusM: number,
  sunRadiusM: number = SUN_RADIUS,
): number {
  const ux = sunPos[0] - rSat[0];
  const uy = sunPos[1] - rSat[1];
  const uz = sunPos[2] - rSat[2];
  const vx = bodyPos[0] - rSat[0];
  const vy = bodyPos[1] - rSat[1];
  const vz = bodyPos[2] - rSat[2];
  const du2 = ux * ux + uy * uy + uz * uz;
  const dv2 = vx * vx + vy * vy + vz * vz;
  const rb2 = bodyRadiusM * bodyRadiusM;
  if (dv2 <= rb2) return 0; // inside the body
  const dot = ux * vx + uy * vy + uz * vz;
  // sin and cos of a and b from the ratios; cos(a + b) = cos a cos b − sin a sin b.
  const invDu = 1 / Math.sqrt(du2);
  const invDv = 1 / Math.sqrt(dv2);
  const sinA = Math.min(1, sunRadiusM * invDu); // capped: inside the Sun is not a case to model
  const sinB = Math.min(1, bodyRadiusM * invDv); // cap: rounding at the surface
  const cosA = Math.sqrt(1 - sinA * sinA);
  const cosB = Math.sqrt(1 - sinB * sinB);
  const cosC = dot * invDu * invDv;
  if (cosC <= cosA * cosB - sinA * sinB) return 1; // c ≥ a + b: the whole disc is visible
  const cx = uy * vz - uz * vy;
  const cy = uz * vx - ux * vz;
  const cz = ux * vy - uy * vx;
  const c = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), dot);
  return visibleSolarDiscFraction(Math.asin(sinA), Math.asin(sinB), c);
}

// Scratch for the three circles (solar disc first) and the intersection angles on one circle.
const circleX = new Float64Array(3);
const circleY = new Float64Array(3);
const circleR = new Float64Array(3);
const angles = new Float64Array(4);

/** True if (x, y) lies inside (or on) every circle but circle k. */
function insideOthers(k: number, x: number, y: number): boolean {
  for (let j = 0; j < 3; j += 1) {
    if (j === k) continue;
    const dx = x - (circleX[j] as number);
    const dy = y - (circleY[j] as number);
    const r = circleR[j] as number;
    if (dx * dx + dy * dy > r * r) return false;
  }
  return true;
}

/**
 * Area of the intersection of the three circles in circleX/Y/R, by Green's theorem: the region's
 * boundary is made of arcs of the circles (each arc of circle k whose points lie inside the other
 * two), and A = ½ ∮ (x dy − y dx). For the arc x = cx + r cos t, y = cy + r sin t, t0 → t1:
 * ½ [r² (t1 − t0) + r cx (sin t1 − sin t0) − r cy (cos t1 − cos t0)], with the differences of
 * sines and cosines written as products (2 cos t̄ sin h, −2 sin t̄ sin h) to keep short arcs of
 * large circles precise. Exact up to rounding. Source: Green's theorem in the plane (any calculus
 * text), applied to the arc as derived here.
 */
function tripleIntersectionArea(): number {
  let area = 0;
  for (let k = 0; k < 3; k += 1) {
    const cx = circleX[k] as number;
    const cy = circleY[k] as number;
    const r = circleR[k] as number;
    let m = 0;
    for (let j = 0; j < 3; j += 1) {
      if (j === k) continue;
      const dx = (circleX[j] as number) - cx;
      const dy = (circleY[j] as number) - cy;
      const rj = circleR[j] as number;
      const d = Math.sqrt(dx * dx + dy * dy);
      if (d === 0 || d >= r + rj || d <= Math.abs(r - rj)) continue;
      const alpha = Math.atan2(dy, dx);
      // Rounding near tangency can push the cosine just past ±1: clamp.
      const beta = Math.acos(Math.min(1, Math.max(-1, (r * r + d * d - rj * rj) / (2 * r * d))));
      angles[m++] = alpha - beta;
      angles[m++] = alpha + beta;
    }
    if (m === 0) {
      // The whole circle is in or out: test one point of it.
      if (insideOthers(k, cx + r, cy)) area += Math.PI * r * r;
      continue;
    }
    // Sort the angles, reduced to [0, 2π) (m ≤ 4: insertion sort).
    for (let i = 0; i < m; i += 1) {
      let v = (angles[i] as number) % (2 * Math.PI);
      if (v < 0) v += 2 * Math.PI;
      let j = i - 1;
      while (j >= 0 && (angles[j] as number) > v) {
        angles[j + 1] = angles[j] as number;
        j -= 1;
      }
      angles[j + 1] = v;
    }
    for (let i = 0; i < m; i += 1) {
      const t0 = angles[i] as number;
      const t1 = i + 1 < m ? (angles[i + 1] as number) : (angles[0] as number) + 2 * Math.PI;
      const mid = (t0 + t1) / 2;
      const cosMid = Math.cos(mid);
      const sinMid = Math.sin(mid);
      if (!insideOthers(k, cx + r * cosMid, cy + r * sinMid)) continue;
      const sinHalf = Math.sin((t1 - t0) / 2);
      area += 0.5 * (r * r * (t1 - t0) + r * cx * 2 * cosMid * sinHalf + r * cy * 2 * sinMid * sinHalf);
    }
  }
  return area;
}

/**
 * Fraction of the solar disc (radius a, centred at the origin) covered by the union of two discs,
 * exactly in the plane-circle model: cover(1) + cover(2) − |S ∩ D1 ∩ D2| / (π a²), the pairwise
 * covers by the closed form and the triple intersection by Green's theorem over its boundary arcs.
 * Clamped to [max(cover1, cover2), min(1, cover1 + cover2)], which the exact value satisfies, so
 * rounding cannot break those bounds. Allocates nothing.
 * @param a solar disc radius (rad)
 * @param b1 first disc radius (rad), centre (c1, 0)
 * @param c1 first disc centre distance (rad)
 * @param b2 second disc radius (rad), centre (c2 cos φ, c2 sin φ)
 * @param c2 second disc centre distance (rad)
 * @param phi angle at the solar centre between the two discs' centres (rad)
 * @returns occulted fraction in [0, 1]
 */
export function twoDiscOccultedFraction(a: number, b1: number, c1: number, b2: number, c2: number, phi: number): number {
  const cover1 = 1 - visibleSolarDiscFraction(a, b1, c1);
  const cover2 = 1 - visibleSolarDiscFraction(a, b2, c2);
  circleX[0] = 0;
  circleY[0] = 0;
  circleR[0] = a;
  circleX[1] = c1;
  circleY[1] = 0;
  circleR[1] = b1;
  circleX[2] = c2 * Math.cos(phi);
  circleY[2] = c2 * Math.sin(phi);
  circleR[2] = b2;
  const union = cover1 + cover2 - tripleIntersectionArea() / (Math.PI * a * a);
  const lo = Math.max(cover1, cover2);
  const hi = Math.min(1, cover1 + cover2);
  return union < lo ? lo : union > hi ? hi : union;
}

const ORIGIN: ReadonlyVec3 = [0, 0, 0];
const discs1 = createApparentDiscs();
const discs2 = createApparentDiscs();

/**
 * Conical shadow of two spherical bodies at once (the Earth and the Moon): the fraction of the
 * solar disc covered by neither, exact in the plane-circle model in every configuration: the
 * covered areas add when the two discs are apart, the larger counts alone when one holds the
 * other, and otherwise their overlap inside the solar disc is subtracted (`twoDiscOccultedFraction`).
 * Never below 0, unlike 1 − (1 − ν₁) − (1 − ν₂) when the two discs overlap on the Sun.
 * The second disc is placed by its true direction about the solar centre (the spherical angle
 * between the two bodies there), so each limb sits where it should on the solar disc.
 * @param rSat spacecraft position (m)
 * @param sunPos Sun centre (m), same frame
 * @param body1Pos first body centre (m), same frame
 * @param body1RadiusM first body radius (m)
 * @param body2Pos second body centre (m), same frame
 * @param body2RadiusM second body radius (m)
 * @param sunRadiusM solar radius (m); default SUN_RADIUS
 * @returns ν in [0, 1]
 */
export function twoBodyConicalShadowFraction(
  rSat: ReadonlyVec3,
  sunPos: ReadonlyVec3,
  body1Pos: ReadonlyVec3,
  body1RadiusM: number,
  body2Pos: ReadonlyVec3,
  body2RadiusM: number,
  sunRadiusM: number = SUN_RADIUS,
): number {
  const nu1 = conicalShadowFraction(rSat, sunPos, body1Pos, body1RadiusM, sunRadiusM);
  if (nu1 === 0) return 0;
  const nu2 = conicalShadowFraction(rSat, sunPos, body2Pos, body2RadiusM, sunRadiusM);
  if (nu1 === 1 || nu2 === 0) return nu2;
  if (nu2 === 1) return nu1;
  // Both cover part of the Sun.
  apparentDiscs(discs1, rSat, sunPos, body1Pos, body1RadiusM, sunRadiusM);
  apparentDiscs(discs2, rSat, sunPos, body2Pos, body2RadiusM, sunRadiusM);
  const a = discs1.sunRadiusRad;
  const b1 = discs1.bodyRadiusRad;
  const c1 = discs1.separationRad;
  const b2 = discs2.bodyRadiusRad;
  const c2 = discs2.separationRad;
  // Angle at the Sun's centre between the two bodies: project both directions onto the plane
  // normal to the Sun direction.
  const ux = sunPos[0] - rSat[0];
  const uy = sunPos[1] - rSat[1];
  const uz = sunPos[2] - rSat[2];
  const iu = 1 / Math.sqrt(ux * ux + uy * uy + uz * uz);
  const sx = ux * iu;
  const sy = uy * iu;
  const sz = uz * iu;
  let px = body1Pos[0] - rSat[0];
  let py = body1Pos[1] - rSat[1];
  let pz = body1Pos[2] - rSat[2];
  let k = px * sx + py * sy + pz * sz;
  px -= k * sx;
  py -= k * sy;
  pz -= k * sz;
  let qx = body2Pos[0] - rSat[0];
  let qy = body2Pos[1] - rSat[1];
  let qz = body2Pos[2] - rSat[2];
  k = qx * sx + qy * sy + qz * sz;
  qx -= k * sx;
  qy -= k * sy;
  qz -= k * sz;
  const crx = py * qz - pz * qy;
  const cry = pz * qx - px * qz;
  const crz = px * qy - py * qx;
  const phi = Math.atan2(Math.sqrt(crx * crx + cry * cry + crz * crz), px * qx + py * qy + pz * qz);
  const dx = c2 * Math.cos(phi) - c1;
  const dy = c2 * Math.sin(phi);
  const d = Math.sqrt(dx * dx + dy * dy);
  if (d >= b1 + b2) {
    const nu = nu1 + nu2 - 1; // disjoint discs: the occulted areas add
    return nu < 0 ? 0 : nu;
  }
  if (d + b2 <= b1) return nu1; // disc 2 inside disc 1
  if (d + b1 <= b2) return nu2; // disc 1 inside disc 2
  const nu = 1 - twoDiscOccultedFraction(a, b1, c1, b2, c2, phi);
  // The union bounds, restated on ν so that rounding in 1 − x cannot cross them.
  const lo = Math.max(0, nu1 + nu2 - 1);
  const hi = nu1 < nu2 ? nu1 : nu2;
  return nu < lo ? lo : nu > hi ? hi : nu;
}

/**
 * Illuminated fraction ν for a spacecraft near the Earth under a shadow model, with the Earth
 * (sphere of EARTH_EQUATORIAL_RADIUS at the origin) and optionally the Moon (MOON_RADIUS) as
 * occulting bodies. Cylindrical: 0 if behind either body's cylinder.
 * @param model `none`, `cylindrical` or `conical`
 * @param rSatEci spacecraft position (m, ECI EQJ)
 * @param sunPosEci Sun position (m, ECI EQJ)
 * @param moonPosEci Moon position (m, ECI EQJ), or null to ignore the Moon
 * @returns ν in [0, 1]
 */
export function earthMoonShadowFraction(
  model: ShadowModel,
  rSatEci: ReadonlyVec3,
  sunPosEci: ReadonlyVec3,
  moonPosEci: ReadonlyVec3 | null,
): number {
  if (model === 'none') return 1;
  if (model === 'cylindrical') {
    if (cylindricalShadowFraction(rSatEci, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS) === 0) return 0;
    return moonPosEci ? cylindricalShadowFraction(rSatEci, sunPosEci, moonPosEci, MOON_RADIUS) : 1;
  }
  if (!moonPosEci) return conicalShadowFraction(rSatEci, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
  if (earthAndMoonClearOfSun(rSatEci, sunPosEci, moonPosEci)) return 1;
  return twoBodyConicalShadowFraction(rSatEci, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS, moonPosEci, MOON_RADIUS);
}

// The radii as module constants: under tsx an imported binding is a getter call on every read.
const SUN_R = SUN_RADIUS;
const EARTH_R = EARTH_EQUATORIAL_RADIUS;
const MOON_R = MOON_RADIUS;

/**
 * True when neither the Earth's disc (centred at the origin) nor the Moon's touches the solar
 * disc seen from the spacecraft (c ≥ a + b for both): the full-Sun answer of
 * `twoBodyConicalShadowFraction`, reached with the Sun's terms computed once. The tests are
 * `conicalShadowFraction`'s, written identically, so the decision is the same to the bit. A Moon
 * behind the spacecraft (u · v < 0, c > 90°) with sin²a and sin²b below 1/4 (a + b < 60°, far
 * from any rounding) is passed without its square roots.
 */
function earthAndMoonClearOfSun(rSat: ReadonlyVec3, sunPos: ReadonlyVec3, moonPos: ReadonlyVec3): boolean {
  const rx = rSat[0];
  const ry = rSat[1];
  const rz = rSat[2];
  const ux = sunPos[0] - rx;
  const uy = sunPos[1] - ry;
  const uz = sunPos[2] - rz;
  const du2 = ux * ux + uy * uy + uz * uz;
  const invDu = 1 / Math.sqrt(du2);
  const sinA = Math.min(1, SUN_R * invDu);
  const cosA = Math.sqrt(1 - sinA * sinA);
  // The Earth: v = 0 − r.
  const ex = 0 - rx;
  const ey = 0 - ry;
  const ez = 0 - rz;
  const de2 = ex * ex + ey * ey + ez * ez;
  if (de2 <= EARTH_R * EARTH_R) return false;
  const invDe = 1 / Math.sqrt(de2);
  const sinE = Math.min(1, EARTH_R * invDe);
  const cosE = Math.sqrt(1 - sinE * sinE);
  if (!((ux * ex + uy * ey + uz * ez) * invDu * invDe <= cosA * cosE - sinA * sinE)) return false;
  // The Moon.
  const mx = moonPos[0] - rx;
  const my = moonPos[1] - ry;
  const mz = moonPos[2] - rz;
  const dm2 = mx * mx + my * my + mz * mz;
  const rm2 = MOON_R * MOON_R;
  if (dm2 <= rm2) return false;
  const dot = ux * mx + uy * my + uz * mz;
  if (dot < 0 && SUN_R * SUN_R < 0.25 * du2 && rm2 < 0.25 * dm2) return true;
  const invDm = 1 / Math.sqrt(dm2);
  const sinM = Math.min(1, MOON_R * invDm);
  const cosM = Math.sqrt(1 - sinM * sinM);
  return dot * invDu * invDm <= cosA * cosM - sinA * sinM;
}
