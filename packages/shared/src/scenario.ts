import { z } from 'zod';
import { attitudeLawSchema } from './attitude';
import { initialOrbitSchema } from './orbit';
import { vehicleSpecSchema } from './vehicle';
import { budgetRequirementsSchema } from './budget';

/** Planets that may act as third bodies on a heliocentric run. */
export const thirdBodyPlanets = ['mercury', 'venus', 'earth', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune'] as const;

const axis = (field: string) =>
  z
    .tuple([z.number(), z.number(), z.number()], { error: `${field} must be [x, y, z]` })
    .refine((v) => Math.hypot(...v) > 0, `${field} must not be the zero vector`);

/** Sail steering that maximises the rate of change of orbit radius, up (raise) or down (lower). */
export const sailLocallyOptimalLawSchema = z.object({
  law: z.literal('sail-locally-optimal'),
  /** raise: increase the orbit radius as fast as the sail can; lower: decrease it. */
  direction: z.enum(['raise', 'lower'], { error: 'direction must be raise or lower' }),
  /** Body axis pointing away from the Sun along the ideal-sail force (back-side normal). */
  normalAxisBody: axis('normalAxisBody'),
});

/** Any attitude law a scenario may use. */
export const scenarioAttitudeSchema = z.union([attitudeLawSchema, sailLocallyOptimalLawSchema], {
  error: 'attitude must be an attitude law (inertial, sun-pointing, lvlh, sail-cone-clock, tabulated, sail-locally-optimal)',
});

const positive = (field: string, unit: string) =>
  z.number({ error: `${field} must be a number (${unit})` }).positive(`${field} must be greater than 0 (${unit})`);

/** Which forces act; each switchable. */
export const forceSwitchesSchema = z.object({
  /** Zonal harmonics of the Earth up to this degree: 0 none, 2 J2 only, ..., 6 J2 to J6. */
  zonalDegree: z.number().int().min(0).max(6, 'zonalDegree must be 0 or 2 to 6').refine((d) => d !== 1, 'zonalDegree must be 0 or 2 to 6').default(0),
  /** Sun third-body attraction (Earth orbits). */
  sun: z.boolean().default(false),
  /** Moon third-body attraction (Earth orbits). */
  moon: z.boolean().default(false),
  /** Planets as third bodies (heliocentric runs). */
  planets: z.array(z.enum(thirdBodyPlanets, { error: `planets must be among ${thirdBodyPlanets.join(', ')}` })).default([]),
  /** Solar radiation pressure from the vehicle model. */
  srp: z.boolean().default(true),
  /** Atmospheric drag (Earth orbits): exponential density table. */
  drag: z
    .object({
      /** Drag coefficient Cd (-). */
      cd: positive('forces.drag.cd', '-'),
      /** Drag reference area (m²). */
      areaM2: positive('forces.drag.areaM2', 'm²'),
    })
    .optional(),
});

/** Integrator tolerances. */
export const tolerancesSchema = z.object({
  /** Relative tolerance of the adaptive integrator (-). */
  relTol: z.number().min(1e-14, 'relTol must be at least 1e-14').max(1e-3, 'relTol must be at most 1e-3').default(1e-10),
  /**
   * Absolute tolerance per component, in m for positions and m/s for velocities (one number for
   * both, so keep it small: the relative tolerance should govern both).
   */
  absTol: z.number().min(1e-14, 'absTol must be at least 1e-14').max(1e3, 'absTol must be at most 1000').default(1e-9),
  /** Largest step (s); omitted: no limit beyond the output step. */
  maxStepS: positive('tolerances.maxStepS', 's').optional(),
});

/** A scenario: a vehicle, an orbit, the forces, and the budget requirements, everything a run needs. */
export const scenarioSchema = z
  .object({
    /** Display name. */
    name: z.string().trim().min(1, 'name is required').max(120),
    description: z.string().max(4000).optional(),
    /** The vehicle itself, or a reference (a file path for the command line, a revision id for the API). */
    vehicle: z.union([vehicleSpecSchema, z.object({ ref: z.string().min(1, 'vehicle.ref must name a vehicle') })], {
      error: 'vehicle must be a vehicle description or { ref }',
    }),
    /** Initial orbit and its epoch. */
    orbit: initialOrbitSchema,
    /** Length of the run (days). */
    spanDays: positive('spanDays', 'days').max(3660, 'spanDays must be at most 3660 days'),
    /** Output step (s) of the ephemeris samples. */
    outputStepS: positive('outputStepS', 's'),
    forces: forceSwitchesSchema.default({ zonalDegree: 0, sun: false, moon: false, planets: [], srp: true }),
    /** Shadow model for SRP and which bodies cast shadows (Earth orbits). */
    shadow: z
      .object({
        model: z.enum(['none', 'cylindrical', 'conical'], { error: 'shadow.model must be none, cylindrical or conical' }),
        bodies: z.array(z.enum(['earth', 'moon'])).min(1, 'shadow.bodies must name earth and/or moon').default(['earth', 'moon']),
      })
      .default({ model: 'conical', bodies: ['earth', 'moon'] }),
    attitude: scenarioAttitudeSchema,
    /** Solar constant at 1 AU (W/m²); default 1361 (IAU 2015 Resolution B3). A higher value budgets a worst case. */
    s0WM2: positive('s0WM2', 'W/m²').optional(),
    tolerances: tolerancesSchema.default({ relTol: 1e-10, absTol: 1e-9 }),
    /** Reaction-wheel momentum budget. */
    momentum: z
      .object({
        /** Usable wheel momentum capacity (N·m·s). */
        wheelCapacityNms: positive('momentum.wheelCapacityNms', 'N·m·s'),
        /** Dump when accumulated momentum reaches this fraction of the capacity (-). */
        dumpThresholdFraction: z.number().gt(0, 'dumpThresholdFraction must be in (0, 1]').max(1, 'dumpThresholdFraction must be in (0, 1]'),
      })
      .optional(),
    /** Extra events to locate (eclipse edges are always located when SRP uses a shadow model). */
    events: z
      .object({
        /** Equator crossings (ascending and descending nodes, EQJ equator). */
        nodes: z.boolean().default(false),
        /** Radii (km from the central body's centre) whose crossings are reported, up and down. */
        radiiKm: z.array(positive('events.radiiKm', 'km')).max(16, 'events.radiiKm takes at most 16 radii').default([]),
      })
      .default({ nodes: false, radiiKm: [] }),
    /** Sail mission target. */
    sail: z.object({ targetRadiusAu: positive('sail.targetRadiusAu', 'AU') }).optional(),
    /** Budget lines with their requirements and margin policies. */
    requirements: budgetRequirementsSchema.default([]),
  })
  .superRefine((s, ctx) => {
    const helio = s.orbit.centralBody === 'sun';
    if (helio && (s.forces.zonalDegree > 0 || s.forces.sun || s.forces.moon || s.forces.drag)) {
      ctx.addIssue({ code: 'custom', path: ['forces'], message: 'a heliocentric scenario takes only planets and SRP as forces' });
    }
    if (!helio && s.forces.planets.length > 0) {
      ctx.addIssue({ code: 'custom', path: ['forces', 'planets'], message: 'planets act as third bodies on heliocentric scenarios only' });
    }
    if (s.outputStepS > s.spanDays * 86_400) {
      ctx.addIssue({ code: 'custom', path: ['outputStepS'], message: 'outputStepS must not exceed the span' });
    }
    if (s.spanDays * 86_400 / s.outputStepS > 5_000_000) {
      ctx.addIssue({ code: 'custom', path: ['outputStepS'], message: 'outputStepS gives more than 5 million samples: choose a longer step' });
    }
  });
export type Scenario = z.infer<typeof scenarioSchema>;
