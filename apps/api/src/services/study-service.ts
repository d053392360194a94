/**
 * Trade studies as the API sees them: define one (cases made and checked, one job per case queued in
 * the same transaction), read progress, cancel, and read results (case table, statistics, Pareto
 * front, best case). Computing cases is the worker's business (jobs/study-case-job.ts).
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import {
  budgetLineKeys,
  fieldErrors,
  PERCENTILE_METHOD,
  scenarioSchema,
  studyDesignSchema,
  vehicleSpecSchema,
  type BudgetLineKey,
  type Study,
  type StudyBest,
  type StudyCase,
  type StudyCaseQuery,
  type StudyCaseStatus,
  type StudyCreate,
  type StudyPareto,
  type StudyStatistics,
  type User,
} from '@photon-ledger/shared';
import { EXPORT_CAUTION } from '@photon-ledger/srp-core';
import { AppError, notFound } from '../errors/app-error';
import type { JobSender } from '../jobs/job-sender';
import { audit, ScenarioModel, StudyCaseModel, TradeStudyModel, VehicleRevisionModel, type MissionModel } from '../models';
import { checkCases, designCases, type StudyBase } from './study-design';
import { assertVehicleTableReady } from './coefficient-table-service';
import { lineStatistics, paretoFront } from './study-statistics';

/** Queue of study cases: one job per case, payload `{ caseId }`. */
export const STUDY_CASE_QUEUE = 'study-case';

export interface StudyDeps {
  sequelize: Sequelize;
  jobs: JobSender;
}

interface StudyRow {
  id: string;
  mission_id: string;
  name: string;
  scenario_id: string | null;
  scenario_name: string | null;
  vehicle_revision_id: string;
  definition: { design: unknown; lines: BudgetLineKey[]; parameterPaths: string[] };
  case_count: number;
  cancel_requested: boolean;
  created_by: string | null;
  created_at: Date;
  queued: string;
  running: string;
  succeeded: string;
  failed: string;
  cancelled: string;
}

const STUDY_SELECT = `
  SELECT s.id, s.mission_id, s.name, s.scenario_id, s.base_scenario->>'name' AS scenario_name, s.vehicle_revision_id,
         s.definition, s.case_count, s.cancel_requested, s.created_by, s.created_at,
         count(*) FILTER (WHERE c.status = 'queued') AS queued,
         count(*) FILTER (WHERE c.status = 'running') AS running,
         count(*) FILTER (WHERE c.status = 'succeeded') AS succeeded,
         count(*) FILTER (WHERE c.status = 'failed') AS failed,
         count(*) FILTER (WHERE c.status = 'cancelled') AS cancelled
    FROM trade_studies s LEFT JOIN study_cases c ON c.study_id = s.id`;

function toStudy(row: StudyRow): Study {
  const counts = {
    queued: Number(row.queued),
    running: Number(row.running),
    succeeded: Number(row.succeeded),
    failed: Number(row.failed),
    cancelled: Number(row.cancelled),
  };
  const total = row.case_count;
  const done = counts.succeeded + counts.failed + counts.cancelled;
  const open = counts.queued + counts.running;
  return {
    id: row.id,
    missionId: row.mission_id,
    name: row.name,
    scenarioId: row.scenario_id,
    scenarioName: row.scenario_name ?? '',
    vehicleRevisionId: row.vehicle_revision_id,
    design: studyDesignSchema.parse(row.definition.design),
    lines: row.definition.lines,
    parameterPaths: row.definition.parameterPaths,
    status: row.cancel_requested ? (open > 0 ? 'cancelling' : 'cancelled') : open > 0 ? 'running' : 'finished',
    cancelRequested: row.cancel_requested,
    progress: { total, ...counts, fractionDone: total === 0 ? 1 : done / total },
    createdBy: row.created_by,
    createdAt: row.created_at.toISOString(),
  };
}

async function findStudy(sequelize: Sequelize, missionId: string, studyId: string, transaction?: Transaction): Promise<Study | null> {
  const [row] = await sequelize.query<StudyRow>(`${STUDY_SELECT} WHERE s.id = :studyId AND s.mission_id = :missionId GROUP BY s.id`, {
    replacements: { studyId, missionId },
    type: QueryTypes.SELECT,
    ...(transaction ? { transaction } : {}),
  });
  return row ? toStudy(row) : null;
}

