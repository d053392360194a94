import { z } from 'zod';

/**
 * The file format of a vehicle (`*.vehicle.json`, uploads, the API's vehicle bodies): a
 * cannonball, a set of flat plates, or a solar sail. Units are in the field names (`areaM2`,
 * `massKg`, `centroidM`, `trackingLimitsDeg`); vectors are [x, y, z] in the vehicle's body frame;
 * directions (`normal`, `trackingAxis`) may have any non-zero length and are normalised by
 * srp-core, whose input spec has the same shape except that drive limits are in radians
 * (`trackingLimitsRad`).
 */

/** Material preset names; srp-core's `materialPresetNames` holds the same list and the values. */
export const materialPresetKeys = [
  'solar-cell',
  'solar-array-back',
  'osr-radiator',
  'mli-kapton',
  'white-paint',
  'black-paint',
  'aluminised-sail-film',
  'bare-aluminium',
] as const;

/** Published sail coefficient sets; srp-core's `sailOpticsPresetNames` holds the same list. */
export const sailOpticsPresetKeys = ['mcinnes-square-sail'] as const;

/** The vehicle kinds. */
export const vehicleKinds = ['cannonball', 'plates', 'sail', 'mesh'] as const;

/** Allowed deviation of absorbed + specular + diffuse from 1 (rounding of decimal inputs). */
const OPTICS_SUM_TOLERANCE = 1e-9;
/** Smallest sine of the angle between a drive axis and the plate normal (srp-core's limit too). */
const MIN_AXIS_NORMAL_SINE = 1e-6;

/** An object schema that names unknown keys (usually typos) and says what is allowed. */
function strict<T extends z.ZodRawShape>(what: string, shape: T) {
  const allowed = Object.keys(shape).join(', ');
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `${what} has unknown key(s) ${issue.keys.join(', ')}; allowed: ${allowed}`
        : issue.input === undefined
          ? `${what} is required`
          : `${what} must be an object`,
  });
}

function finite(key: string, unit: string) {
  return z.number({ error: `${key} must be a finite number (${unit})` });
}

function fraction(key: string) {
  return z
    .number({ error: `${key} must be a number in [0, 1]` })
    .min(0, `${key} must be at least 0`)
    .max(1, `${key} must be at most 1`);
}

function positive(key: string, unit: string) {
  return finite(key, unit).positive(`${key} must be greater than 0 (${unit})`);
}

function vec3(key: string, unit: string) {
  const c = finite(`${key} components`, unit);
  return z.tuple([c, c, c], { error: `${key} must be [x, y, z] (${unit})` });
}

function direction(key: string) {
  return vec3(key, 'unit-less, any non-zero length').refine(
    (v) => v[0] !== 0 || v[1] !== 0 || v[2] !== 0,
    `${key} must not be the zero vector`,
  );
}

function surfaceOptics(key: string) {
  const object = strict(key, {
    /** Fraction of sunlight absorbed. */
    absorbed: fraction('absorbed'),
    /** Fraction reflected specularly. */
    specular: fraction('specular'),
    /** Fraction reflected diffusely (Lambertian). */
    diffuse: fraction('diffuse'),
    /** Infrared emissivity of this face; with emissivityBack turns on thermal re-emission. */
    emissivityFront: fraction('emissivityFront').optional(),
    /** Infrared emissivity of the opposite face of the plate. */
    emissivityBack: fraction('emissivityBack').optional(),
  }).superRefine((o, ctx) => {
    const sum = o.absorbed + o.specular + o.diffuse;
    if (!(Math.abs(sum - 1) <= OPTICS_SUM_TOLERANCE)) {
      ctx.addIssue({
        code: 'custom',
        message: `absorbed + specular + diffuse must equal 1 (±${OPTICS_SUM_TOLERANCE}); got ${sum}`,
        path: [],
      });
    }
    if ((o.emissivityFront === undefined) !== (o.emissivityBack === undefined)) {
      const missing = o.emissivityFront === undefined ? 'emissivityFront' : 'emissivityBack';
      ctx.addIssue({
        code: 'custom',
        message: `${missing} is required with the other emissivity (thermal re-emission needs both faces)`,
        path: [missing],
      });
    } else if (o.emissivityFront === 0 && o.emissivityBack === 0) {
      ctx.addIssue({ code: 'custom', message: 'emissivityFront and emissivityBack must not both be 0', path: ['emissivityFront'] });
    }
  });
  return z.union([z.enum(materialPresetKeys), object], {
    error: `${key} must be {absorbed, specular, diffuse} (optionally emissivityFront, emissivityBack) or a material preset: ${materialPresetKeys.join(', ')}`,
  });
}

