import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { compileVehicle } from './compile-vehicle';
import { createSrpResult, evaluateSrp } from './evaluate-srp';
import { surfaceNormalBody } from './sun-tracking';
import type { PlateSpec } from './vehicle-spec';
import { DEG, P_1AU, dot, expectVecClose, srpErrorFor } from './vehicle-test-helpers';

// Unit vectors from a few operations each: 1e-12 absolute is far above rounding and far below
// any wrong angle worth catching (1e-12 rad).
const TOL = 1e-12;

/** A wing turning about body +y, reference normal +x (so drive angle φ puts the normal at (cos φ, 0, -sin φ)). */
function wing(extra: Partial<PlateSpec> = {}) {
  return compileVehicle({
    kind: 'plates',
    name: 'wing test',
    massKg: 100,
    centreOfMassM: [0, 0, 0],
    plates: [
      {
        name: 'wing',
        areaM2: 10,
        normal: [1, 0, 0],
        centroidM: [0, 5, 0],
        front: 'solar-cell',
        back: 'solar-array-back',
        trackingAxis: [0, 1, 0],
        ...extra,
      },
    ],
  });
}

/** The normal at drive angle φ about +y from +x (right-handed): by hand, R_y(φ) x̂. */
function atAngle(phi: number): Vec3 {
  return [Math.cos(phi), 0, -Math.sin(phi)];
}

/** A Sun direction with drive optimum φ* and elevation `el` out of the drive plane. */
function sunAt(phiStar: number, el = 0): Vec3 {
  return [Math.cos(el) * Math.cos(phiStar), Math.sin(el), -Math.cos(el) * Math.sin(phiStar)];
}

describe('a Sun-tracking wing without limits', () => {
  it('turns its normal to the Sun’s projection on the drive plane, the best incidence possible', () => {
    const v = wing();
    const s: Vec3 = [0.3 / Math.SQRT2, 0.5, -0.8 / Math.SQRT2].map((c, _, a) => c / Math.hypot(...a)) as Vec3;
    const n = surfaceNormalBody([0, 0, 0], v, 0, s);
    const projected = [s[0], 0, s[2]];
    const length = Math.hypot(s[0], s[2]);
    expectVecClose(n, projected.map((c) => c / length) as Vec3, 0, TOL);
    // by hand: the largest n · s over the drive circle is the in-plane length √(1 - (s·a)²)
    expect(Math.abs(dot(n, s) - Math.sqrt(1 - s[1] * s[1]))).toBeLessThan(TOL);
  });

  it('faces the Sun exactly when the Sun lies in the drive plane, at any drive angle', () => {
    const v = wing();
    for (const deg of [-170, -90, -10, 0, 45, 135, 180]) {
      const s = sunAt(deg * DEG);
      expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, s), s, 0, TOL);
    }
  });

  it('rests at its reference normal when the Sun is along the drive axis', () => {
    expect(surfaceNormalBody([0, 0, 0], wing(), 0, [0, 1, 0])).toEqual([1, 0, 0]);
  });
});

describe('a Sun-tracking wing with drive limits [-30°, +30°]', () => {
  const v = wing({ trackingLimitsRad: [-30 * DEG, 30 * DEG] });

  it('within the limits it faces the Sun', () => {
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(20 * DEG)), sunAt(20 * DEG), 0, TOL);
  });

  it('with the Sun beyond +30° it stops at +30°', () => {
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(50 * DEG, 0.2)), atAngle(30 * DEG), 0, TOL);
  });

  it('with the Sun beyond -30° it stops at -30°', () => {
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(-100 * DEG)), atAngle(-30 * DEG), 0, TOL);
  });

  it('with the Sun nearly behind it stops at the limit nearer the Sun around the circle', () => {
    // φ* = 170°: 140° from +30°, 160° from -30°; φ* = -170°: the mirror image
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(170 * DEG)), atAngle(30 * DEG), 0, TOL);
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(-170 * DEG)), atAngle(-30 * DEG), 0, TOL);
  });

  it('stopped with the Sun behind, the back takes the light and the force is the back’s', () => {
    const s = sunAt(170 * DEG);
    const back = compileVehicle({
      kind: 'plates',
      name: 'fixed at +30°',
      massKg: 100,
      centreOfMassM: [0, 0, 0],
      plates: [{ name: 'w', areaM2: 10, normal: atAngle(30 * DEG), centroidM: [0, 5, 0], front: 'solar-cell', back: 'solar-array-back' }],
    });
    const tracked = evaluateSrp(createSrpResult(v), v, s, P_1AU, 1);
    const fixed = evaluateSrp(createSrpResult(back), back, s, P_1AU, 1);
    expect(dot(atAngle(30 * DEG), s)).toBeLessThan(0);
    // same plate, same orientation: the two paths agree to rounding
    expectVecClose(tracked.forceBody, fixed.forceBody, 1e-12);
    expectVecClose(tracked.torqueBody, fixed.torqueBody, 1e-12);
  });
});

