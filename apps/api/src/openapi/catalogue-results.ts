/** Catalogue entries for run results, budgets with the mission's requirements, and exports. */
import {
  missionParamsSchema,
  missionRequirementListSchema,
  missionRequirementSchema,
  requirementParamsSchema,
  requirementUpsertSchema,
  resultRunParamsSchema,
  runBudgetReportSchema,
  runEventsSchema,
  runSummarySchema,
  samplePageQuerySchema,
  samplePageSchema,
  seriesQuerySchema,
  seriesSchema,
} from '@photon-ledger/shared';
import type { RouteDoc } from './route-catalogue';

const run = '/missions/:missionId/runs/:runId';

export const resultRoutes: RouteDoc[] = [
  { method: 'get', path: `${run}/summary`, summary: 'Summary of a succeeded run (409 while it is not)', tag: 'results', access: 'read', params: resultRunParamsSchema, response: { status: 200, schema: runSummarySchema } },
  { method: 'get', path: `${run}/events`, summary: 'Located events (eclipse edges, node and radius crossings)', tag: 'results', access: 'read', params: resultRunParamsSchema, response: { status: 200, schema: runEventsSchema } },
  {
    method: 'get',
    path: `${run}/samples`,
    summary: 'A page of ephemeris samples (keyset cursor)',
    tag: 'results',
    access: 'read',
    params: resultRunParamsSchema,
    query: samplePageQuerySchema,
    response: { status: 200, schema: samplePageSchema },
  },
  {
    method: 'get',
    path: `${run}/series`,
    summary: 'Decimated series for charts, keeping each bucket’s minimum and maximum',
    tag: 'results',
    access: 'read',
    params: resultRunParamsSchema,
    query: seriesQuerySchema,
    response: { status: 200, schema: seriesSchema },
  },
  {
    method: 'get',
    path: `${run}/budget`,
    summary: 'Budget lines with the mission’s current requirements: value, margin, pass/fail',
    tag: 'budgets',
    access: 'read',
    params: resultRunParamsSchema,
    response: { status: 200, schema: runBudgetReportSchema },
  },
  { method: 'get', path: '/missions/:missionId/requirements', summary: 'Requirements on budget lines', tag: 'budgets', access: 'read', params: missionParamsSchema, response: { status: 200, schema: missionRequirementListSchema } },
  {
    method: 'put',
    path: '/missions/:missionId/requirements/:line',
    summary: 'Set the requirement and margin policy of a budget line (201 when new, 200 when replaced)',
    tag: 'budgets',
    access: 'lead',
    params: requirementParamsSchema,
    body: requirementUpsertSchema,
    response: { status: 200, schema: missionRequirementSchema },
  },
  { method: 'delete', path: '/missions/:missionId/requirements/:line', summary: 'Remove a requirement', tag: 'budgets', access: 'lead', params: requirementParamsSchema, response: { status: 204 } },
  { method: 'get', path: `${run}/export/ephemeris.csv`, summary: 'Ephemeris as CSV (frame, time scale, units, epoch and caution in the header)', tag: 'exports', access: 'read', params: resultRunParamsSchema, response: { status: 200, contentType: 'text/csv' } },
  { method: 'get', path: `${run}/export/ephemeris.oem`, summary: 'Ephemeris as a CCSDS Orbit Ephemeris Message (KVN, 502.0-B-3)', tag: 'exports', access: 'read', params: resultRunParamsSchema, response: { status: 200, contentType: 'text/plain' } },
  { method: 'get', path: `${run}/export/budget.csv`, summary: 'Budget table as CSV', tag: 'exports', access: 'read', params: resultRunParamsSchema, response: { status: 200, contentType: 'text/csv' } },
];
