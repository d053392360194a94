import { SrpError } from '../errors';

/**
 * How one side of a surface responds to sunlight. The three fractions of the incident energy are
 * each in [0, 1] and sum to 1; diffuse reflection is Lambertian.
 *
 * Thermal re-emission is optional. It is on when both emissivities are given. They are
 * hemispherical infrared emissivities, seen from the side these optics describe: `emissivityFront`
 * belongs to this (lit) face, `emissivityBack` to the opposite face of the same thin plate.
 */
export interface SurfaceOptics {
  /** Fraction absorbed (1 - reflectivity). */
  absorbed: number;
  /** Fraction reflected specularly (mirror-like). */
  specular: number;
  /** Fraction reflected diffusely (Lambertian). */
  diffuse: number;
  /** Infrared emissivity of this face, in [0, 1]; give it together with `emissivityBack`. */
  emissivityFront?: number;
  /** Infrared emissivity of the opposite face, in [0, 1]; give it together with `emissivityFront`. */
  emissivityBack?: number;
}

/**
 * Allowed deviation of absorbed + specular + diffuse from 1: room for the rounding of decimal
 * inputs (0.7 + 0.2 + 0.1 is 0.9999999999999999 in doubles), far below any measured coating
 * property.
 */
export const OPTICS_SUM_TOLERANCE = 1e-9;

const opticsKeys = ['absorbed', 'specular', 'diffuse'] as const;

/** Throws unless `value` is a finite number in [0, 1]. */
export function requireFraction(value: number, field: string): number {
  if (!Number.isFinite(value)) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a finite fraction in [0, 1]; got ${String(value)}`,
      { field, value, limit: '[0, 1]' },
    );
  }
  if (value < 0 || value > 1) {
    throw new SrpError('out_of_range', `${field} must be a fraction in [0, 1]; got ${value}`, {
      field,
      value,
      limit: '[0, 1]',
    });
  }
  return value;
}

/**
 * Checks that each fraction is a finite number in [0, 1], that they sum to 1 within
 * OPTICS_SUM_TOLERANCE and, when emissivities are given, that both are given, each in [0, 1]
 * and not both 0 (a plate that cannot radiate has no steady state).
 * @param field path of `optics` in the caller's input, used in the error (`plates.3.front`)
 * @returns the same optics object
 * @throws SrpError `invalid_input`/`out_of_range` naming the offending key,
 *   or `optics_sum` naming `field`
 */
export function checkSurfaceOptics(optics: SurfaceOptics, field = 'optics'): SurfaceOptics {
  for (const key of opticsKeys) requireFraction(optics[key], `${field}.${key}`);
  const sum = optics.absorbed + optics.specular + optics.diffuse;
  if (!(Math.abs(sum - 1) <= OPTICS_SUM_TOLERANCE)) {
    throw new SrpError(
      'optics_sum',
      `${field}: absorbed + specular + diffuse must equal 1 (±${OPTICS_SUM_TOLERANCE}); ` +
        `got ${optics.absorbed} + ${optics.specular} + ${optics.diffuse} = ${sum}`,
      { field, value: sum, limit: `1 ± ${OPTICS_SUM_TOLERANCE}` },
    );
  }
  const { emissivityFront, emissivityBack } = optics;
  if (emissivityFront === undefined && emissivityBack === undefined) return optics;
  if (emissivityFront === undefined || emissivityBack === undefined) {
    const missing = emissivityFront === undefined ? 'emissivityFront' : 'emissivityBack';
    const given = emissivityFront === undefined ? 'emissivityBack' : 'emissivityFront';
    throw new SrpError(
      'invalid_input',
      `${field}.${missing} is required when ${field}.${given} is given ` +
        '(thermal re-emission needs the emissivities of both faces)',
      { field: `${field}.${missing}`, value: undefined },
    );
  }
  requireFraction(emissivityFront, `${field}.emissivityFront`);
  requireFraction(emissivityBack, `${field}.emissivityBack`);
  if (emissivityFront + emissivityBack === 0) {
    throw new SrpError(
      'out_of_range',
      `${field}.emissivityFront and ${field}.emissivityBack must not both be 0`,
      { field: `${field}.emissivityFront`, value: 0, limit: 'emissivityFront + emissivityBack > 0' },
    );
  }
  return optics;
}

/**
 * The three coefficients of the flat-plate force for light on one side, written into
 * `out[offset..offset+2]`, so that the force on that side is
 *
 *   F = -P A cos θ [ c0 s + (c1 cos θ + c2) m ],   cos θ = m · s > 0,
 *
 * with s the unit vector to the Sun and m the outward normal of the lit face:
 *
 *   c0 = 1 - ρs                      (absorbed and diffusely reflected light: incident momentum)
 *   c1 = 2 ρs                        (specular reflection: twice the normal momentum)
 *   c2 = 2 ρd / 3 + (2/3) α (εf - εb) / (εf + εb)
 *                                    (Lambertian diffuse reflection; Lambertian thermal re-emission)
 *
 * The thermal term: in steady state a thin plate re-radiates all absorbed power α P c A cos θ,
 * split between its faces in proportion to their emissivities; Lambertian emission of power W
 * from a face pushes it back along that face's normal with (2/3) W / c. The net is the (εf - εb)
 * term above. Sources: Montenbruck & Gill, Satellite Orbits (Springer, 2000), §3.4 for c0, c1
 * and the Lambertian 2/3; McInnes, Solar Sailing (Springer-Praxis, 1999), §2.6, whose
 * (1 - r)(εf Bf - εb Bb)/(εf + εb) term is this one with Bf = Bb = 2/3 (both from memory, not
 * checked against the books here).
 * @param out receives c0, c1, c2 (unit-less)
 * @param offset index of c0 in `out`
 * @param optics checked optics of the lit side
 * @returns `out`
 */
export function surfaceForceCoefficients(
  out: Float64Array,
  offset: number,
  optics: SurfaceOptics,
): Float64Array {
  const { absorbed, specular, diffuse, emissivityFront, emissivityBack } = optics;
  let thermal = 0;
  if (emissivityFront !== undefined && emissivityBack !== undefined) {
    thermal =
      ((2 / 3) * absorbed * (emissivityFront - emissivityBack)) / (emissivityFront + emissivityBack);
  }
  out[offset] = 1 - specular;
  out[offset + 1] = 2 * specular;
  out[offset + 2] = (2 / 3) * diffuse + thermal;
  return out;
}