/** A study of the mission; 404 when there is none. */
export async function getStudy(sequelize: Sequelize, mission: MissionModel, studyId: string): Promise<Study> {
  const study = await findStudy(sequelize, mission.id, studyId);
  if (!study) throw notFound('study');
  return study;
}

/** The mission's studies, newest first. */
export async function listStudies(sequelize: Sequelize, mission: MissionModel): Promise<Study[]> {
  const rows = await sequelize.query<StudyRow>(`${STUDY_SELECT} WHERE s.mission_id = :missionId GROUP BY s.id ORDER BY s.created_at DESC`, {
    replacements: { missionId: mission.id },
    type: QueryTypes.SELECT,
  });
  return rows.map(toStudy);
}

/** The base specs of a scenario of the mission; 400 naming scenarioId when it cannot be used. */
async function loadBase(missionId: string, scenarioId: string): Promise<{ base: StudyBase; vehicleRevisionId: string }> {
  const scenario = await ScenarioModel.findOne({ where: { id: scenarioId, missionId } });
  const refuse = (message: string): never => {
    throw new AppError('validation_failed', `scenarioId: ${message}`, { fields: { scenarioId: message } });
  };
  if (!scenario) return refuse('scenarioId must name a scenario of this mission');
  const spec = scenarioSchema.safeParse(scenario.spec);
  if (!spec.success) return refuse(`the scenario is not valid (${Object.entries(fieldErrors(spec.error)).map(([f, m]) => `${f}: ${m}`)[0]})`);
  if (spec.data.attitude.law === 'tabulated') return refuse('scenarios with a tabulated attitude profile cannot be the base of a study');
  const revision = await VehicleRevisionModel.findByPk(scenario.vehicleRevisionId, { attributes: ['id', 'spec'] });
  const vehicle = vehicleSpecSchema.safeParse(revision?.spec);
  if (!revision || !vehicle.success) return refuse('the scenario\'s vehicle revision is missing or not valid');
  return { base: { vehicle: vehicle.data, scenario: spec.data }, vehicleRevisionId: revision.id };
}

/** Vehicle paths a study over a mesh vehicle may vary: they leave its coefficient table as it is. */
const MESH_VEHICLE_PATHS = ['vehicle.massKg', 'vehicle.centreOfMassM.0', 'vehicle.centreOfMassM.1', 'vehicle.centreOfMassM.2'];

/**
 * A mesh vehicle's SRP is its coefficient table (torque about the origin, moved to the centre of
 * mass per case), so a study may vary its mass and centre of mass; any other vehicle path would
 * need a new table per case: 400 naming the parameter.
 */
function checkMeshVehiclePaths(parameters: readonly { path: string }[]): void {
  parameters.forEach((p, k) => {
    if (!p.path.startsWith('vehicle.') || MESH_VEHICLE_PATHS.includes(p.path)) return;
    const field = `design.parameters.${k}.path`;
    const message = `${p.path} cannot be varied for a mesh vehicle: its SRP comes from a coefficient table, and each value would need a new table; vary ${MESH_VEHICLE_PATHS.join(', ')} or scenario paths`;
    throw new AppError('validation_failed', `${field}: ${message}`, { fields: { [field]: message } });
  });
}

/**
 * Defines a study and queues its cases (one job each), all in one transaction.
 * @throws AppError 400 naming the field for bad paths, too many cases or a case whose specs are not valid
 */
