import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { checkSurfaceOptics, surfaceForceCoefficients } from './surface-optics';

function thrown(act: () => unknown): SrpError {
  try {
    act();
  } catch (error) {
    if (error instanceof SrpError) return error;
    throw error;
  }
  throw new Error('expected an SrpError, nothing was thrown');
}

describe('checkSurfaceOptics', () => {
  it('accepts decimal fractions whose sum rounds away from exactly 1', () => {
    // 0.7 + 0.2 + 0.1 is 0.9999999999999999 in doubles: within the 1e-9 tolerance
    const optics = { absorbed: 0.7, specular: 0.2, diffuse: 0.1 };
    expect(checkSurfaceOptics(optics)).toBe(optics);
  });

  it('refuses fractions summing to 1.1 with optics_sum naming the optics field', () => {
    const error = thrown(() =>
      checkSurfaceOptics({ absorbed: 0.3, specular: 0.5, diffuse: 0.3 }, 'plate.front'),
    );
    expect(error.code).toBe('optics_sum');
    expect(error.details.field).toBe('plate.front');
    expect(error.details.value).toBeCloseTo(1.1, 12);
    expect(error.message).toContain('plate.front');
  });

  it('refuses fractions summing to 1 + 1e-8, just outside the tolerance', () => {
    const error = thrown(() => checkSurfaceOptics({ absorbed: 0.5, specular: 0.5, diffuse: 1e-8 }));
    expect(error.code).toBe('optics_sum');
  });

  it('refuses a negative specular fraction with out_of_range naming that fraction', () => {
    const error = thrown(() =>
      checkSurfaceOptics({ absorbed: 0.6, specular: -0.1, diffuse: 0.5 }, 'plate.front'),
    );
    expect(error.code).toBe('out_of_range');
    expect(error.details).toEqual({ field: 'plate.front.specular', value: -0.1, limit: '[0, 1]' });
  });

  it('refuses a NaN diffuse fraction with invalid_input naming that fraction', () => {
    const error = thrown(() =>
      checkSurfaceOptics({ absorbed: 0.5, specular: 0.5, diffuse: Number.NaN }),
    );
    expect(error.code).toBe('invalid_input');
    expect(error.details.field).toBe('optics.diffuse');
  });
});

describe('checkSurfaceOptics with emissivities', () => {
  it('accepts both emissivities in [0, 1]', () => {
    const optics = { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.9, emissivityBack: 0 };
    expect(checkSurfaceOptics(optics)).toBe(optics);
  });

  it('refuses one emissivity without the other, naming the missing one', () => {
    const error = thrown(() => checkSurfaceOptics({ absorbed: 1, specular: 0, diffuse: 0, emissivityBack: 0.5 }, 'plates.2.front'));
    expect(error.code).toBe('invalid_input');
    expect(error.details.field).toBe('plates.2.front.emissivityFront');
  });

  it('refuses an emissivity above 1, naming it', () => {
    const error = thrown(() =>
      checkSurfaceOptics({ absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 1.2, emissivityBack: 0.5 }),
    );
    expect(error.details).toEqual({ field: 'optics.emissivityFront', value: 1.2, limit: '[0, 1]' });
  });

  it('refuses both emissivities zero (a plate that cannot radiate)', () => {
    const error = thrown(() => checkSurfaceOptics({ absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0, emissivityBack: 0 }));
    expect(error.code).toBe('out_of_range');
  });
});

describe('surfaceForceCoefficients', () => {
  it('a black plate radiating only from its lit face adds (2/3) of the absorbed momentum along the normal', () => {
    // source: Lambertian emission of power W pushes with (2/3) W / c (Montenbruck & Gill 2000, §3.4,
    // the same 2/3 as diffuse reflection); all absorbed power leaves through the front: c2 = 2/3
    const c = surfaceForceCoefficients(new Float64Array(3), 0, {
      absorbed: 1,
      specular: 0,
      diffuse: 0,
      emissivityFront: 0.7,
      emissivityBack: 0,
    });
    expect(Array.from(c)).toEqual([1, 0, 2 / 3]);
  });

  it('equal emissivities on both faces cancel: the same coefficients as without thermal re-emission', () => {
    const plain = { absorbed: 0.6, specular: 0.3, diffuse: 0.1 };
    const a = surfaceForceCoefficients(new Float64Array(3), 0, plain);
    const b = surfaceForceCoefficients(new Float64Array(3), 0, { ...plain, emissivityFront: 0.4, emissivityBack: 0.4 });
    expect(Array.from(b)).toEqual(Array.from(a));
  });
});
