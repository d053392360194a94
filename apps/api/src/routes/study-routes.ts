import { Router } from 'express';
import { stringify } from 'csv-stringify';
import { EXPORT_CAUTION } from '@photon-ledger/srp-core';
import {
  missionParamsSchema,
  studyBestQuerySchema,
  studyCaseQuerySchema,
  studyCreateSchema,
  studyCsvQuerySchema,
  studyParamsSchema,
  studyParetoQuerySchema,
  type Study,
  type StudyBest,
  type StudyCasePage,
  type StudyList,
  type StudyPareto,
  type StudyStatistics,
} from '@photon-ledger/shared';
import { parseInput } from '../middleware/validate';
import { currentUser } from '../middleware/auth';
import { missionFor } from '../services/mission-access';
import { allCases, cancelStudy, createStudy, getStudy, listCases, listStudies, studyBest, studyPareto, studyStatistics } from '../services/study-service';
import type { RouteContext } from './route-context';

/** Trade studies: define, run (one job per case), progress, cancel, results, CSV. Expects `requireUser` in front. */
export function studyRoutes(ctx: RouteContext): Router {
  const router = Router();
  const deps = { sequelize: ctx.sequelize, jobs: ctx.jobs };

  router.post('/missions/:missionId/studies', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    const input = parseInput(studyCreateSchema, req.body, 'body');
    res.status(201).json((await createStudy(deps, user, mission, input)) satisfies Study);
  });

  router.get('/missions/:missionId/studies', async (req, res) => {
    const { missionId } = parseInput(missionParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    res.json({ studies: await listStudies(ctx.sequelize, mission) } satisfies StudyList);
  });

  router.get(`/missions/:missionId/studies/:studyId`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    res.json((await getStudy(ctx.sequelize, mission, studyId)) satisfies Study);
  });

  router.post(`/missions/:missionId/studies/:studyId/cancel`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const user = currentUser(res);
    const mission = await missionFor(user, missionId, 'edit');
    res.json((await cancelStudy(deps, user, mission, studyId)) satisfies Study);
  });

  router.get(`/missions/:missionId/studies/:studyId/cases`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(studyCaseQuerySchema, req.query, 'query');
    res.json((await listCases(ctx.sequelize, mission, studyId, query)) satisfies StudyCasePage);
  });

  router.get(`/missions/:missionId/studies/:studyId/statistics`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    res.json((await studyStatistics(ctx.sequelize, mission, studyId)) satisfies StudyStatistics);
  });

  router.get(`/missions/:missionId/studies/:studyId/pareto`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(studyParetoQuerySchema, req.query, 'query');
    res.json((await studyPareto(ctx.sequelize, mission, studyId, query)) satisfies StudyPareto);
  });

  router.get(`/missions/:missionId/studies/:studyId/best`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(studyBestQuerySchema, req.query, 'query');
    res.json((await studyBest(ctx.sequelize, mission, studyId, query)) satisfies StudyBest);
  });

  router.get(`/missions/:missionId/studies/:studyId/export/cases.csv`, async (req, res) => {
    const { missionId, studyId } = parseInput(studyParamsSchema, req.params, 'path');
    const mission = await missionFor(currentUser(res), missionId, 'read');
    const query = parseInput(studyCsvQuerySchema, req.query, 'query');
    const study = await getStudy(ctx.sequelize, mission, studyId);
    // Read the first page before the headers go out, so a bad filter still answers 400.
    const pages = allCases(ctx.sequelize, studyId, query);
    const first = await pages.next();
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="study-${studyId}-cases.csv"`);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.write(`# caution: ${EXPORT_CAUTION}\n# study: ${study.name.replace(/[\r\n]+/g, ' ')} (${study.id})\n# design: ${study.design.kind}, ${study.progress.total} cases\n`);
    const lineKeys = study.lines;
    const csv = stringify({ header: true, columns: ['case', 'status', ...study.parameterPaths, ...lineKeys, 'error'] });
    csv.pipe(res);
    const write = (page: typeof first.value) => {
      for (const c of page ?? []) {
        csv.write([c.index, c.status, ...study.parameterPaths.map((p) => c.parameters[p] ?? ''), ...lineKeys.map((k) => c.lines?.[k] ?? ''), c.errorMessage ?? '']);
      }
    };
    if (!first.done) write(first.value);
    for await (const page of pages) write(page);
    csv.end();
  });

  return router;
}
