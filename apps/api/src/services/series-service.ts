/**
 * Decimated series for charts: the run's time range cut into equal buckets, and in each bucket
 * the minimum and the maximum of every requested column kept, in time order, so that peaks (the
 * largest SRP acceleration, a momentum dump) survive any zoom level. Stored columns are read from
 * the samples; derived ones (magnitudes, osculating elements, wheel momentum) are computed per
 * sample as the chunks stream by, so memory depends on the bucket count, never on the run.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import {
  cartesianToKeplerian,
  createKeplerianElements,
  EARTH_GM,
  SUN_GM,
  SAMPLE_R,
  SAMPLE_SRP_ACCEL_INERTIAL,
  SAMPLE_SRP_TORQUE_BODY,
  SAMPLE_T,
  SAMPLE_V,
  momentumTimeToLevel,
  type DumpCriterion,
} from '@photon-ledger/srp-core';
import { derivedSeriesColumns, type DerivedSeriesColumn, type Series, type SeriesColumn, type SeriesQuery, type User } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import { sampleColumns } from './run-outcome';
import { prefetchedChunks, succeededRunFor } from './result-service';

const DEG = 180 / Math.PI;
const MOMENTUM_COLUMNS: readonly DerivedSeriesColumn[] = ['h_x_body_n_m_s', 'h_y_body_n_m_s', 'h_z_body_n_m_s', 'h_mag_n_m_s'];
const ELEMENT_COLUMNS: readonly DerivedSeriesColumn[] = ['a_m', 'e', 'i_deg', 'raan_deg'];

/** Unit of a column from its name's suffix (the naming rule of the stored and derived columns). */
export function columnUnit(column: string): string {
  if (column === 't_s') return 's';
  const suffixes: [string, string][] = [
    ['_n_m_s', 'N*m*s'],
    ['_m_s2', 'm/s^2'],
    ['_m_s', 'm/s'],
    ['_n_m', 'N*m'],
    ['_deg', 'deg'],
    ['_m', 'm'],
  ];
  return suffixes.find(([suffix]) => column.endsWith(suffix))?.[1] ?? '-';
}

/** Per column, per bucket: the smallest and the largest point seen, with the order in which they came. */
class Buckets {
  readonly minValue: Float64Array;
  readonly minT: Float64Array;
  readonly minSeq: Float64Array;
  readonly maxValue: Float64Array;
  readonly maxT: Float64Array;
  readonly maxSeq: Float64Array;
  readonly filled: Uint8Array;

  constructor(readonly count: number) {
    this.minValue = new Float64Array(count);
    this.minT = new Float64Array(count);
    this.minSeq = new Float64Array(count);
    this.maxValue = new Float64Array(count);
    this.maxT = new Float64Array(count);
    this.maxSeq = new Float64Array(count);
    this.filled = new Uint8Array(count);
  }

  add(bucket: number, t: number, value: number, seq: number): void {
    if (this.filled[bucket] === 0) {
      this.filled[bucket] = 1;
      this.minValue[bucket] = value;
      this.maxValue[bucket] = value;
      this.minT[bucket] = t;
      this.maxT[bucket] = t;
      this.minSeq[bucket] = seq;
      this.maxSeq[bucket] = seq;
      return;
    }
    if (value < this.minValue[bucket]!) {
      this.minValue[bucket] = value;
      this.minT[bucket] = t;
      this.minSeq[bucket] = seq;
    }
    if (value > this.maxValue[bucket]!) {
      this.maxValue[bucket] = value;
      this.maxT[bucket] = t;
      this.maxSeq[bucket] = seq;
    }
  }

  /** At most two points per bucket, in the order they arrived (time order). */
  points(): { t: number[]; values: number[] } {
    const t: number[] = [];
    const values: number[] = [];
    for (let b = 0; b < this.count; b += 1) {
      if (this.filled[b] === 0) continue;
      const minFirst = this.minSeq[b]! <= this.maxSeq[b]!;
      t.push(minFirst ? this.minT[b]! : this.maxT[b]!);
      values.push(minFirst ? this.minValue[b]! : this.maxValue[b]!);
      if (this.minSeq[b] !== this.maxSeq[b]) {
        t.push(minFirst ? this.maxT[b]! : this.minT[b]!);
        values.push(minFirst ? this.maxValue[b]! : this.minValue[b]!);
      }
    }
    return { t, values };
  }
}

