import { z } from 'zod';

/** Where an analysis run stands. */
export const runStatuses = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export const runStatusSchema = z.enum(runStatuses, { error: `status must be one of ${runStatuses.join(', ')}` });
export type RunStatus = z.infer<typeof runStatusSchema>;

const vec3 = z.tuple([z.number(), z.number(), z.number()]);

/** A run as the API shows it. */
export const runSchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  scenarioId: z.uuid(),
  scenarioName: z.string(),
  vehicleRevisionId: z.uuid(),
  status: runStatusSchema,
  /** Fraction done (0..1). */
  progress: z.number().min(0).max(1),
  cancelRequested: z.boolean(),
  errorMessage: z.string().nullable(),
  /** Worker that holds or last held the run (host:pid:slot). */
  workerId: z.string().nullable(),
  /** How many times a worker started it (more than 1 after a worker died mid-run). */
  attempts: z.number().int(),
  rerunOf: z.uuid().nullable(),
  createdBy: z.uuid().nullable(),
  queuedAt: z.iso.datetime(),
  startedAt: z.iso.datetime().nullable(),
  heartbeatAt: z.iso.datetime().nullable(),
  finishedAt: z.iso.datetime().nullable(),
});
export type Run = z.infer<typeof runSchema>;

/** Located event of a stored run. */
export const runEventSchema = z.object({
  name: z.string(),
  tSeconds: z.number(),
  utc: z.iso.datetime(),
});
export type RunEvent = z.infer<typeof runEventSchema>;

/** What a succeeded run stores as its summary (the result page's first read). */
export const runSummarySchema = z.object({
  /** The analysis-aid caution every result carries. */
  caution: z.string(),
  scenarioName: z.string(),
  vehicle: z.object({ name: z.string(), kind: z.string(), massKg: z.number(), revisionId: z.uuid() }),
  epochUtc: z.iso.datetime(),
  /** Inertial frame label (EQJ, J2000 equator and equinox). */
  frame: z.string(),
  centralBody: z.enum(['earth', 'sun']),
  spanSeconds: z.number(),
  outputStepSeconds: z.number(),
  sampleCount: z.number().int(),
  eventCount: z.number().int(),
  /** Sample columns in stored order (t_s, x_m, ..., then one acceleration magnitude per force). */
  columns: z.array(z.string()),
  forceNames: z.array(z.string()),
  integrator: z.object({ steps: z.number().int(), rejected: z.number().int(), evaluations: z.number().int(), wallMs: z.number() }),
  finalState: z.object({ tSeconds: z.number(), utc: z.iso.datetime(), positionM: vec3, velocityMS: vec3 }),
  /** Of |a_srp| over the run (m/s²). */
  srpAcceleration: z.object({ mean: z.number(), max: z.number(), rms: z.number() }),
});
export type RunSummary = z.infer<typeof runSummarySchema>;
