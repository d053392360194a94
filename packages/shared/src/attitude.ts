import { z } from 'zod';

/**
 * Attitude laws as they appear in files and HTTP bodies. Angles are in degrees here (the unit is
 * in the field name); srp-core takes radians, so the caller converts once (`coneDeg` → `coneRad`).
 * Quaternions follow the product's convention, stated in srp-core (attitude/quaternion.ts):
 * `[w, x, y, z]` scalar first, Hamilton, carrying the EQJ (J2000) axes onto the body axes.
 * Body axes are `[x, y, z]` directions of any non-zero length.
 */

/** Allowed deviation of |q| from 1 for a quaternion in a file (the same as srp-core's check). */
export const ATTITUDE_QUATERNION_NORM_TOLERANCE = 1e-4;

/** Names of the attitude laws, the `law` key. */
export const attitudeLawKinds = ['inertial', 'sun-pointing', 'lvlh', 'sail-cone-clock', 'tabulated'] as const;
/** Schema of the `law` key alone. */
export const attitudeLawKindSchema = z.enum(attitudeLawKinds, {
  error: `law must be one of ${attitudeLawKinds.join(', ')}`,
});
/** One of `attitudeLawKinds`. */
export type AttitudeLawKind = z.infer<typeof attitudeLawKindSchema>;

/**
 * Directions a secondary body axis can follow: the orbit normal (r × v), celestial north (EQJ +z),
 * nadir (-r) or the velocity.
 */
export const secondaryReferences = ['orbit-normal', 'celestial-north', 'nadir', 'velocity'] as const;
/** Schema of `secondaryReference`. */
export const secondaryReferenceSchema = z.enum(secondaryReferences, {
  error: `secondaryReference must be one of ${secondaryReferences.join(', ')}`,
});
/** One of `secondaryReferences`. */
export type SecondaryReference = z.infer<typeof secondaryReferenceSchema>;

function quaternionSchema(field: string) {
  const component = z.number({ error: `${field} components must be finite numbers` });
  return z
    .tuple([component, component, component, component], {
      error: `${field} must be a quaternion [w, x, y, z] of 4 numbers`,
    })
    .refine(([w, x, y, z]) => Math.abs(Math.hypot(w, x, y, z) - 1) <= ATTITUDE_QUATERNION_NORM_TOLERANCE, {
      error: `${field} must be a unit quaternion [w, x, y, z] (|q| = 1 ± ${ATTITUDE_QUATERNION_NORM_TOLERANCE})`,
    });
}

function axisSchema(field: string) {
  const component = z.number({ error: `${field} components must be finite numbers` });
  return z
    .tuple([component, component, component], { error: `${field} must be a direction [x, y, z] of 3 numbers` })
    .refine(([x, y, z]) => Math.hypot(x, y, z) > 0, { error: `${field} must not be the zero vector` });
}

/** Smallest sine of the angle between two body axes that are to define an attitude (as srp-core). */
const PARALLEL_SINE_LIMIT = 1e-6;

function parallel(a: readonly number[], b: readonly number[]): boolean {
  const cx = a[1]! * b[2]! - a[2]! * b[1]!;
  const cy = a[2]! * b[0]! - a[0]! * b[2]!;
  const cz = a[0]! * b[1]! - a[1]! * b[0]!;
  const na = Math.hypot(a[0]!, a[1]!, a[2]!);
  const nb = Math.hypot(b[0]!, b[1]!, b[2]!);
  return Math.hypot(cx, cy, cz) < PARALLEL_SINE_LIMIT * na * nb;
}

/** An inertially fixed attitude. */
export const inertialLawSchema = z.object({
  law: z.literal('inertial'),
  /** Attitude quaternion [w, x, y, z], EQJ axes onto body axes. */
  quaternion: quaternionSchema('quaternion'),
});

/** A body axis at the Sun, a second body axis as close as possible to a reference direction. */
export const sunPointingLawSchema = z
  .object({
    law: z.literal('sun-pointing'),
    /** Body axis that points at the Sun. */
    sunAxisBody: axisSchema('sunAxisBody'),
    /** Body axis aligned as closely as possible with the reference; not parallel to sunAxisBody. */
    secondaryAxisBody: axisSchema('secondaryAxisBody'),
    /** The direction the secondary axis follows. */
    secondaryReference: secondaryReferenceSchema,
  })
  .refine((law) => !parallel(law.sunAxisBody, law.secondaryAxisBody), {
    path: ['secondaryAxisBody'],
    error: 'secondaryAxisBody must not be parallel to sunAxisBody',
  });

