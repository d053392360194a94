import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { compileVehicle } from './compile-vehicle';
import { createSrpResult, evaluateSrp } from './evaluate-srp';
import { sailOpticsPresets } from './sail-optics';
import type { SailOpticsInput, SailSpec } from './vehicle-spec';
import { DEG, P_1AU, dot, expectVecClose, norm, srpErrorFor } from './vehicle-test-helpers';

// A few double-precision operations per component: 1e-12 of the force magnitude.
const REL_TOL = 1e-12;
const AREA = 196; // m², a 14 m square sail

// source: McInnes, Solar Sailing (1999), §2.6, JPL square sail (from memory)
const SQUARE = { r: 0.88, s: 0.94, ef: 0.05, eb: 0.55, bf: 0.79, bb: 0.55 };

function sail(optics: SailOpticsInput, extra: Partial<SailSpec> = {}) {
  return compileVehicle({
    kind: 'sail',
    name: 'test sail',
    massKg: 10,
    centreOfMassM: [0, 0, 0],
    areaM2: AREA,
    normal: [1, 0, 0],
    centroidM: [0, 0, 0],
    optics,
    ...extra,
  });
}

/**
 * Sun direction for cone angle α: the light travels along u = (cos α, sin α, 0), at α from the
 * sail normal n = +x; the transverse direction of McInnes's model is then t = +y.
 */
function sunForCone(alpha: number): Vec3 {
  return [-Math.cos(alpha), -Math.sin(alpha), 0];
}

function forceAt(v: ReturnType<typeof sail>, alpha: number): Vec3 {
  return evaluateSrp(createSrpResult(v), v, sunForCone(alpha), P_1AU, 1).forceBody;
}

/** McInnes's normal and transverse components, written out by hand (source: McInnes 1999, §2.6). */
function mcInnes(alpha: number): { fn: number; ft: number } {
  const { r, s, ef, eb, bf, bb } = SQUARE;
  const c = Math.cos(alpha);
  const fn =
    P_1AU * AREA * ((1 + r * s) * c * c + bf * (1 - s) * r * c + ((1 - r) * (ef * bf - eb * bb)) / (ef + eb) * c);
  const ft = P_1AU * AREA * (1 - r * s) * c * Math.sin(alpha);
  return { fn, ft };
}

describe('the non-ideal square sail (McInnes 1999 coefficients)', () => {
  const v = sail('mcinnes-square-sail');

  it('the preset holds the published coefficients', () => {
    const p = sailOpticsPresets['mcinnes-square-sail'];
    expect([p.r, p.s, p.emissivityFront, p.emissivityBack, p.nonLambertianFront, p.nonLambertianBack]).toEqual([
      SQUARE.r,
      SQUARE.s,
      SQUARE.ef,
      SQUARE.eb,
      SQUARE.bf,
      SQUARE.bb,
    ]);
  });

  for (const deg of [0, 20, 45, 70, 89]) {
    it(`at cone angle ${deg}° gives McInnes's normal and transverse components`, () => {
      const { fn, ft } = mcInnes(deg * DEG);
      // force = F_n n + F_t t with n = +x and t = +y (the in-plane direction of the light)
      expectVecClose(forceAt(v, deg * DEG), [fn, ft, 0], REL_TOL);
    });
  }

  it('its force points closer to the Sun line than its normal does (the force lags the normal)', () => {
    for (const deg of [10, 30, 50, 70, 85]) {
      const f = forceAt(v, deg * DEG);
      const u = sunForCone(deg * DEG).map((c) => -c);
      const forceCone = Math.acos(Math.min(1, dot(f, u) / norm(f))); // clamp: rounding can exceed 1
      expect(forceCone).toBeLessThan(deg * DEG);
      expect(forceCone).toBeGreaterThan(0);
    }
  });

  it('pushes nothing with the Sun behind the sail (cone angle over 90°)', () => {
    expect(forceAt(v, 120 * DEG)).toEqual([0, 0, 0]);
  });
});