/** Wheel momentum settings as srp-core's momentumBudget takes them. */
interface MomentumSettings {
  level: number;
  criterion: DumpCriterion;
}


/** Most dumps followed before the torque is judged too strong for the capacity (as momentumBudget). */
const MAX_DUMPS = 1e7;

/**
 * The decimated series of a succeeded run.
 * @throws AppError 400 naming `columns` for a column the run does not have
 */
export async function runSeries(sequelize: Sequelize, user: User, missionId: string, runId: string, query: SeriesQuery): Promise<Series> {
  const run = await succeededRunFor(sequelize, user, missionId, runId);
  const stored = sampleColumns(run.layout.forceNames);
  const derived = new Set<string>(derivedSeriesColumns);
  const unknown = query.columns.filter((c) => !stored.includes(c) && !derived.has(c));
  if (unknown.length > 0) {
    const message = `columns: ${unknown.join(', ')} ${unknown.length === 1 ? 'is' : 'are'} not a column of this run; choose from ${[...stored, ...derivedSeriesColumns].join(', ')}`;
    throw new AppError('validation_failed', message, { fields: { columns: message } });
  }

  const [span] = await sequelize.query<{ first: number | null; last: number | null }>(
    'SELECT min(t_start) AS first, max(t_end) AS last FROM run_sample_chunks WHERE run_id = :runId',
    { replacements: { runId }, type: QueryTypes.SELECT },
  );
  const runFirst = span?.first ?? 0;
  const runLast = span?.last ?? 0;
  const t0 = Math.max(query.fromT ?? runFirst, runFirst);
  const t1 = Math.min(query.toT ?? runLast, runLast);
  const bucketCount = Math.max(1, Math.floor(query.maxPoints / 2));
  const width = (t1 - t0) / bucketCount;
  const bucketOf = (t: number): number => (width > 0 ? Math.min(bucketCount - 1, Math.floor((t - t0) / width)) : 0);

  const wantMomentum = query.columns.some((c) => MOMENTUM_COLUMNS.includes(c as DerivedSeriesColumn));
  const wantElements = query.columns.some((c) => ELEMENT_COLUMNS.includes(c as DerivedSeriesColumn));
  const scenarioMomentum = run.scenario.momentum;
  const momentum: MomentumSettings | null = scenarioMomentum
    ? { level: scenarioMomentum.wheelCapacityNms * scenarioMomentum.dumpThresholdFraction, criterion: 'norm' }
    : null;
  const mu = run.scenario.orbit.centralBody === 'sun' ? SUN_GM : EARTH_GM;

  const { stride } = run.layout;
  const requested = query.columns.map((column) => ({ column, offset: stored.indexOf(column), buckets: new Buckets(bucketCount) }));
  const byName = new Map(requested.map((r) => [r.column, r]));
  const hColumns = MOMENTUM_COLUMNS.map((c) => byName.get(c));
  let seq = 0;
  let rowsInRange = 0;
  let dumpsInRange = 0;

  const elements = createKeplerianElements();
  const state = new Float64Array(6);
  const h = new Float64Array(3);
  const tau = new Float64Array(3);
  const previousTorque = new Float64Array(3);
  let previousT = Number.NaN;
  let dumps = 0;

  /** Adds the momentum point H at time t to the momentum columns asked for. */
  const addMomentum = (t: number): void => {
    if (t < t0 || t > t1) return;
    const b = bucketOf(t);
    const values = [h[0]!, h[1]!, h[2]!, Math.hypot(h[0]!, h[1]!, h[2]!)];
    hColumns.forEach((r, j) => r?.buckets.add(b, t, values[j]!, seq));
    seq += 1;
  };

  /**
   * Integrates the torque from the previous sample to this one (trapezoid mean over the step,
   * dumps located on the line as momentumBudget does) and adds the dump points inside the range.
   */
  const stepMomentum = (rows: Float64Array, o: number): void => {
    const tEnd = rows[o + SAMPLE_T]!;
    if (Number.isNaN(previousT)) {
      for (let j = 0; j < 3; j += 1) previousTorque[j] = rows[o + SAMPLE_SRP_TORQUE_BODY + j]!;
      previousT = tEnd;
      return;
    }
    let t = previousT;
    for (let j = 0; j < 3; j += 1) tau[j] = 0.5 * (previousTorque[j]! + rows[o + SAMPLE_SRP_TORQUE_BODY + j]!);
    if (momentum) {
      for (;;) {
        // The same dump instants as srp-core's momentumBudget: its own step-crossing function.
        const s = momentumTimeToLevel(h, tau, momentum.level, momentum.criterion);
        if (!(t + s <= tEnd)) break;
        for (let j = 0; j < 3; j += 1) h[j] = h[j]! + tau[j]! * s;
        t += s;
        addMomentum(t);
        h.fill(0);
        addMomentum(t);
        dumps += 1;
        if (t >= t0 && t <= t1) dumpsInRange += 1;
        if (dumps > MAX_DUMPS) {
          throw new AppError('conflict', 'the wheel capacity is too small for this torque: more than 1e7 dumps; lower the torque or raise the capacity');
        }
      }
    }
    for (let j = 0; j < 3; j += 1) {
      h[j] = h[j]! + tau[j]! * (tEnd - t);
      previousTorque[j] = rows[o + SAMPLE_SRP_TORQUE_BODY + j]!;
    }
    previousT = tEnd;
  };

  const norm = (rows: Float64Array, at: number): number => Math.hypot(rows[at]!, rows[at + 1]!, rows[at + 2]!);
  const valueOf = (column: string, rows: Float64Array, o: number, elementsOk: boolean): number | null => {
    switch (column) {
      case 'r_m':
        return norm(rows, o + SAMPLE_R);
      case 'v_m_s':
        return norm(rows, o + SAMPLE_V);
      case 'srp_a_mag_m_s2':
        return norm(rows, o + SAMPLE_SRP_ACCEL_INERTIAL);
      case 'srp_t_mag_n_m':
        return norm(rows, o + SAMPLE_SRP_TORQUE_BODY);
      case 'a_m':
        return elementsOk ? elements.semiMajorAxisM : null;
      case 'e':
        return elementsOk ? elements.eccentricity : null;
      case 'i_deg':
        return elementsOk ? elements.inclinationRad * DEG : null;
      case 'raan_deg':
        return elementsOk ? elements.raanRad * DEG : null;
      default:
        return null;
    }
  };

  // Momentum depends on the whole history: read from the start; otherwise only the range.
  const range = wantMomentum ? { toT: t1 } : { fromT: t0, toT: t1 };
  if (t0 <= t1) {
    for await (const chunk of prefetchedChunks(sequelize, runId, range)) {
      const rows = chunk.rows;
      for (let k = 0; k < chunk.rowCount; k += 1) {
        const o = k * stride;
        const t = rows[o + SAMPLE_T]!;
        if (t > t1) break;
        if (wantMomentum) stepMomentum(rows, o);
        if (t < t0) continue;
        rowsInRange += 1;
        let elementsOk = false;
        if (wantElements) {
          for (let j = 0; j < 3; j += 1) {
            state[j] = rows[o + SAMPLE_R + j]!;
            state[j + 3] = rows[o + SAMPLE_V + j]!;
          }
          try {
            cartesianToKeplerian(elements, state, mu);
            elementsOk = true;
          } catch {
            // A rectilinear or parabolic state has no such elements: the sample is left out of those columns.
          }
        }
        const b = bucketOf(t);
        for (const r of requested) {
          if (MOMENTUM_COLUMNS.includes(r.column as DerivedSeriesColumn)) continue;
          const value = r.offset >= 0 ? rows[o + r.offset]! : valueOf(r.column, rows, o, elementsOk);
          if (value !== null) r.buckets.add(b, t, value, seq);
        }
        if (wantMomentum) addMomentum(t);
        seq += 1;
      }
    }
  }

  const series: SeriesColumn[] = requested.map((r) => ({
    column: r.column,
    unit: columnUnit(r.column),
    derived: r.offset < 0,
    ...r.buckets.points(),
  }));
  return {
    runId,
    fromT: t0,
    toT: t1,
    maxPoints: query.maxPoints,
    bucketCount,
    rowsInRange,
    series,
    momentum: wantMomentum ? { dumpLevelNms: momentum ? momentum.level : null, dumpCriterion: momentum?.criterion ?? 'norm', dumpsInRange } : null,
  };
}