export async function createStudy(deps: StudyDeps, user: User, mission: MissionModel, input: StudyCreate): Promise<Study> {
  const { sequelize, jobs } = deps;
  const { base, vehicleRevisionId } = await loadBase(mission.id, input.scenarioId);
  if (base.vehicle.kind === 'mesh') {
    checkMeshVehiclePaths(input.design.parameters);
    await assertVehicleTableReady(base.vehicle, 'the study');
  }
  const cases = designCases(base, input.design);
  checkCases(base, cases);
  const parameterPaths = Object.keys(cases[0] ?? {});
  const studyId = await sequelize.transaction(async (transaction) => {
    const study = await TradeStudyModel.create(
      {
        missionId: mission.id,
        name: input.name,
        scenarioId: input.scenarioId,
        vehicleRevisionId,
        baseScenario: base.scenario as unknown as Record<string, unknown>,
        baseVehicle: base.vehicle as unknown as Record<string, unknown>,
        definition: { design: input.design, lines: input.lines, parameterPaths },
        caseCount: cases.length,
        createdBy: user.id,
      },
      { transaction },
    );
    const rows = await StudyCaseModel.bulkCreate(
      cases.map((parameters, caseIndex) => ({ studyId: study.id, caseIndex, parameters })),
      { transaction, returning: ['id'] },
    );
    for (const row of rows) await jobs.send(STUDY_CASE_QUEUE, { caseId: row.id }, { inTransaction: { sequelize, transaction } });
    await audit(
      {
        userId: user.id,
        missionId: mission.id,
        action: 'study-created',
        entityType: 'trade-study',
        entityId: study.id,
        detail: { scenarioId: input.scenarioId, design: input.design.kind, caseCount: cases.length },
      },
      transaction,
    );
    return study.id;
  });
  return (await findStudy(sequelize, mission.id, studyId))!;
}

/**
 * Cancels a study: queued cases become cancelled at once, running ones are flagged (their workers
 * stop them within about a second). 409 when nothing is left to cancel.
 */
export async function cancelStudy(deps: StudyDeps, user: User, mission: MissionModel, studyId: string): Promise<Study> {
  const { sequelize } = deps;
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ id: string }>(
      `UPDATE trade_studies SET cancel_requested = true, updated_at = now()
        WHERE id = :studyId AND mission_id = :missionId AND NOT cancel_requested RETURNING id`,
      { replacements: { studyId, missionId: mission.id }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) {
      if (!(await findStudy(sequelize, mission.id, studyId, transaction))) throw notFound('study');
      throw new AppError('conflict', 'the study has already been cancelled');
    }
    const [, affected] = await sequelize.query(
      `UPDATE study_cases SET status = 'cancelled', finished_at = now(), updated_at = now() WHERE study_id = :studyId AND status = 'queued'`,
      { replacements: { studyId }, type: QueryTypes.UPDATE, transaction },
    );
    await audit(
      { userId: user.id, missionId: mission.id, action: 'study-cancelled', entityType: 'trade-study', entityId: studyId, detail: { queuedCasesCancelled: affected } },
      transaction,
    );
    return (await findStudy(sequelize, mission.id, studyId, transaction))!;
  });
}

interface CaseRow {
  id: string;
  case_index: number;
  status: StudyCaseStatus;
  parameters: Record<string, number>;
  lines: Record<string, number | null> | null;
  error_message: string | null;
}

const toCase = (row: CaseRow): StudyCase => ({
  id: row.id,
  index: row.case_index,
  status: row.status,
  parameters: row.parameters,
  lines: row.lines,
  errorMessage: row.error_message,
});

/** WHERE and ORDER BY of a case table query (sort keys come from a validated pattern and go in as bound text). */
function caseQueryParts(studyId: string, query: Omit<StudyCaseQuery, 'limit' | 'offset'>) {
  const where = ['study_id = :studyId'];
  const replacements: Record<string, unknown> = { studyId };
  if (query.status) {
    where.push('status = :status');
    replacements.status = query.status;
  }
  if (query.min !== undefined || query.max !== undefined) {
    if (!query.line) throw new AppError('validation_failed', 'line: name the budget line the range min..max applies to', { fields: { line: 'required with min or max' } });
    replacements.rangeLine = query.line;
    if (query.min !== undefined) {
      where.push(`(lines->>:rangeLine)::float8 >= :min`);
      replacements.min = query.min;
    }
    if (query.max !== undefined) {
      where.push(`(lines->>:rangeLine)::float8 <= :max`);
      replacements.max = query.max;
    }
  }
  let order = 'case_index';
  if (query.sort.startsWith('line:')) {
    const key = query.sort.slice(5);
    if (!(budgetLineKeys as readonly string[]).includes(key)) throw new AppError('validation_failed', `sort: ${key} is not a budget line`, { fields: { sort: `${key} is not a budget line` } });
    replacements.sortKey = key;
    order = '(lines->>:sortKey)::float8';
  } else if (query.sort.startsWith('param:')) {
    replacements.sortKey = query.sort.slice(6);
    order = '(parameters->>:sortKey)::float8';
  }
  const dir = query.dir === 'desc' ? 'DESC' : 'ASC';
  return { where: where.join(' AND '), orderBy: `${order} ${dir} NULLS LAST, case_index ASC`, replacements };
}

