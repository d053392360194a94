import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { createVec3 } from '../math/vec3';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { radiationPressureAt } from '../radiation/flux';
import { createFlatPlate, flatPlateForce } from './flat-plate';
import type { SurfaceOptics } from './surface-optics';

// Reference values are built here from the published constants, not from the code under test.
const AU_M = 149_597_870_700; // source: IAU 2012 Resolution B2
const S0 = 1361; // source: IAU 2015 Resolution B3
const C = 299_792_458; // source: SI Brochure, 9th edition (exact)
const P_1AU = S0 / C; // 4.5398e-6 Pa

// A few double-precision operations, each rounding by at most 1.1e-16 relative: 1e-12 of the
// force magnitude leaves wide margin yet catches any wrong factor, sign or direction.
const REL_TOL = 1e-12;

const ABSORBER: SurfaceOptics = { absorbed: 1, specular: 0, diffuse: 0 };
const MIRROR: SurfaceOptics = { absorbed: 0, specular: 1, diffuse: 0 };
const WHITE_DIFFUSE: SurfaceOptics = { absorbed: 0, specular: 0, diffuse: 1 };
const Z: ReadonlyVec3 = [0, 0, 1];
const AREA = 12; // m², an arbitrary plate so that a missing area factor shows

function expectVecClose(actual: ReadonlyVec3, expected: ReadonlyVec3, relTol: number): void {
  const bound = relTol * Math.hypot(...expected);
  expect(Math.abs(actual[0] - expected[0])).toBeLessThanOrEqual(bound);
  expect(Math.abs(actual[1] - expected[1])).toBeLessThanOrEqual(bound);
  expect(Math.abs(actual[2] - expected[2])).toBeLessThanOrEqual(bound);
}

/** Unit vector to the Sun at incidence angle `theta` (rad) from +z, in the x-z plane. */
function sunAt(theta: number): ReadonlyVec3 {
  return [Math.sin(theta), 0, Math.cos(theta)];
}

/** Force (N) on a plate facing +z, at `distanceM` from the Sun. */
function forceOn(front: SurfaceOptics, area: number, satToSun: ReadonlyVec3, distanceM = AU_M): Vec3 {
  const plate = createFlatPlate({ area, normal: Z, front });
  return flatPlateForce(createVec3(), plate, satToSun, radiationPressureAt(distanceM));
}

function fieldError(code: string, field: string): unknown {
  return expect.objectContaining({
    name: 'SrpError',
    code,
    details: expect.objectContaining({ field }),
  });
}

describe('flatPlateForce at normal incidence', () => {
  it('a fully absorbing 1 m² plate at 1 au gets S0·A/c ≈ 4.5398e-6 N away from the Sun', () => {
    // source: 1361 W/m² × 1 m² / 299 792 458 m/s = 4.539807335646850e-6 N, divided by hand
    expectVecClose(forceOn(ABSORBER, 1, Z), [0, 0, -4.53980733564685e-6], REL_TOL);
  });

  it('a perfect mirror gets twice the absorber force', () => {
    // source: specular reflection reverses the incident momentum, 2 S A / c (by hand)
    expectVecClose(forceOn(MIRROR, AREA, Z), [0, 0, -2 * P_1AU * AREA], REL_TOL);
  });

  it('a purely diffuse white plate gets (1 + 2/3) P A', () => {
    // source: Lambertian re-emission carries ∫cos²θ dΩ / ∫cosθ dΩ = (2π/3)/π = 2/3 of the
    // incident momentum back along the normal, on top of the absorbed incident momentum (by hand)
    const expected: ReadonlyVec3 = [0, 0, -(1 + 2 / 3) * P_1AU * AREA];
    expectVecClose(forceOn(WHITE_DIFFUSE, AREA, Z), expected, REL_TOL);
  });
});

describe('flatPlateForce with distance from the Sun', () => {
  it('an absorber at 0.5 au gets four times its force at 1 au', () => {
    // source: inverse-square law, (1 / 0.5)² = 4
    const expected: ReadonlyVec3 = [0, 0, -4 * P_1AU * AREA];
    expectVecClose(forceOn(ABSORBER, AREA, Z, 0.5 * AU_M), expected, REL_TOL);
  });

  it('an absorber at 5.2 au gets 1/27.04 of its force at 1 au', () => {
    // source: inverse-square law, 5.2² = 27.04
    const expected: ReadonlyVec3 = [0, 0, (-P_1AU * AREA) / 27.04];
    expectVecClose(forceOn(ABSORBER, AREA, Z, 5.2 * AU_M), expected, REL_TOL);
  });
});

