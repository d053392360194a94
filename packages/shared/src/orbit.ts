import { z } from 'zod';

/**
 * The inertial frame of every orbit that crosses a boundary: the mean equator and equinox of
 * J2000, Earth-centred or Sun-centred (astronomy-engine's EQJ; the same axes as EME2000).
 */
export const orbitFrames = ['EQJ'] as const;
/** Validates `frame`; the message names the field and the one accepted value. */
export const orbitFrameSchema = z.enum(orbitFrames, {
  error: "frame must be 'EQJ' (J2000 equatorial: mean equator and equinox of J2000)",
});
/** `'EQJ'`. */
export type OrbitFrame = z.infer<typeof orbitFrameSchema>;
/** How the frame is shown to people and written in export headers. */
export const ORBIT_FRAME_LABEL = 'EQJ (J2000 equatorial)';

/** The body the orbit is centred on: an Earth orbit or a heliocentric one. */
export const centralBodies = ['earth', 'sun'] as const;
/** Validates `centralBody`. */
export const centralBodySchema = z.enum(centralBodies, { error: "centralBody must be 'earth' or 'sun'" });
/** `'earth'` or `'sun'`. */
export type CentralBody = z.infer<typeof centralBodySchema>;

/**
 * Radii (km) below which a periapsis or a position is refused as inside the central body.
 * Sources: WGS 84 equatorial radius 6378.137 km; IAU 2015 Resolution B3 nominal solar radius 695 700 km.
 */
const CENTRAL_BODY_RADIUS_KM: Record<CentralBody, number> = { earth: 6378.137, sun: 695_700 };

/** An ISO 8601 UTC date-time ending in Z, from 1972 on (UTC with whole leap seconds). */
export const epochUtcSchema = z
  .string({ error: 'epochUtc must be a string: an ISO 8601 UTC date-time ending in Z, e.g. 2026-03-20T12:00:00Z' })
  .pipe(
    z.iso.datetime({ error: 'epochUtc must be an ISO 8601 UTC date-time ending in Z, e.g. 2026-03-20T12:00:00Z' }),
  )
  .refine((s) => s >= '1972-01-01', { error: 'epochUtc must be on or after 1972-01-01T00:00:00Z' });

function finiteNumber(field: string, unit: string) {
  return z.number({ error: `${field} must be a finite number (${unit})` });
}

function angleDeg(field: string, min: number, max: number) {
  return finiteNumber(field, 'deg')
    .gte(min, `${field} must be between ${min} and ${max} degrees`)
    .lte(max, `${field} must be between ${min} and ${max} degrees`);
}

function vectorKm(field: string, unit: string) {
  const component = finiteNumber(field, unit);
  return z.tuple([component, component, component], { error: `${field} must be three finite numbers [x, y, z] (${unit})` });
}

const commonFields = {
  /** Epoch of the state, ISO 8601 UTC with Z. */
  epochUtc: epochUtcSchema,
  /** Centre of the frame and of the two-body motion. */
  centralBody: centralBodySchema,
  /** Inertial frame: EQJ (J2000 equatorial). */
  frame: orbitFrameSchema,
};