/** A page of the case table. */
export async function listCases(sequelize: Sequelize, mission: MissionModel, studyId: string, query: StudyCaseQuery): Promise<{ total: number; cases: StudyCase[] }> {
  await getStudy(sequelize, mission, studyId);
  const { where, orderBy, replacements } = caseQueryParts(studyId, query);
  const [count] = await sequelize.query<{ n: string }>(`SELECT count(*) AS n FROM study_cases WHERE ${where}`, { replacements, type: QueryTypes.SELECT });
  const rows = await sequelize.query<CaseRow>(
    `SELECT id, case_index, status, parameters, lines, error_message FROM study_cases WHERE ${where} ORDER BY ${orderBy} LIMIT :limit OFFSET :offset`,
    { replacements: { ...replacements, limit: query.limit, offset: query.offset }, type: QueryTypes.SELECT },
  );
  return { total: Number(count?.n ?? 0), cases: rows.map(toCase) };
}

/** Every case of the table in order, page by page (for the CSV). */
export async function* allCases(sequelize: Sequelize, studyId: string, query: Omit<StudyCaseQuery, 'limit' | 'offset'>, pageSize = 500): AsyncGenerator<StudyCase[]> {
  const { where, orderBy, replacements } = caseQueryParts(studyId, query);
  for (let offset = 0; ; offset += pageSize) {
    const rows = await sequelize.query<CaseRow>(
      `SELECT id, case_index, status, parameters, lines, error_message FROM study_cases WHERE ${where} ORDER BY ${orderBy} LIMIT :limit OFFSET :offset`,
      { replacements: { ...replacements, limit: pageSize, offset }, type: QueryTypes.SELECT },
    );
    if (rows.length > 0) yield rows.map(toCase);
    if (rows.length < pageSize) return;
  }
}

async function succeededCases(sequelize: Sequelize, studyId: string): Promise<StudyCase[]> {
  const rows = await sequelize.query<CaseRow>(
    `SELECT id, case_index, status, parameters, lines, error_message FROM study_cases WHERE study_id = :studyId AND status = 'succeeded' ORDER BY case_index`,
    { replacements: { studyId }, type: QueryTypes.SELECT },
  );
  return rows.map(toCase);
}

const lineValue = (c: StudyCase, line: BudgetLineKey): number | null => {
  const v = c.lines?.[line];
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
};

/** Statistics of the study's lines over its succeeded cases. */
export async function studyStatistics(sequelize: Sequelize, mission: MissionModel, studyId: string): Promise<StudyStatistics> {
  const study = await getStudy(sequelize, mission, studyId);
  const cases = await succeededCases(sequelize, studyId);
  return {
    caution: EXPORT_CAUTION,
    percentileMethod: PERCENTILE_METHOD,
    succeeded: cases.length,
    total: study.progress.total,
    lines: study.lines.map((line) => lineStatistics(line, cases.map((c) => lineValue(c, line)))),
  };
}

/** The non-dominated succeeded cases for two lines and their directions. */
export async function studyPareto(
  sequelize: Sequelize,
  mission: MissionModel,
  studyId: string,
  q: { x: BudgetLineKey; xDir: 'min' | 'max'; y: BudgetLineKey; yDir: 'min' | 'max' },
): Promise<StudyPareto> {
  await getStudy(sequelize, mission, studyId);
  const cases = await succeededCases(sequelize, studyId);
  const front = paretoFront(cases, (c) => lineValue(c, q.x), q.xDir, (c) => lineValue(c, q.y), q.yDir);
  return { ...q, cases: front };
}

/** The succeeded case with the smallest (min) or largest (max) value of a line; the lower index on ties. */
export async function studyBest(sequelize: Sequelize, mission: MissionModel, studyId: string, q: { line: BudgetLineKey; dir: 'min' | 'max' }): Promise<StudyBest> {
  await getStudy(sequelize, mission, studyId);
  let best: StudyCase | null = null;
  let bestValue = 0;
  for (const c of await succeededCases(sequelize, studyId)) {
    const v = lineValue(c, q.line);
    if (v === null) continue;
    if (best === null || (q.dir === 'min' ? v < bestValue : v > bestValue)) {
      best = c;
      bestValue = v;
    }
  }
  return { ...q, case: best };
}