describe('flatPlateForce at oblique incidence', () => {
  const theta = (35 * Math.PI) / 180;
  const s = sunAt(theta);
  const cos = Math.cos(theta);

  it('an absorber at 35° gets P A cos θ along the light direction', () => {
    // source: absorbed momentum flux P through the projected area A cos θ, along -s (by hand)
    const k = P_1AU * AREA * cos;
    expectVecClose(forceOn(ABSORBER, AREA, s), [-k * s[0], -k * s[1], -k * s[2]], REL_TOL);
  });

  it('a mirror at 35° gets 2 P A cos² θ along the inward normal and nothing in the plane', () => {
    // source: specular reflection reverses only the normal momentum component (by hand)
    const expected: ReadonlyVec3 = [0, 0, -2 * P_1AU * AREA * cos * cos];
    expectVecClose(forceOn(MIRROR, AREA, s), expected, REL_TOL);
  });

  it('a mixed coating gets the fraction-weighted sum of the three pure responses', () => {
    // source: each mode derived separately by hand: absorbed and diffuse light deposit P A cos θ
    // along -s, specular light adds 2 P A cos² θ and Lambertian re-emission (2/3) P A cos θ
    // along -n
    const optics = { absorbed: 0.3, specular: 0.5, diffuse: 0.2 };
    const pa = P_1AU * AREA;
    const alongLight = (optics.absorbed + optics.diffuse) * pa * cos;
    const alongNormal = optics.specular * 2 * pa * cos * cos + optics.diffuse * (2 / 3) * pa * cos;
    const expected: ReadonlyVec3 = [
      -alongLight * s[0],
      -alongLight * s[1],
      -alongLight * s[2] - alongNormal,
    ];
    expectVecClose(forceOn(optics, AREA, s), expected, REL_TOL);
  });

  it('a plate with the Sun 120° off its front normal (behind it) feels no force', () => {
    expect(forceOn(MIRROR, AREA, sunAt((120 * Math.PI) / 180))).toEqual([0, 0, 0]);
  });
});

describe('flatPlateForce and createFlatPlate contracts', () => {
  it('writes into and returns the output vector it was given', () => {
    const out = createVec3(9, 9, 9);
    const plate = createFlatPlate({ area: 1, normal: Z, front: ABSORBER });
    expect(flatPlateForce(out, plate, Z, P_1AU)).toBe(out);
    expect(out[2]).toBeLessThan(0);
  });

  it('normalises a plate normal given at any length', () => {
    const plate = createFlatPlate({ area: 1, normal: [0, 0, 5], front: ABSORBER });
    expect(plate.normal).toEqual([0, 0, 1]);
  });

  it('refuses optics that do not sum to 1 with an SrpError naming plate.front', () => {
    const front = { absorbed: 0.5, specular: 0.4, diffuse: 0.2 };
    expect(() => createFlatPlate({ area: 1, normal: Z, front })).toThrow(
      fieldError('optics_sum', 'plate.front'),
    );
  });

  it('refuses a zero area with an SrpError naming plate.area', () => {
    expect(() => createFlatPlate({ area: 0, normal: Z, front: ABSORBER })).toThrow(
      fieldError('out_of_range', 'plate.area'),
    );
  });

  it('refuses a zero normal with an SrpError naming plate.normal', () => {
    expect(() => createFlatPlate({ area: 1, normal: [0, 0, 0], front: ABSORBER })).toThrow(
      fieldError('invalid_input', 'plate.normal'),
    );
  });

  it('refuses an unnormalised Sun direction with an SrpError naming satToSun', () => {
    const plate = createFlatPlate({ area: 1, normal: Z, front: ABSORBER });
    expect(() => flatPlateForce(createVec3(), plate, [0, 0, 2], P_1AU)).toThrow(
      fieldError('invalid_input', 'satToSun'),
    );
  });

  it('refuses a NaN pressure instead of returning NaN', () => {
    const plate = createFlatPlate({ area: 1, normal: Z, front: ABSORBER });
    expect(() => flatPlateForce(createVec3(), plate, Z, Number.NaN)).toThrow(SrpError);
  });
});

describe('flatPlateForce on a two-sided plate with thermal re-emission', () => {
  // A black plate (absorbs everything) whose front face radiates with ε = 0.9 and back face with
  // ε = 0.1; emissivities given on the front only, so the back inherits them swapped.
  const plate = createFlatPlate({
    area: AREA,
    normal: Z,
    front: { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.9, emissivityBack: 0.1 },
    back: ABSORBER,
  });
  // By hand, face by face: in steady state the absorbed power W = P c A splits 0.9 : 0.1 between
  // the faces; Lambertian emission of power w from a face pushes it with (2/3) w / c against
  // that face's outward normal (source: Montenbruck & Gill 2000, §3.4, the 2/3 of a Lambertian
  // emitter). Front face: 0.6 P A along -n; back face: 0.0667 P A along +n.
  const front = (2 / 3) * 0.9 * P_1AU * AREA;
  const back = (2 / 3) * 0.1 * P_1AU * AREA;

  it('lit on the front, the light and the hotter-radiating front both push along -n', () => {
    const expected: ReadonlyVec3 = [0, 0, -P_1AU * AREA - front + back];
    expectVecClose(flatPlateForce(createVec3(), plate, Z, P_1AU), expected, REL_TOL);
  });

  it('lit on the back, the light pushes along +n but the front face still radiates more and pushes back', () => {
    const expected: ReadonlyVec3 = [0, 0, P_1AU * AREA - front + back];
    expectVecClose(flatPlateForce(createVec3(), plate, [0, 0, -1], P_1AU), expected, REL_TOL);
  });

  it('lit on the back at 60°, it follows the same flat-plate law about -n with the back optics', () => {
    // source: Montenbruck & Gill 2000, §3.4 with m = -n; the absorber's thermal term as above
    const theta = (60 * Math.PI) / 180;
    const s: ReadonlyVec3 = [Math.sin(theta), 0, -Math.cos(theta)];
    const cos = Math.cos(theta);
    const thermal = (2 / 3) * ((0.1 - 0.9) / (0.1 + 0.9)); // lit face radiates 0.1, the other 0.9
    const k = -P_1AU * AREA * cos;
    const expected: ReadonlyVec3 = [k * s[0], 0, k * s[2] - k * thermal];
    expectVecClose(flatPlateForce(createVec3(), plate, s, P_1AU), expected, REL_TOL);
  });
});
