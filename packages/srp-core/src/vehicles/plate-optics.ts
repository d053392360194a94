import { SrpError } from '../errors';
import { isMaterialPresetName, materialPresetNames, materialPresets } from './material-presets';
import type { MaterialPresetName } from './material-presets';
import { checkSurfaceOptics } from './surface-optics';
import type { SurfaceOptics } from './surface-optics';

/** Optics of one side as a caller gives them: explicit fractions, or a material preset name. */
export type SurfaceOpticsInput = SurfaceOptics | MaterialPresetName;

/**
 * The checked optics of both sides of a thin plate. Each side's `emissivityFront` is its own
 * face's emissivity and `emissivityBack` the other face's, so the roles are swapped between the
 * two sides; both sides carry emissivities exactly when thermal re-emission is on.
 */
export interface PlateOptics {
  /** Optics for light on the front face (the face whose outward normal is the plate normal). */
  readonly front: Readonly<SurfaceOptics>;
  /** Optics for light on the back face, or null when the back takes no light (one-sided). */
  readonly back: Readonly<SurfaceOptics> | null;
}

/** Two emissivities of the same face given in two places may differ by rounding only. */
const EMISSIVITY_MATCH_TOLERANCE = 1e-9;

interface SideInput {
  absorbed: number;
  specular: number;
  diffuse: number;
  /** Emissivity of this side's own face, if this side says. */
  own: number | undefined;
  /** Emissivity of the opposite face, if this side says. */
  other: number | undefined;
  /** Whether the side came from a preset (which states its own face's emissivity only). */
  preset: boolean;
}

function readSide(input: SurfaceOpticsInput, field: string): SideInput {
  if (typeof input === 'string') {
    if (!isMaterialPresetName(input)) {
      throw new SrpError(
        'invalid_input',
        `${field} must be optics {absorbed, specular, diffuse} or a material preset, one of ` +
          `${materialPresetNames.join(', ')}; got '${input}'`,
        { field, value: input, limit: materialPresetNames.join(' | ') },
      );
    }
    const preset = materialPresets[input];
    return {
      absorbed: preset.absorbed,
      specular: preset.specular,
      diffuse: preset.diffuse,
      own: preset.emissivity,
      other: undefined,
      preset: true,
    };
  }
  if (typeof input !== 'object' || input === null) {
    throw new SrpError(
      'invalid_input',
      `${field} must be optics {absorbed, specular, diffuse} or a material preset name; got ${String(input)}`,
      { field, value: input },
    );
  }
  checkSurfaceOptics(input, field);
  return {
    absorbed: input.absorbed,
    specular: input.specular,
    diffuse: input.diffuse,
    own: input.emissivityFront,
    other: input.emissivityBack,
    preset: false,
  };
}

/** One face's emissivity as stated by the front side (`a`) and by the back side (`b`). */
function agree(
  a: number | undefined,
  b: number | undefined,
  backField: string,
  frontField: string,
): number | undefined {
  if (a === undefined) return b;
  if (b === undefined || Math.abs(a - b) <= EMISSIVITY_MATCH_TOLERANCE) return a;
  throw new SrpError(
    'invalid_input',
    `${backField} is ${b} but ${frontField} is ${a}: both describe the same face, make them equal ` +
      '(or give the emissivities on one side only)',
    { field: backField, value: b, limit: `= ${a}` },
  );
}

/**
 * Checks the optics of a plate's two sides and settles thermal re-emission.
 *
 * Each side may state the emissivity of its own face (`emissivityFront`, or a preset's
 * emissivity) and of the opposite face (`emissivityBack`). The plate's two face emissivities are
 * taken from whichever side states them; a face stated on both sides must agree. Re-emission is
 * on when both faces' emissivities are known, e.g. a two-sided plate with a preset on each side,
 * or explicit `emissivityFront` and `emissivityBack`. A one-sided plate given only a preset has
 * no thermal term (the emissivity of its hidden face is unknown).
 * @param field path of the plate in the caller's input (`plates.3`); errors name
 *   `<field>.front…` or `<field>.back…`
 * @throws SrpError naming the offending side or key
 */
export function resolvePlateOptics(
  front: SurfaceOpticsInput,
  back: SurfaceOpticsInput | undefined,
  field: string,
): PlateOptics {
  const f = readSide(front, `${field}.front`);
  const b = back === undefined ? undefined : readSide(back, `${field}.back`);
  const backFaceFromBack = b?.preset ? `${field}.back` : `${field}.back.emissivityFront`;
  const frontFace = agree(f.own, b?.other, `${field}.back.emissivityBack`, `${field}.front.emissivityFront`);
  const backFace = agree(f.other, b?.own, backFaceFromBack, `${field}.front.emissivityBack`);
  const thermal = frontFace !== undefined && backFace !== undefined;
  if (thermal && frontFace + backFace === 0) {
    throw new SrpError(
      'out_of_range',
      `${field}: the emissivities of the front and back faces must not both be 0`,
      { field: `${field}.front.emissivityFront`, value: 0, limit: 'front + back > 0' },
    );
  }
  const side = (s: SideInput, own: number | undefined, other: number | undefined): SurfaceOptics =>
    thermal
      ? { absorbed: s.absorbed, specular: s.specular, diffuse: s.diffuse, emissivityFront: own, emissivityBack: other }
      : { absorbed: s.absorbed, specular: s.specular, diffuse: s.diffuse };
  return {
    front: side(f, frontFace, backFace),
    back: b === undefined ? null : side(b, backFace, frontFace),
  };
}
