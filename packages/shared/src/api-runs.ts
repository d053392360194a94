import { z } from 'zod';
import { missionParamsSchema } from './missions';
import { runSchema, runStatusSchema } from './runs';

// Request and response schemas of the run routes (apps/api/src/routes/run-routes.ts) and the
// payload of the propagation job on the queue.

/** Body of `POST /api/missions/:missionId/runs`: the scenario to run (its spec and vehicle revision are snapshotted). */
export const runCreateSchema = z.object({
  scenarioId: z.uuid({ error: 'scenarioId must be the UUID of a scenario of this mission' }),
});
export type RunCreate = z.infer<typeof runCreateSchema>;

/** Largest page of `GET /api/missions/:missionId/runs`. */
export const MAX_RUN_LIST_LIMIT = 200;

/** Query of `GET /api/missions/:missionId/runs`: newest first. */
export const runListQuerySchema = z.object({
  /** Only runs of this scenario. */
  scenarioId: z.uuid({ error: 'scenarioId must be a UUID' }).optional(),
  /** Only runs in this state. */
  status: runStatusSchema.optional(),
  /** At most this many runs (1 to 200, default 50). */
  limit: z.coerce
    .number({ error: 'limit must be a whole number' })
    .int('limit must be a whole number')
    .min(1, `limit must be between 1 and ${MAX_RUN_LIST_LIMIT}`)
    .max(MAX_RUN_LIST_LIMIT, `limit must be between 1 and ${MAX_RUN_LIST_LIMIT}`)
    .default(50),
});
export type RunListQuery = z.infer<typeof runListQuerySchema>;

/** Answer of `GET /api/missions/:missionId/runs`. */
export const runListSchema = z.object({ runs: z.array(runSchema) });
export type RunList = z.infer<typeof runListSchema>;

/** Path parameters naming a run of a mission. */
export const runParamsSchema = missionParamsSchema.extend({
  runId: z.uuid({ error: 'runId must be a UUID' }),
});
export type RunParams = z.infer<typeof runParamsSchema>;

/** Payload of a `propagation` job on the queue: the run to compute (everything else is read from the run row). */
export const propagationJobSchema = z.object({
  runId: z.uuid({ error: 'runId must be a UUID' }),
});
export type PropagationJob = z.infer<typeof propagationJobSchema>;