const driveAngle = finite('trackingLimitsDeg', '°')
  .min(-360, 'trackingLimitsDeg must be within [-360, 360]°')
  .max(360, 'trackingLimitsDeg must be within [-360, 360]°');

const plateSpecSchema = strict('plate', {
  /** Unique within the vehicle; per-surface results are reported by it. */
  name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(80, 'name must have at most 80 characters'),
  /** Area (m²). */
  areaM2: positive('areaM2', 'm²'),
  /** Outward normal of the front face, body frame; for a tracking plate, its normal at drive angle 0. */
  normal: direction('normal'),
  /** Centroid (m), body frame; a tracking plate turns about an axis through it. */
  centroidM: vec3('centroidM', 'm'),
  /** Optics of the front face. */
  front: surfaceOptics('front'),
  /** Optics of the back face; absent for a one-sided plate (a face of the bus). */
  back: surfaceOptics('back').optional(),
  /** Solar-array drive axis, body frame; present makes the plate track the Sun. */
  trackingAxis: direction('trackingAxis').optional(),
  /** Drive angle limits [min, max] (°), right-handed about trackingAxis from normal; absent: no limits. */
  trackingLimitsDeg: z.tuple([driveAngle, driveAngle], { error: 'trackingLimitsDeg must be [min, max] (°)' }).optional(),
}).superRefine((p, ctx) => {
  if (p.trackingAxis !== undefined) {
    const [ax, ay, az] = p.trackingAxis;
    const [nx, ny, nz] = p.normal;
    const sine =
      Math.hypot(ay * nz - az * ny, az * nx - ax * nz, ax * ny - ay * nx) / (Math.hypot(ax, ay, az) * Math.hypot(nx, ny, nz));
    if (!(sine >= MIN_AXIS_NORMAL_SINE)) {
      ctx.addIssue({
        code: 'custom',
        message: 'trackingAxis must not be parallel to normal (turning about it cannot move the normal); use an axis in the plane of the plate',
        path: ['trackingAxis'],
      });
    }
  }
  if (p.trackingLimitsDeg === undefined) return;
  if (p.trackingAxis === undefined) {
    ctx.addIssue({ code: 'custom', message: 'trackingLimitsDeg needs trackingAxis (limits apply to a Sun-tracking plate)', path: ['trackingLimitsDeg'] });
    return;
  }
  const [min, max] = p.trackingLimitsDeg;
  if (min > max) {
    ctx.addIssue({ code: 'custom', message: `trackingLimitsDeg must be [min, max] with min ≤ max; got [${min}, ${max}]`, path: ['trackingLimitsDeg'] });
  } else if (max - min > 360) {
    ctx.addIssue({ code: 'custom', message: `trackingLimitsDeg must span at most 360°; got ${max - min}°`, path: ['trackingLimitsDeg'] });
  }
});

const sailCoefficientsSchema = strict('optics', {
  /** Reflectivity r of the front. */
  r: fraction('r'),
  /** Specular fraction s of the reflected light. */
  s: fraction('s'),
  /** Infrared emissivity εf of the front. */
  emissivityFront: fraction('emissivityFront'),
  /** Infrared emissivity εb of the back. */
  emissivityBack: fraction('emissivityBack'),
  /** Non-Lambertian coefficient Bf of the front (2/3 for a Lambertian surface). */
  nonLambertianFront: fraction('nonLambertianFront'),
  /** Non-Lambertian coefficient Bb of the back. */
  nonLambertianBack: fraction('nonLambertianBack'),
}).refine((o) => o.emissivityFront + o.emissivityBack > 0, {
  message: 'emissivityFront and emissivityBack must not both be 0',
  path: ['emissivityFront'],
});

const base = {
  /** Display name. */
  name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name must have at most 120 characters'),
  /** Free text. */
  description: z.string().max(4000, 'description must have at most 4000 characters').optional(),
  /** Total vehicle mass (kg). */
  massKg: positive('massKg', 'kg'),
  /** Centre of mass (m), body frame; torques are about it. */
  centreOfMassM: vec3('centreOfMassM', 'm'),
};

const cannonballSpecSchema = strict('vehicle', {
  kind: z.literal('cannonball'),
  ...base,
  /** Reference (projected) area (m²). */
  areaM2: positive('areaM2', 'm²'),
  /** Radiation pressure coefficient, (0, 2]: 1 absorbs all light, 2 is a mirror facing the Sun. */
  cr: positive('cr', 'unit-less').max(2, 'cr must be at most 2 (a mirror facing the Sun)'),
});