describe('an ideal sail', () => {
  const v = sail('ideal');

  it('is pushed 2 P A cos²α along its normal, nothing across', () => {
    // source: McInnes 1999, §2.3, perfect reflection (from memory)
    for (const deg of [0, 25, 60, 80]) {
      const c = Math.cos(deg * DEG);
      expectVecClose(forceAt(v, deg * DEG), [2 * P_1AU * AREA * c * c, 0, 0], REL_TOL, 1e-22);
    }
  });

  it('gets its largest force across the Sun line at cone angle 35.26° (tan α = 1/√2), found numerically', () => {
    // The component of F perpendicular to the Sun line, maximised by golden-section search over
    // α in (0°, 90°) on the force function itself.
    const across = (alpha: number): number => {
      const f = forceAt(v, alpha);
      const u = sunForCone(alpha).map((c) => -c);
      const along = dot(f, u);
      return Math.hypot(f[0] - along * u[0]!, f[1] - along * u[1]!, f[2] - along * u[2]!);
    };
    const g = (Math.sqrt(5) - 1) / 2;
    let lo = 0;
    let hi = Math.PI / 2;
    while (hi - lo > 1e-9) {
      const a = hi - g * (hi - lo);
      const b = lo + g * (hi - lo);
      if (across(a) < across(b)) lo = a;
      else hi = b;
    }
    // source: McInnes 1999, §2.3 (from memory); d/dα (cos²α sin α) = 0 gives tan α = 1/√2.
    // A smooth maximum is located to about √ε ≈ 1e-8 of its scale: 1e-6 rad is a safe bound.
    expect(Math.abs((lo + hi) / 2 - Math.atan(Math.SQRT1_2))).toBeLessThan(1e-6);
    expect(((lo + hi) / 2 / DEG).toFixed(2)).toBe('35.26');
  });
});

describe('the sail model and the flat-plate model agree where they overlap', () => {
  it('a sail with Lambertian coefficients (Bf = Bb = 2/3) pushes like a plate with the same split', () => {
    // independent paths: sailForceCoefficients (McInnes 1999, §2.6) and surfaceForceCoefficients
    // (Montenbruck & Gill 2000, §3.4 plus thermal re-emission); r s specular, r (1 - s) diffuse
    const c = { r: 0.8, s: 0.7, emissivityFront: 0.3, emissivityBack: 0.6 };
    const sailV = sail({ ...c, nonLambertianFront: 2 / 3, nonLambertianBack: 2 / 3 });
    const plate = compileVehicle({
      kind: 'plates',
      name: 'plate',
      massKg: 10,
      centreOfMassM: [0, 0, 0],
      plates: [
        {
          name: 'p',
          areaM2: AREA,
          normal: [-1, 0, 0], // the lit front faces the Sun: opposite the sail normal
          centroidM: [0, 0, 0],
          front: {
            absorbed: 1 - c.r,
            specular: c.r * c.s,
            diffuse: c.r * (1 - c.s),
            emissivityFront: c.emissivityFront,
            emissivityBack: c.emissivityBack,
          },
        },
      ],
    });
    for (const deg of [0, 30, 60, 85]) {
      const s = sunForCone(deg * DEG);
      const fs = evaluateSrp(createSrpResult(sailV), sailV, s, P_1AU, 1).forceBody;
      const fp = evaluateSrp(createSrpResult(plate), plate, s, P_1AU, 1).forceBody;
      expectVecClose(fs, fp, REL_TOL);
    }
  });
});

describe('sail specs that are refused', () => {
  it('a reflectivity above 1, naming optics.r', () => {
    const optics = { r: 1.1, s: 0.9, emissivityFront: 0.1, emissivityBack: 0.5, nonLambertianFront: 0.7, nonLambertianBack: 0.6 };
    expect(() => sail(optics)).toThrow(srpErrorFor('out_of_range', 'optics.r'));
  });

  it('both emissivities zero, naming optics.emissivityFront', () => {
    const optics = { r: 0.9, s: 0.9, emissivityFront: 0, emissivityBack: 0, nonLambertianFront: 0.7, nonLambertianBack: 0.6 };
    expect(() => sail(optics)).toThrow(srpErrorFor('out_of_range', 'optics.emissivityFront'));
  });

  it('an unknown coefficient set, naming optics', () => {
    expect(() => sail('jpl-heliogyro' as SailOpticsInput)).toThrow(srpErrorFor('invalid_input', 'optics'));
  });

  it('a zero normal, naming normal', () => {
    expect(() => sail('ideal', { normal: [0, 0, 0] })).toThrow(srpErrorFor('invalid_input', 'normal'));
  });
});