describe('a drive window that straddles ±180° ([90°, 270°])', () => {
  const v = wing({ trackingLimitsRad: [90 * DEG, 270 * DEG] });

  it('follows the Sun across 180°', () => {
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(200 * DEG)), sunAt(200 * DEG), 0, TOL);
  });

  it('stops at 90° for a Sun at 10° (80° away, against 100° to 270°)', () => {
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, sunAt(10 * DEG)), atAngle(90 * DEG), 0, TOL);
  });

  it('rests at the limit nearest 0° when the Sun is along the axis', () => {
    // 0° is outside the window; 90° and 270° (= -90°) are equally near, the code takes min (90°)
    expectVecClose(surfaceNormalBody([0, 0, 0], v, 0, [0, 1, 0]), atAngle(90 * DEG), 0, TOL);
  });
});

describe('tracking keeps the plate’s centroid fixed', () => {
  it('the torque is the lever arm from the centre of mass to the fixed centroid, crossed with the force', () => {
    const v = wing();
    const s = sunAt(40 * DEG, 0.3);
    const r = evaluateSrp(createSrpResult(v), v, s, P_1AU, 1);
    const f = r.forceBody;
    const lever: Vec3 = [0, 5, 0];
    const expected: Vec3 = [lever[1] * f[2] - lever[2] * f[1], lever[2] * f[0] - lever[0] * f[2], lever[0] * f[1] - lever[1] * f[0]];
    expectVecClose(r.torqueBody, expected, 1e-12);
  });
});

describe('the evaluation loop and surfaceNormalBody turn the wing the same way', () => {
  it('from 300 Sun directions, the tracked force equals that of a fixed plate at surfaceNormalBody’s normal', () => {
    // evaluateSrp carries an inlined copy of the tracking code: this holds the copies together
    for (const limits of [undefined, [-30 * DEG, 30 * DEG], [90 * DEG, 270 * DEG]] as const) {
      const v = wing(limits ? { trackingLimitsRad: limits } : {});
      const result = createSrpResult(v);
      for (let i = 0; i < 300; i += 1) {
        const z = 1 - (2 * (i + 0.5)) / 300;
        const s: Vec3 = [Math.sqrt(1 - z * z) * Math.cos(2.4 * i), Math.sqrt(1 - z * z) * Math.sin(2.4 * i), z];
        const n = surfaceNormalBody([0, 0, 0], v, 0, s);
        const fixed = compileVehicle({
          kind: 'plates',
          name: 'fixed',
          massKg: 100,
          centreOfMassM: [0, 0, 0],
          plates: [{ name: 'w', areaM2: 10, normal: n, centroidM: [0, 5, 0], front: 'solar-cell', back: 'solar-array-back' }],
        });
        const f = evaluateSrp(result, v, s, P_1AU, 1).forceBody;
        // same plate law, normals equal to ~1e-16: 1e-12 of the force, or 1e-20 N near edge-on
        expectVecClose(f, evaluateSrp(createSrpResult(fixed), fixed, s, P_1AU, 1).forceBody, 1e-12, 1e-20);
      }
    }
  });
});

describe('surfaceNormalBody', () => {
  it('refuses a surface index out of range, naming surface', () => {
    expect(() => surfaceNormalBody([0, 0, 0], wing(), 1, [1, 0, 0])).toThrow(srpErrorFor('out_of_range', 'surface'));
  });
});
