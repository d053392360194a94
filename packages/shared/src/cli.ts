import { z } from 'zod';
import { epochUtcSchema } from './orbit';

/** "x,y,z" on a command line, as three finite numbers. */
const vectorArg = (field: string) =>
  z
    .string({ error: `${field} must be three numbers x,y,z` })
    .transform((s) => s.split(',').map((c) => Number(c.trim())))
    .pipe(
      z.tuple([z.number().finite(), z.number().finite(), z.number().finite()], {
        error: `${field} must be three finite numbers x,y,z, e.g. 1,0,0`,
      }),
    )
    .refine((v) => Math.hypot(...v) > 0, `${field} must not be the zero vector`);

const positive = (field: string, unit: string) =>
  z.coerce.number({ error: `${field} must be a number (${unit})` }).refine((v) => Number.isFinite(v) && v > 0, `${field} must be a number (${unit}) greater than 0`);

/** Shadow models a command line may name. */
export const shadowModelNames = ['none', 'cylindrical', 'conical'] as const;

/**
 * Options of `photon-ledger force`: a vehicle file and either a Sun direction in the body frame
 * with a distance, or an orbit file and an attitude-law file (and optionally the instant).
 */
export const forceCommandSchema = z
  .object({
    vehicle: z.string({ error: '--vehicle FILE is required (a vehicle JSON file)' }).min(1),
    'sun-dir-body': vectorArg('--sun-dir-body').optional(),
    'distance-au': positive('--distance-au', 'AU').default(1),
    orbit: z.string().min(1).optional(),
    attitude: z.string().min(1).optional(),
    at: epochUtcSchema.optional(),
    s0: positive('--s0', 'W/m²').optional(),
    shadow: z.enum(shadowModelNames, { error: `--shadow must be one of ${shadowModelNames.join(', ')}` }).default('conical'),
    'per-surface': z.boolean().default(false),
  })
  .superRefine((o, ctx) => {
    const byGeometry = o['sun-dir-body'] !== undefined;
    const byOrbit = o.orbit !== undefined || o.attitude !== undefined;
    if (byGeometry === byOrbit) {
      ctx.addIssue({
        code: 'custom',
        path: ['sun-dir-body'],
        message: 'give either --sun-dir-body (with --distance-au) or --orbit FILE with --attitude FILE',
      });
    } else if (byOrbit && (o.orbit === undefined || o.attitude === undefined)) {
      ctx.addIssue({ code: 'custom', path: [o.orbit ? 'attitude' : 'orbit'], message: '--orbit and --attitude go together' });
    }
  });
export type ForceCommand = z.infer<typeof forceCommandSchema>;

/** Occulting-body choices of `photon-ledger eclipses`. */
export const eclipseBodyChoices = ['earth', 'moon', 'earth,moon'] as const;

/** Options of `photon-ledger eclipses`: an Earth orbit file and a span. */
export const eclipsesCommandSchema = z.object({
  orbit: z.string({ error: '--orbit FILE is required (an orbit JSON file)' }).min(1),
  'span-days': positive('--span-days', 'days').refine((v) => v <= 3660, '--span-days must be at most 3660 days'),
  bodies: z.enum(eclipseBodyChoices, { error: '--bodies must be earth, moon or earth,moon' }).default('earth,moon'),
  'step-s': positive('--step-s', 's').default(30),
  format: z.enum(['json', 'csv'], { error: '--format must be json or csv' }).default('json'),
});
export type EclipsesCommand = z.infer<typeof eclipsesCommandSchema>;
