import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { checkSurfaceOptics } from './surface-optics';

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
