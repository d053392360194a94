import { SrpError } from '../errors';

/**
 * How one side of a surface splits incident sunlight. Fractions of the incident energy, each in
 * [0, 1], summing to 1. Diffuse reflection is Lambertian.
 */
export interface SurfaceOptics {
  /** Fraction absorbed (1 - reflectivity). */
  absorbed: number;
  /** Fraction reflected specularly (mirror-like). */
  specular: number;
  /** Fraction reflected diffusely (Lambertian). */
  diffuse: number;
}

/**
 * Allowed deviation of absorbed + specular + diffuse from 1: room for the rounding of decimal
 * inputs (0.7 + 0.2 + 0.1 is 0.9999999999999999 in doubles), far below any measured coating
 * property.
 */
export const OPTICS_SUM_TOLERANCE = 1e-9;

const opticsKeys = ['absorbed', 'specular', 'diffuse'] as const;

/**
 * Checks that each fraction is a finite number in [0, 1] and that they sum to 1 within
 * OPTICS_SUM_TOLERANCE.
 * @param field path of `optics` in the caller's input, used in the error (`plate.front`)
 * @returns the same optics object
 * @throws SrpError `invalid_input`/`out_of_range` naming the fraction,
 *   or `optics_sum` naming `field`
 */
export function checkSurfaceOptics(optics: SurfaceOptics, field = 'optics'): SurfaceOptics {
  for (const key of opticsKeys) {
    const value = optics[key];
    const path = `${field}.${key}`;
    if (!Number.isFinite(value)) {
      throw new SrpError(
        'invalid_input',
        `${path} must be a finite fraction in [0, 1]; got ${String(value)}`,
        { field: path, value, limit: '[0, 1]' },
      );
    }
    if (value < 0 || value > 1) {
      throw new SrpError('out_of_range', `${path} must be a fraction in [0, 1]; got ${value}`, {
        field: path,
        value,
        limit: '[0, 1]',
      });
    }
  }
  const sum = optics.absorbed + optics.specular + optics.diffuse;
  if (!(Math.abs(sum - 1) <= OPTICS_SUM_TOLERANCE)) {
    throw new SrpError(
      'optics_sum',
      `${field}: absorbed + specular + diffuse must equal 1 (±${OPTICS_SUM_TOLERANCE}); ` +
        `got ${optics.absorbed} + ${optics.specular} + ${optics.diffuse} = ${sum}`,
      { field, value: sum, limit: `1 ± ${OPTICS_SUM_TOLERANCE}` },
    );
  }
  return optics;
}