const platesSpecSchema = strict('vehicle', {
  kind: z.literal('plates'),
  ...base,
  /** The flat plates. */
  plates: z.array(plateSpecSchema, { error: 'plates must be a list of plates' }).min(1, 'plates must have at least one plate'),
}).superRefine((v, ctx) => {
  const seen = new Map<string, number>();
  v.plates.forEach((p, i) => {
    const first = seen.get(p.name);
    if (first !== undefined) {
      ctx.addIssue({ code: 'custom', message: `name '${p.name}' is already used by plates.${first}; plate names must be unique`, path: ['plates', i, 'name'] });
    } else {
      seen.set(p.name, i);
    }
  });
});

const sailSpecSchema = strict('vehicle', {
  kind: z.literal('sail'),
  ...base,
  /** Sail membrane area (m²). */
  areaM2: positive('areaM2', 'm²'),
  /** Sail normal, body frame, out of the back: along an ideal sail's thrust (McInnes's n). */
  normal: direction('normal'),
  /** Centre of the membrane (m), body frame. */
  centroidM: vec3('centroidM', 'm'),
  /** 'ideal' (a perfect flat mirror), a published coefficient set, or the coefficients. */
  optics: z.union([z.literal('ideal'), z.enum(sailOpticsPresetKeys), sailCoefficientsSchema], {
    error: `optics must be 'ideal', one of ${sailOpticsPresetKeys.join(', ')}, or {r, s, emissivityFront, emissivityBack, nonLambertianFront, nonLambertianBack}`,
  }),
});

/** Table grid steps (°) a mesh vehicle may use: each divides 180 so the grid meets both poles. */
export const meshTableStepsDeg = [1, 2, 3, 4, 5, 6, 9, 10, 12, 15] as const;
/** Samples per facet for partial shading: n² for n = 1..8 (each facet cut into n² equal sub-triangles). */
export const meshSamplesPerFacet = [1, 4, 9, 16, 25, 36, 49, 64] as const;

/**
 * Optics of one group of mesh facets. `front` is the side the outward normal points to (counter-
 * clockwise winding seen from outside); `back`, when given, makes the facets a thin sheet lit from
 * either side (a solar array, a sunshade); without it light on the back does nothing (a closed
 * body's inside).
 */
export const meshGroupOpticsSchema = strict('group optics', {
  front: surfaceOptics('front'),
  back: surfaceOptics('back').optional(),
});
export type MeshGroupOptics = z.infer<typeof meshGroupOpticsSchema>;

/** How the coefficient table of a mesh vehicle is computed. */
export const meshTableSettingsSchema = strict('table', {
  /** Grid step over the Sun directions (°), polar angle from body +Z and azimuth from +X toward +Y. */
  stepDeg: z
    .number({ error: `stepDeg must be one of ${meshTableStepsDeg.join(', ')} (°)` })
    .refine((v) => (meshTableStepsDeg as readonly number[]).includes(v), `stepDeg must be one of ${meshTableStepsDeg.join(', ')} (°)`)
    .default(5),
  /** Shadow-test samples per facet (n²); more samples resolve partial shading more finely. */
  samplesPerFacet: z
    .number({ error: `samplesPerFacet must be one of ${meshSamplesPerFacet.join(', ')}` })
    .refine((v) => (meshSamplesPerFacet as readonly number[]).includes(v), `samplesPerFacet must be one of ${meshSamplesPerFacet.join(', ')}`)
    .default(4),
  /** Follow specular reflections from one facet onto another (one bounce). */
  specularBounce: z.boolean({ error: 'specularBounce must be true or false' }).default(false),
});
export type MeshTableSettings = z.infer<typeof meshTableSettingsSchema>;

const meshSpecSchema = strict('vehicle', {
  kind: z.literal('mesh'),
  ...base,
  /** The imported mesh (`POST /api/missions/:missionId/meshes`), already in the body frame, metres. */
  meshId: z.uuid({ error: 'meshId must be the UUID of a mesh imported into the mission' }),
  /** Optics by facet group; groups not named use `default`. */
  optics: strict('optics', {
    default: meshGroupOpticsSchema,
    groups: z
      .record(z.string().min(1, 'group names must not be empty').max(120, 'group names must have at most 120 characters'), meshGroupOpticsSchema, {
        error: 'groups must map group names to {front, back?}',
      })
      .optional(),
  }),
  /** The coefficient table's grid and sampling; SRP during propagation is interpolated from it. */
  table: meshTableSettingsSchema.prefault({}),
});

/** A vehicle file: a cannonball, a set of flat plates, a solar sail or a mesh, told apart by `kind`. */
export const vehicleSpecSchema = z.discriminatedUnion('kind', [cannonballSpecSchema, platesSpecSchema, sailSpecSchema, meshSpecSchema], {
  error: `kind must be one of ${vehicleKinds.join(', ')}`,
});
export type VehicleSpec = z.infer<typeof vehicleSpecSchema>;