/** Nadir pointing: body axes = LVLH axes (z nadir, y -orbit normal, x along-track), optionally offset. */
export const lvlhLawSchema = z.object({
  law: z.literal('lvlh'),
  /** Fixed rotation [w, x, y, z] carrying the LVLH axes onto the body axes; omitted: identity. */
  offsetQuaternion: quaternionSchema('offsetQuaternion').optional(),
});

/** Solar-sail steering by fixed cone and clock angles relative to the Sun line. */
export const sailConeClockLawSchema = z
  .object({
    law: z.literal('sail-cone-clock'),
    /** Cone angle between the sail normal and the Sun-to-sail direction (deg), 0 to 90. */
    coneDeg: z
      .number({ error: 'coneDeg must be a number of degrees' })
      .min(0, 'coneDeg must be between 0 and 90 degrees')
      .max(90, 'coneDeg must be between 0 and 90 degrees'),
    /** Clock angle about the Sun line from the orbit-normal side (deg), -360 to 360. */
    clockDeg: z
      .number({ error: 'clockDeg must be a number of degrees' })
      .min(-360, 'clockDeg must be between -360 and 360 degrees')
      .max(360, 'clockDeg must be between -360 and 360 degrees'),
    /** Body axis pointing away from the Sun along the ideal-sail force (back-side normal). */
    normalAxisBody: axisSchema('normalAxisBody'),
    /** Body axis kept in the sail plane, perpendicular to the Sun line; omitted: chosen by srp-core. */
    secondaryAxisBody: axisSchema('secondaryAxisBody').optional(),
  })
  .refine((law) => law.secondaryAxisBody === undefined || !parallel(law.normalAxisBody, law.secondaryAxisBody), {
    path: ['secondaryAxisBody'],
    error: 'secondaryAxisBody must not be parallel to normalAxisBody',
  });

/** One row of a tabulated attitude profile given inline. */
export const attitudeProfileRowSchema = z.object({
  /** Time from the scenario epoch (s). */
  tS: z.number({ error: 'tS must be a number of seconds from the scenario epoch' }),
  /** Attitude quaternion [w, x, y, z], EQJ axes onto body axes. */
  quaternion: quaternionSchema('quaternion'),
});
/** A row of an inline attitude profile. */
export type AttitudeProfileRow = z.infer<typeof attitudeProfileRowSchema>;

/** Most rows accepted inline in a body; longer profiles are uploaded as CSV and named by profileId. */
export const MAX_INLINE_PROFILE_ROWS = 100_000;

/** A tabulated quaternion profile, interpolated by slerp: an uploaded profile or inline rows. */
export const tabulatedLawSchema = z
  .object({
    law: z.literal('tabulated'),
    /** Id of an uploaded attitude profile (CSV); give this or `rows`. */
    profileId: z.uuid({ error: 'profileId must be a UUID' }).optional(),
    /** Inline profile, times strictly increasing; give this or `profileId`. */
    rows: z
      .array(attitudeProfileRowSchema, { error: 'rows must be a list of { tS, quaternion }' })
      .min(2, 'rows must have at least 2 rows')
      .max(MAX_INLINE_PROFILE_ROWS, `rows must have at most ${MAX_INLINE_PROFILE_ROWS} rows; upload longer profiles as CSV`)
      .optional(),
    /** Outside the table: refuse (default) or clamp (hold the first or last attitude). */
    outside: z.enum(['refuse', 'clamp'], { error: 'outside must be refuse or clamp' }).optional(),
  })
  .superRefine((law, ctx) => {
    if ((law.profileId === undefined) === (law.rows === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: ['profileId'],
        message: 'give either profileId or rows for a tabulated attitude, not both and not neither',
      });
    }
    const rows = law.rows ?? [];
    for (let i = 1; i < rows.length; i += 1) {
      if (!(rows[i]!.tS > rows[i - 1]!.tS)) {
        ctx.addIssue({
          code: 'custom',
          path: ['rows', i, 'tS'],
          message: `rows.${i}.tS must be greater than rows.${i - 1}.tS (${rows[i - 1]!.tS} s): times strictly increasing`,
        });
        return;
      }
    }
  });

/** An attitude law in a file or HTTP body, discriminated by `law`. */
export const attitudeLawSchema = z.discriminatedUnion(
  'law',
  [inertialLawSchema, sunPointingLawSchema, lvlhLawSchema, sailConeClockLawSchema, tabulatedLawSchema],
  { error: `law must be one of ${attitudeLawKinds.join(', ')}` },
);
/** An attitude law as files and HTTP carry it (degrees; srp-core takes radians). */
export type AttitudeLawDefinition = z.infer<typeof attitudeLawSchema>;
