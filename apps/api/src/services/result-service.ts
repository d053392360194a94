/**
 * Reading a succeeded run's results: the access check shared by every result and export route,
 * the summary and events, pages of samples, and the budget with the mission's current
 * requirements applied.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import {
  applyRequirements,
  budgetLine,
  budgetLineKeys,
  type BudgetLine,
  type BudgetRequirement,
  type SrpBudget,
} from '@photon-ledger/srp-core';
import type { RunBudgetReport, RunEvent, RunEvents, RunSummary, SamplePage, SamplePageQuery, Scenario, User } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import { unpackRows, type SampleChunk } from './sample-store';
import { missionFor } from './mission-access';
import { sampleColumns } from './run-outcome';
import { currentRequirements } from './requirement-service';

/** Optional stored parts of a result, loaded only when asked for (the budget may be large). */
export type ResultPart = 'summary' | 'events' | 'budget';

/** A succeeded run of a mission the user may read, with the stored parts asked for. */
export interface SucceededRun {
  runId: string;
  mission: { id: string; slug: string; name: string };
  /** The scenario as it was when the run was made. */
  scenario: Scenario;
  layout: { stride: number; forceNames: string[] };
  sampleCount: number;
  summary?: RunSummary;
  events?: RunEvent[];
  budget?: SrpBudget;
}

interface RunRow {
  status: string;
  scenario_spec: Scenario;
  result_run_id: string | null;
  layout: { stride: number; forceNames: string[] } | null;
  sample_count: number | null;
  summary?: RunSummary;
  events?: RunEvent[];
  budget?: SrpBudget;
}

/** 409 for a run that has not succeeded, naming its status. */
function notSucceeded(status: string): AppError {
  return new AppError('conflict', `the run is ${status}: results exist only once a run has succeeded`);
}

/**
 * Loads a run for reading its results: 404 unless the mission is visible to the user and the run
 * belongs to it, 409 (with the run's status) unless it has succeeded.
 */
export async function succeededRunFor(
  sequelize: Sequelize,
  user: User,
  missionId: string,
  runId: string,
  parts: readonly ResultPart[] = [],
): Promise<SucceededRun> {
  const mission = await missionFor(user, missionId, 'read');
  const extra = parts.map((p) => `, rr.${p}`).join('');
  const [row] = await sequelize.query<RunRow>(
    `SELECT r.status, r.scenario_spec, rr.run_id AS result_run_id, rr.layout, rr.sample_count${extra}
       FROM runs r LEFT JOIN run_results rr ON rr.run_id = r.id
      WHERE r.id = :runId AND r.mission_id = :missionId`,
    { replacements: { runId, missionId }, type: QueryTypes.SELECT },
  );
  if (!row) throw notFound('run');
  if (row.status !== 'succeeded') throw notSucceeded(row.status);
  if (row.result_run_id === null || row.layout === null || row.sample_count === null) {
    throw new AppError('conflict', 'the run is marked succeeded but its results are not stored yet: try again shortly');
  }
  return {
    runId,
    mission: { id: mission.id, slug: mission.slug, name: mission.name },
    scenario: row.scenario_spec,
    layout: row.layout,
    sampleCount: row.sample_count,
    ...(row.summary ? { summary: row.summary } : {}),
    ...(row.events ? { events: row.events } : {}),
    ...(row.budget ? { budget: row.budget } : {}),
  };
}

/**
 * The stored summary as JSON text, straight from the database (the hot read of a result page:
 * no parse and re-serialisation on the way through).
 */
