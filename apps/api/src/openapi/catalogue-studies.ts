/** Catalogue entries for trade studies. */
import {
  missionParamsSchema,
  studyBestQuerySchema,
  studyBestSchema,
  studyCasePageSchema,
  studyCaseQuerySchema,
  studyCreateSchema,
  studyCsvQuerySchema,
  studyListSchema,
  studyParamsSchema,
  studyParetoQuerySchema,
  studyParetoSchema,
  studySchema,
  studyStatisticsSchema,
} from '@photon-ledger/shared';
import type { RouteDoc } from './route-catalogue';

const studies = '/missions/:missionId/studies';
const study = `${studies}/:studyId`;

export const studyRouteDocs: RouteDoc[] = [
  {
    method: 'post',
    path: studies,
    summary: 'Define a trade study (grid of lists/ranges or seeded Monte Carlo over field paths) and queue one job per case',
    tag: 'studies',
    access: 'edit',
    params: missionParamsSchema,
    body: studyCreateSchema,
    response: { status: 201, schema: studySchema },
  },
  { method: 'get', path: studies, summary: 'Trade studies with progress, newest first', tag: 'studies', access: 'read', params: missionParamsSchema, response: { status: 200, schema: studyListSchema } },
  { method: 'get', path: study, summary: 'A study: definition, status, progress (cases done / total, failures)', tag: 'studies', access: 'read', params: studyParamsSchema, response: { status: 200, schema: studySchema } },
  {
    method: 'post',
    path: `${study}/cancel`,
    summary: 'Cancel: queued cases at once, running ones flagged (stop within about a second); 409 when already cancelled',
    tag: 'studies',
    access: 'edit',
    params: studyParamsSchema,
    response: { status: 200, schema: studySchema },
  },
  {
    method: 'get',
    path: `${study}/cases`,
    summary: 'Case table: sort by index, line:<key> or param:<path>; filter by status and by a line range (line, min, max)',
    tag: 'studies',
    access: 'read',
    params: studyParamsSchema,
    query: studyCaseQuerySchema,
    response: { status: 200, schema: studyCasePageSchema },
  },
  {
    method: 'get',
    path: `${study}/statistics`,
    summary: 'Mean, sample SD, standard error, 95th and 99th percentiles (type 7) of each compared line over succeeded cases',
    tag: 'studies',
    access: 'read',
    params: studyParamsSchema,
    response: { status: 200, schema: studyStatisticsSchema },
  },
  {
    method: 'get',
    path: `${study}/pareto`,
    summary: 'Non-dominated cases for two lines with their directions (min or max)',
    tag: 'studies',
    access: 'read',
    params: studyParamsSchema,
    query: studyParetoQuerySchema,
    response: { status: 200, schema: studyParetoSchema },
  },
  { method: 'get', path: `${study}/best`, summary: 'The best succeeded case for one line (min or max)', tag: 'studies', access: 'read', params: studyParamsSchema, query: studyBestQuerySchema, response: { status: 200, schema: studyBestSchema } },
  {
    method: 'get',
    path: `${study}/export/cases.csv`,
    summary: 'Case table as CSV, streamed (caution line in the header; same sort and filters as the table)',
    tag: 'exports',
    access: 'read',
    params: studyParamsSchema,
    query: studyCsvQuerySchema,
    response: { status: 200, contentType: 'text/csv' },
  },
];
