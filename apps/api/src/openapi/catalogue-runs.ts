/** Catalogue entries for runs (queued on the PostgreSQL job queue). */
import { missionParamsSchema, runCreateSchema, runListQuerySchema, runListSchema, runParamsSchema, runSchema } from '@photon-ledger/shared';
import type { RouteDoc } from './route-catalogue';

const m = '/missions/:missionId';

export const runRoutes: RouteDoc[] = [
  {
    method: 'post',
    path: `${m}/runs`,
    summary: 'Start a run of a scenario: snapshots the scenario and vehicle revision, queues a job',
    tag: 'runs',
    access: 'edit',
    params: missionParamsSchema,
    body: runCreateSchema,
    response: { status: 201, schema: runSchema },
  },
  { method: 'get', path: `${m}/runs`, summary: 'Runs, newest first', tag: 'runs', access: 'read', params: missionParamsSchema, query: runListQuerySchema, response: { status: 200, schema: runListSchema } },
  { method: 'get', path: `${m}/runs/:runId`, summary: 'A run: status, progress (0..1), timings, error, worker', tag: 'runs', access: 'read', params: runParamsSchema, response: { status: 200, schema: runSchema } },
  {
    method: 'post',
    path: `${m}/runs/:runId/cancel`,
    summary: 'Cancel: a queued run at once, a running one within about a second (409 when finished)',
    tag: 'runs',
    access: 'edit',
    params: runParamsSchema,
    response: { status: 200, schema: runSchema },
  },
  { method: 'post', path: `${m}/runs/:runId/rerun`, summary: 'Run again from the same snapshot', tag: 'runs', access: 'edit', params: runParamsSchema, response: { status: 201, schema: runSchema } },
];