export async function runSummaryJson(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<string> {
  const now = Date.now();
  const visibleKey = `${user.id}:${missionId}`;
  const summaryKey = `${missionId}:${runId}`;
  const known = summaries.get(summaryKey);
  if (known !== undefined && (user.role === 'admin' || (visibility.get(visibleKey) ?? 0) > now)) return known;
  // Reading is open to every role that sees the mission, so visibility (membership, or an admin)
  // is the whole access rule here, checked in the same query as the read: one round trip.
  const [row] = await sequelize.query<{ status: string; summary: string | null }>(
    `SELECT r.status, rr.summary::text AS summary
       FROM runs r LEFT JOIN run_results rr ON rr.run_id = r.id
      WHERE r.id = $1 AND r.mission_id = $2
        AND ($4 OR EXISTS (SELECT 1 FROM mission_members mm WHERE mm.mission_id = r.mission_id AND mm.user_id = $3))`,
    // Bound parameters: the server does the substitution (replacements are formatted in JS).
    { bind: [runId, missionId, user.id, user.role === 'admin'], type: QueryTypes.SELECT },
  );
  if (!row) throw notFound('run');
  if (row.status !== 'succeeded') throw notSucceeded(row.status);
  if (row.summary === null) throw new AppError('conflict', 'the run is marked succeeded but its results are not stored yet: try again shortly');
  if (summaries.size >= SUMMARY_CACHE_MAX) summaries.clear();
  if (visibility.size >= SUMMARY_CACHE_MAX) visibility.clear();
  summaries.set(summaryKey, row.summary);
  visibility.set(visibleKey, now + VISIBILITY_CACHE_MS);
  return row.summary;
}

/**
 * The summary page is polled by every open result page, so its reads are kept in memory: a
 * succeeded run's summary never changes (a retried job rewrites the same numbers), and that a
 * user sees a mission is re-checked after VISIBILITY_CACHE_MS (as long as a session's user row is
 * reused, see auth-service.ts), so a removed member loses access within that time.
 */
const VISIBILITY_CACHE_MS = 2000;
const SUMMARY_CACHE_MAX = 2000;
const summaries = new Map<string, string>();
const visibility = new Map<string, number>();

/** The located events of a succeeded run, in time order. */
export async function runEvents(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<RunEvents> {
  const run = await succeededRunFor(sequelize, user, missionId, runId, ['events']);
  return { runId, events: run.events ?? [] };
}

const littleEndian = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

/** The stored rows as numbers: a view on the fetched bytes when they are aligned (no copy), else a copy. */
function rowsOf(data: Buffer): Float64Array {
  return littleEndian && data.byteOffset % 8 === 0 ? new Float64Array(data.buffer, data.byteOffset, data.length / 8) : unpackRows(data);
}

/** Chunks fetched per query by the streaming reader. */
const CHUNKS_PER_QUERY = 8;

/**
 * Streams a run's stored chunks in time order, optionally only those overlapping [fromT, toT]
 * (s from the epoch), several per query, asking for the next batch before handing out the
 * current one so that the database works while the caller computes. Memory: two batches
 * (16 chunks of 1024 rows), whatever the run's size.
 */
export async function* prefetchedChunks(
  sequelize: Sequelize,
  runId: string,
  range: { fromT?: number; toT?: number } = {},
): AsyncGenerator<SampleChunk, void, undefined> {
  const fromT = range.fromT ?? null;
  const toT = range.toT ?? null;
  const fetchAfter = (chunkIndex: number) =>
    sequelize.query<{ chunk_index: number; row_count: number; data: Buffer }>(
      `SELECT chunk_index, row_count, data FROM run_sample_chunks
        WHERE run_id = :runId AND chunk_index > :chunkIndex
          AND (CAST(:fromT AS double precision) IS NULL OR t_end >= :fromT)
          AND (CAST(:toT AS double precision) IS NULL OR t_start <= :toT)
        ORDER BY chunk_index LIMIT ${CHUNKS_PER_QUERY}`,
      { replacements: { runId, chunkIndex, fromT, toT }, type: QueryTypes.SELECT },
    );
  let pending = fetchAfter(-1);
  try {
    for (;;) {
      const batch = await pending;
      const last = batch.at(-1);
      if (!last) return;
      pending = batch.length === CHUNKS_PER_QUERY ? fetchAfter(last.chunk_index) : Promise.resolve([]);
      for (const row of batch) yield { chunkIndex: row.chunk_index, rowCount: row.row_count, rows: rowsOf(row.data) };
    }
  } finally {
    // A reader stopped early (client gone) leaves one batch in flight: let it settle quietly.
    pending.catch(() => undefined);
  }
}

interface PageChunkRow {
  chunk_index: number;
  first_row: number;
  row_count: number;
  data: Buffer;
}

/** Chunks fetched per query while filling a page (a page of 5000 rows spans at most 6 chunks of 1024). */
const PAGE_CHUNKS_PER_QUERY = 4;

/**
 * A page of samples by keyset on the row index: rows with index > `after`, fromT ≤ t ≤ toT, at most
 * `limit`. Only the chunks that hold the page are read (their first row indexes come from a
 * running sum over the chunk headers, which never touches the sample data).
 */
export async function samplePage(sequelize: Sequelize, user: User, missionId: string, runId: string, query: SamplePageQuery): Promise<SamplePage> {
  const run = await succeededRunFor(sequelize, user, missionId, runId);
  const { stride } = run.layout;
  const columns = sampleColumns(run.layout.forceNames);
  const minRow = (query.after ?? -1) + 1;
  const fromT = query.fromT ?? null;
  const toT = query.toT ?? null;
  const rows: number[][] = [];
  let firstIndex: number | null = null;
  let nextAfter: number | null = null;
  let lastChunk = -1;
  // One row more than the page tells whether another page follows.
  pages: for (;;) {
    const chunks = await sequelize.query<PageChunkRow>(
      `WITH c AS (
         SELECT chunk_index, row_count, t_start, t_end,
                (sum(row_count) OVER (ORDER BY chunk_index) - row_count)::int AS first_row
           FROM run_sample_chunks WHERE run_id = :runId)
       SELECT c.chunk_index, c.first_row, c.row_count, d.data
         FROM c JOIN run_sample_chunks d ON d.run_id = :runId AND d.chunk_index = c.chunk_index
        WHERE c.chunk_index > :lastChunk AND c.first_row + c.row_count > :minRow
          AND (CAST(:fromT AS double precision) IS NULL OR c.t_end >= :fromT)
          AND (CAST(:toT AS double precision) IS NULL OR c.t_start <= :toT)
        ORDER BY c.chunk_index LIMIT ${PAGE_CHUNKS_PER_QUERY}`,
      { replacements: { runId, lastChunk, minRow, fromT, toT }, type: QueryTypes.SELECT },
    );
    for (const chunk of chunks) {
      const values = rowsOf(chunk.data);
      for (let k = 0; k < chunk.row_count; k += 1) {
        const index = chunk.first_row + k;
        const t = values[k * stride]!;
        if (index < minRow || (fromT !== null && t < fromT)) continue;
        if (toT !== null && t > toT) break pages;
        if (rows.length === query.limit) {
          nextAfter = firstIndex! + rows.length - 1;
          break pages;
        }
        firstIndex ??= index;
        rows.push(Array.from(values.subarray(k * stride, (k + 1) * stride)));
      }
      lastChunk = chunk.chunk_index;
    }
    if (chunks.length < PAGE_CHUNKS_PER_QUERY) break;
  }
  return { runId, columns, rows, firstIndex, nextAfter, sampleCount: run.sampleCount };
}

/** Why a line a requirement names is absent from the stored budget. */
function missingLineNote(key: string): string {
  if (key.startsWith('momentum.')) return 'not computed: the scenario gave no wheel capacity and dump threshold';
  if (key.startsWith('sail.')) return 'not computed: the vehicle is not a sail, or the scenario gave no sail area or target radius';
  return 'not computed for this run';
}

/**
 * The stored budget lines held against `requirements`, as srp-core's computeBudget would have
 * held them: a requirement on a line the run did not compute adds that line with no value
 * (status 'no-value').
 */
export function applyMissionRequirements(stored: readonly BudgetLine[], requirements: readonly BudgetRequirement[]): BudgetLine[] {
  const lines = stored.map((l) => ({ ...l }));
  const present = new Set(lines.map((l) => l.key));
  for (const r of requirements) {
    if (!present.has(r.line)) {
      lines.push(budgetLine(r.line, null, missingLineNote(r.line)));
      present.add(r.line);
    }
  }
  lines.sort((x, y) => budgetLineKeys.indexOf(x.key) - budgetLineKeys.indexOf(y.key));
  return applyRequirements(lines, requirements);
}

/** The run's budget with the mission's requirements as they are now. */
export async function budgetReport(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<RunBudgetReport> {
  return budgetReportOf(await succeededRunFor(sequelize, user, missionId, runId, ['budget', 'summary']));
}

/** The budget report of a run loaded with its budget and summary (access already checked). */
export async function budgetReportOf(run: SucceededRun): Promise<RunBudgetReport> {
  if (!run.budget || !run.summary) throw new Error('budgetReportOf needs the run loaded with its budget and summary');
  const { runId, budget } = run;
  const requirementsAsOf = new Date().toISOString();
  const requirements = await currentRequirements(run.mission.id);
  const lines = applyMissionRequirements(budget.lines, requirements);
  const count = (status: BudgetLine['status']) => lines.filter((l) => l.status === status).length;
  const momentum = budget.momentum;
  return {
    runId,
    caution: run.summary.caution,
    epochUtc: budget.epochUtc,
    spanSeconds: budget.spanSeconds,
    sampleCount: budget.sampleCount,
    requirementsAsOf,
    lines,
    counts: { pass: count('pass'), fail: count('fail'), noRequirement: count('no-requirement'), noValue: count('no-value') },
    srpAcceleration: budget.srpAcceleration,
    perturbations: budget.perturbations,
    deltaV: budget.deltaV,
    drift: budget.drift,
    torque: budget.torque,
    momentum: momentum
      ? {
          dumpCriterion: momentum.dumpCriterion,
          dumpLevelNms: momentum.dumpLevelNms,
          dumpCount: momentum.dumpTimesSeconds.length,
          dumpsPerDay: momentum.dumpsPerDay,
          meanTimeBetweenDumpsSeconds: momentum.meanTimeBetweenDumpsSeconds,
          peakMomentumNms: momentum.peakMomentumNms,
          peakAxisMomentumNms: momentum.peakAxisMomentumNms,
          finalMomentumBody: momentum.finalMomentumBody,
        }
      : null,
    sail: budget.sail,
  };
}
