import { SrpError } from '../errors';
import { requireFraction } from './surface-optics';
import type { SailOpticalCoefficients, SailOpticsInput } from './vehicle-spec';

/** Names of the published sail coefficient sets. The zod schema in packages/shared repeats this list. */
export const sailOpticsPresetNames = ['mcinnes-square-sail'] as const;

/** A sail coefficient-set name. */
export type SailOpticsPresetName = (typeof sailOpticsPresetNames)[number];

/** A published coefficient set and where it comes from. */
export interface SailOpticsPreset extends Readonly<SailOpticalCoefficients> {
  /** Where the values come from. */
  readonly source: string;
}

/** The published sail coefficient sets, by name. */
export const sailOpticsPresets: Readonly<Record<SailOpticsPresetName, SailOpticsPreset>> = {
  'mcinnes-square-sail': {
    r: 0.88,
    s: 0.94,
    emissivityFront: 0.05,
    emissivityBack: 0.55,
    nonLambertianFront: 0.79,
    nonLambertianBack: 0.55,
    source:
      'McInnes, Solar Sailing (1999), §2.6, coefficients of the JPL square sail (aluminised ' +
      'front, chromium back), after Wright, Space Sailing (1992) (from memory)',
  },
};

/** Sail optics after checking: 'ideal' or explicit coefficients. */
export type ResolvedSailOptics = 'ideal' | Readonly<SailOpticalCoefficients>;

const coefficientKeys = [
  'r',
  's',
  'emissivityFront',
  'emissivityBack',
  'nonLambertianFront',
  'nonLambertianBack',
] as const;

/**
 * Checks sail optics: 'ideal', a preset name, or coefficients each a finite number in [0, 1] with
 * the two emissivities not both 0.
 * @param field path of the optics in the caller's input (`optics`)
 * @throws SrpError naming `<field>` or `<field>.<coefficient>`
 */
export function resolveSailOptics(input: SailOpticsInput, field = 'optics'): ResolvedSailOptics {
  if (input === 'ideal') return 'ideal';
  if (typeof input === 'string') {
    const preset = (sailOpticsPresets as Record<string, SailOpticsPreset | undefined>)[input];
    if (preset === undefined) {
      throw new SrpError(
        'invalid_input',
        `${field} must be 'ideal', a sail coefficient set (${sailOpticsPresetNames.join(', ')}) ` +
          `or coefficients {r, s, emissivityFront, emissivityBack, nonLambertianFront, nonLambertianBack}; got '${input}'`,
        { field, value: input, limit: ['ideal', ...sailOpticsPresetNames].join(' | ') },
      );
    }
    return preset;
  }
  if (typeof input !== 'object' || input === null) {
    throw new SrpError('invalid_input', `${field} must be 'ideal', a preset name or coefficients; got ${String(input)}`, {
      field,
      value: input,
    });
  }
  for (const key of coefficientKeys) requireFraction(input[key], `${field}.${key}`);
  if (input.emissivityFront + input.emissivityBack === 0) {
    throw new SrpError('out_of_range', `${field}.emissivityFront and ${field}.emissivityBack must not both be 0`, {
      field: `${field}.emissivityFront`,
      value: 0,
      limit: 'emissivityFront + emissivityBack > 0',
    });
  }
  return input;
}

/**
 * The optical force model of a flat solar sail, written as the three flat-plate coefficients of
 * its lit front face (see `surfaceForceCoefficients`), into `out[offset..offset+2]`.
 *
 * McInnes's normal and transverse components, with α the cone angle between the sail normal n
 * (out of the back) and the sunlight direction u = -s:
 *
 *   F_n = P A [ (1 + r s) cos²α + Bf (1 - s) r cos α + (1 - r)(εf Bf - εb Bb)/(εf + εb) cos α ]
 *   F_t = P A (1 - r s) cos α sin α,   along the part of u perpendicular to n,
 *
 * equal the plate form -P A cos α [c0 s + (c1 cos α + c2) m] with the front normal m = -n and
 *
 *   c0 = 1 - r s,   c1 = 2 r s,   c2 = Bf (1 - s) r + (1 - r)(εf Bf - εb Bb)/(εf + εb)
 *
 * (the transverse part of -c0 s is the F_t above; its normal part plus c1 gives (1 + r s)).
 * An ideal sail (a perfect flat mirror) has c0 = 0, c1 = 2, c2 = 0: F = 2 P A cos²α n.
 * Source: McInnes, Solar Sailing: Technology, Dynamics and Mission Applications
 * (Springer-Praxis, 1999), §2.6 (from memory, not checked against the book here); the same
 * expressions are implemented in Tudat's `computeSolarSailForce` (TU Delft, solarSailForce.cpp),
 * read while writing this.
 * @param out receives c0, c1, c2 (unit-less)
 * @param offset index of c0 in `out`
 * @returns `out`
 */
export function sailForceCoefficients(
  out: Float64Array,
  offset: number,
  optics: ResolvedSailOptics,
): Float64Array {
  if (optics === 'ideal') {
    out[offset] = 0;
    out[offset + 1] = 2;
    out[offset + 2] = 0;
    return out;
  }
  const { r, s, emissivityFront: ef, emissivityBack: eb } = optics;
  const bf = optics.nonLambertianFront;
  const bb = optics.nonLambertianBack;
  out[offset] = 1 - r * s;
  out[offset + 1] = 2 * r * s;
  out[offset + 2] = bf * (1 - s) * r + ((1 - r) * (ef * bf - eb * bb)) / (ef + eb);
  return out;
}