/** Classical elements at the epoch; for circular or equatorial orbits see the angle notes. */
export const keplerianOrbitSchema = z
  .object({
    kind: z.literal('keplerian'),
    ...commonFields,
    /** Semi-major axis (km): positive for an ellipse, negative for a hyperbola. */
    semiMajorAxisKm: finiteNumber('semiMajorAxisKm', 'km'),
    /** Eccentricity (-): 0 ≤ e < 1 ellipse, e > 1 hyperbola; e = 1 is refused. */
    eccentricity: finiteNumber('eccentricity', '-').gte(0, 'eccentricity must be 0 or more'),
    /** Inclination to the EQJ equator (deg), 0 to 180. */
    inclinationDeg: angleDeg('inclinationDeg', 0, 180),
    /** Right ascension of the ascending node (deg); ignored (0) for an equatorial orbit. */
    raanDeg: angleDeg('raanDeg', -360, 360),
    /** Argument of periapsis (deg); longitude of periapsis if equatorial, 0 if circular. */
    argPeriapsisDeg: angleDeg('argPeriapsisDeg', -360, 360),
    /** True anomaly (deg); argument of latitude if circular, true longitude if also equatorial. */
    trueAnomalyDeg: angleDeg('trueAnomalyDeg', -360, 360),
  })
  .superRefine((orbit, ctx) => {
    const { semiMajorAxisKm: a, eccentricity: e } = orbit;
    if (Math.abs(e - 1) < 1e-9) {
      ctx.addIssue({
        code: 'custom',
        path: ['eccentricity'],
        message: 'eccentricity must not be 1: parabolic orbits are not supported',
      });
      return;
    }
    if (e < 1 && !(a > 0)) {
      ctx.addIssue({
        code: 'custom',
        path: ['semiMajorAxisKm'],
        message: 'semiMajorAxisKm must be positive for an ellipse (eccentricity < 1)',
      });
      return;
    }
    if (e > 1 && !(a < 0)) {
      ctx.addIssue({
        code: 'custom',
        path: ['semiMajorAxisKm'],
        message: 'semiMajorAxisKm must be negative for a hyperbola (eccentricity > 1)',
      });
      return;
    }
    const periapsisKm = a * (1 - e);
    const radiusKm = CENTRAL_BODY_RADIUS_KM[orbit.centralBody];
    if (periapsisKm <= radiusKm) {
      ctx.addIssue({
        code: 'custom',
        path: ['semiMajorAxisKm'],
        message:
          `semiMajorAxisKm gives a periapsis radius a(1 − e) = ${periapsisKm.toFixed(3)} km inside the ` +
          `${orbit.centralBody} (radius ${radiusKm} km); the semi-major axis is measured from the centre, not an altitude`,
      });
    }
    if (e > 1 && 1 + e * Math.cos((orbit.trueAnomalyDeg * Math.PI) / 180) <= 0) {
      const limit = (Math.acos(-1 / e) * 180) / Math.PI;
      ctx.addIssue({
        code: 'custom',
        path: ['trueAnomalyDeg'],
        message: `trueAnomalyDeg must lie between the hyperbola's asymptotes, |ν| < ${limit.toFixed(3)}° for this eccentricity`,
      });
    }
  });
/** An initial orbit given as Keplerian elements (km, deg). */
export type KeplerianOrbit = z.infer<typeof keplerianOrbitSchema>;

/** Position and velocity at the epoch, in EQJ relative to the central body. */
export const cartesianOrbitSchema = z
  .object({
    kind: z.literal('cartesian'),
    ...commonFields,
    /** Position [x, y, z] (km). */
    positionKm: vectorKm('positionKm', 'km'),
    /** Velocity [vx, vy, vz] (km/s). */
    velocityKmS: vectorKm('velocityKmS', 'km/s'),
  })
  .superRefine((orbit, ctx) => {
    const [x, y, z] = orbit.positionKm;
    const r = Math.hypot(x, y, z);
    const radiusKm = CENTRAL_BODY_RADIUS_KM[orbit.centralBody];
    if (r <= radiusKm) {
      ctx.addIssue({
        code: 'custom',
        path: ['positionKm'],
        message: `positionKm is ${r.toFixed(3)} km from the centre of the ${orbit.centralBody}, inside it (radius ${radiusKm} km)`,
      });
    }
    const [vx, vy, vz] = orbit.velocityKmS;
    const hx = y * vz - z * vy;
    const hy = z * vx - x * vz;
    const hz = x * vy - y * vx;
    if (Math.hypot(hx, hy, hz) <= 1e-12 * r * Math.hypot(vx, vy, vz)) {
      ctx.addIssue({
        code: 'custom',
        path: ['velocityKmS'],
        message: 'velocityKmS must not be zero or parallel to positionKm (a straight-line fall has no orbit)',
      });
    }
  });
/** An initial orbit given as a Cartesian state (km, km/s). */
export type CartesianOrbit = z.infer<typeof cartesianOrbitSchema>;

/** The initial orbit of a scenario: Keplerian elements or a Cartesian state, chosen by `kind`. */
export const initialOrbitSchema = z.discriminatedUnion('kind', [keplerianOrbitSchema, cartesianOrbitSchema], {
  error: "kind must be 'keplerian' or 'cartesian'",
});
/** An initial orbit, either representation. */
export type InitialOrbit = z.infer<typeof initialOrbitSchema>;
