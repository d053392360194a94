import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cartesianToKeplerian, createKeplerianElements, EARTH_GM } from '@photon-ledger/srp-core';
import {
  apiErrorSchema,
  missionListSchema,
  runBudgetReportSchema,
  runEventsSchema,
  runSummarySchema,
  samplePageSchema,
  seriesSchema,
  type Series,
} from '@photon-ledger/shared';
import { RequirementModel } from '../models';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { storeRun, type StoredRun } from '../../test/stored-run';
import type { RunOutcome } from '../services/run-outcome';

describe('run results: summary, events, samples, series, budget', () => {
  let api: ApiHarness;
  let ids: Record<string, string>;
  let run: StoredRun;
  let outcome: RunOutcome;
  let queued: StoredRun;
  let foreign: StoredRun;
  const path = (what: string, runId = run.runId, missionId = ids['corvina-2']!) => `/api/missions/${missionId}/runs/${runId}/${what}`;
  /** Row k of the stored outcome. */
  const row = (k: number) => Array.from(outcome.samples.subarray(k * outcome.layout.stride, (k + 1) * outcome.layout.stride));

  beforeAll(async () => {
    api = await startApi();
    const admin = await api.signedIn('admin');
    ids = Object.fromEntries(missionListSchema.parse((await admin.get('/api/missions')).body).missions.map((m) => [m.slug, m.id]));
    await RequirementModel.destroy({ where: { missionId: ids['corvina-2']! } });
    // Half a day at 300 s: 145 samples; a 1 N·m·s wheel dumping at 80 % gives a few dumps.
    run = await storeRun(api.sequelize, {
      missionId: ids['corvina-2']!,
      spanDays: 0.5,
      outputStepS: 300,
      momentum: { wheelCapacityNms: 1, dumpThresholdFraction: 0.8 },
    });
    outcome = run.outcome!;
    queued = await storeRun(api.sequelize, { missionId: ids['corvina-2']!, status: 'queued' });
    foreign = await storeRun(api.sequelize, { missionId: ids['halyard-1']!, status: 'failed' });
  });
  afterAll(() => api.close());

  it('the summary and the events are what the run stored', async () => {
    const reviewer = await api.signedIn('reviewer');
    const summary = await reviewer.get(path('summary'));
    expect(summary.status).toBe(200);
    expect(summary.headers['content-type']).toMatch(/^application\/json/);
    expect(runSummarySchema.parse(summary.body)).toEqual(JSON.parse(JSON.stringify(outcome.summary)));
    const events = await reviewer.get(path('events'));
    expect(events.status).toBe(200);
    expect(runEventsSchema.parse(events.body)).toEqual({ runId: run.runId, events: outcome.events });
    expect(outcome.events.length).toBeGreaterThan(0);
  });

  it('paging the samples with the cursor visits every row exactly once, equal to the stored numbers', async () => {
    const agent = await api.signedIn('engineer');
    const seen: number[][] = [];
    let after: number | null = -1;
    let pages = 0;
    while (after !== null) {
      const res = await agent.get(path('samples')).query({ after, limit: 40 });
      expect(res.status).toBe(200);
      const page = samplePageSchema.parse(res.body);
      expect(page.columns).toEqual(outcome.summary.columns);
      expect(page.rows.length).toBeLessThanOrEqual(40);
      expect(page.firstIndex).toBe(seen.length);
      seen.push(...page.rows);
      after = page.nextAfter;
      pages += 1;
    }
    expect(pages).toBe(Math.ceil(outcome.sampleCount / 40));
    expect(seen).toHaveLength(outcome.sampleCount);
    seen.forEach((r, k) => expect(r, `row ${k}`).toEqual(row(k)));
  });

  it('a time window returns exactly the rows inside it, across pages', async () => {
    const agent = await api.signedIn('engineer');
    const fromT = 3000;
    const toT = 20_000;
    const want = Array.from({ length: outcome.sampleCount }, (_, k) => row(k)).filter((r) => r[0]! >= fromT && r[0]! <= toT);
    const got: number[][] = [];
    let after: number | null = null;
    do {
      const res = await agent.get(path('samples')).query({ fromT, toT, limit: 25, ...(after === null ? {} : { after }) });
      const page = samplePageSchema.parse(res.body);
      got.push(...page.rows);
      after = page.nextAfter;
    } while (after !== null);
    expect(want.length).toBeGreaterThan(25);
    expect(got).toEqual(want);
  });

  it('a page larger than 5000 rows or a window that ends before it starts answers 400 naming the field', async () => {
    const agent = await api.signedIn('engineer');
    const big = await agent.get(path('samples')).query({ limit: 5001 });
    expect(big.status).toBe(400);
    expect(apiErrorSchema.parse(big.body).error.fields).toHaveProperty('limit');
    const backwards = await agent.get(path('samples')).query({ fromT: 100, toT: 50 });
    expect(apiErrorSchema.parse(backwards.body).error.fields).toHaveProperty('toT');
  });

  const getSeries = async (query: Record<string, string | number>): Promise<Series> => {
    const res = await (await api.signedIn('engineer')).get(path('series')).query(query);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return seriesSchema.parse(res.body);
  };

  it('a decimated series keeps the global minimum and maximum of the SRP acceleration within maxPoints', async () => {
    const magnitudes = Array.from({ length: outcome.sampleCount }, (_, k) => Math.hypot(...row(k).slice(7, 10)));
    const stored = Array.from({ length: outcome.sampleCount }, (_, k) => row(k)[outcome.summary.columns.indexOf('srp_ax_eqj_m_s2')]!);
    const series = await getSeries({ columns: 'srp_a_mag_m_s2,srp_ax_eqj_m_s2', maxPoints: 20 });
    const [magnitude, x] = series.series;
    for (const [s, all] of [
      [magnitude!, magnitudes],
      [x!, stored],
    ] as const) {
      expect(s.values.length).toBeLessThanOrEqual(20);
      expect(s.values.length).toBeGreaterThan(10);
      expect(s.t).toHaveLength(s.values.length);
      expect(Math.max(...s.values)).toBe(Math.max(...all));
      expect(Math.min(...s.values)).toBe(Math.min(...all));
      s.t.slice(1).forEach((t, i) => expect(t).toBeGreaterThanOrEqual(s.t[i]!));
    }
    expect(magnitude).toMatchObject({ column: 'srp_a_mag_m_s2', unit: 'm/s^2', derived: true });
    expect(x).toMatchObject({ derived: false, unit: 'm/s^2' });
    expect(series.rowsInRange).toBe(outcome.sampleCount);
  });

  it('with room for every sample the series is the samples themselves, and a window clips it', async () => {
    const all = await getSeries({ columns: 'srp_a_mag_m_s2', maxPoints: 2 * outcome.sampleCount });
    const times = Array.from({ length: outcome.sampleCount }, (_, k) => row(k)[0]!);
    expect(all.series[0]!.t).toEqual(times);
    const window = await getSeries({ columns: 'srp_a_mag_m_s2', fromT: 6000, toT: 9000 });
    expect(window.series[0]!.t).toEqual(times.filter((t) => t >= 6000 && t <= 9000));
  });

  it('derived osculating elements equal srp-core’s conversion of the same sample', async () => {
    const series = await getSeries({ columns: 'a_m,e,i_deg,raan_deg', maxPoints: 4 * outcome.sampleCount });
    const elements = createKeplerianElements();
    const [a, e, i, raan] = series.series;
    expect(a!.values).toHaveLength(outcome.sampleCount);
    for (const k of [0, 17, 80, outcome.sampleCount - 1]) {
      cartesianToKeplerian(elements, Float64Array.from(row(k).slice(1, 7)), EARTH_GM);
      // The same function on the same numbers: equal to rounding of the degree conversion.
      expect(a!.values[k]).toBe(elements.semiMajorAxisM);
      expect(e!.values[k]).toBe(elements.eccentricity);
      expect(i!.values[k]).toBeCloseTo((elements.inclinationRad * 180) / Math.PI, 12);
      expect(raan!.values[k]).toBeCloseTo((elements.raanRad * 180) / Math.PI, 12);
    }
    // A GEO: a within 100 km of 42 164 km (source: the demo scenario's initial elements).
    expect(Math.abs(a!.values[0]! - 42_164_170)).toBeLessThan(100_000);
  });

  it('wheel momentum integrates the torque with the budget’s dumps and gives the dump level to draw', async () => {
    const momentum = outcome.budget.momentum!;
    expect(momentum.dumpTimesSeconds.length).toBeGreaterThan(1);
    const series = await getSeries({ columns: 'h_mag_n_m_s,h_x_body_n_m_s', maxPoints: 20_000 });
    expect(series.momentum).toEqual({ dumpLevelNms: 0.8, dumpCriterion: 'norm', dumpsInRange: momentum.dumpTimesSeconds.length });
    const magnitude = series.series[0]!;
    // Same arithmetic as srp-core's momentumBudget: the peak agrees to rounding.
    expect(Math.max(...magnitude.values)).toBeCloseTo(momentum.peakMomentumNms, 12);
    for (const tDump of momentum.dumpTimesSeconds) {
      const at = magnitude.t.flatMap((t, j) => (t === tDump ? [magnitude.values[j]!] : []));
      expect(at, `dump at ${tDump}`).toHaveLength(2);
      expect(at[0]).toBeCloseTo(0.8, 9);
      expect(at[1]).toBe(0);
    }
    expect(magnitude.values.at(-1)).toBeCloseTo(Math.hypot(...momentum.finalMomentumBody), 12);
    const decimated = await getSeries({ columns: 'h_mag_n_m_s', maxPoints: 10 });
    expect(decimated.series[0]!.values.length).toBeLessThanOrEqual(10);
    expect(Math.max(...decimated.series[0]!.values)).toBe(Math.max(...magnitude.values));
  });

  it('an unknown series column answers 400 naming columns', async () => {
    const res = await (await api.signedIn('engineer')).get(path('series')).query({ columns: 'r_m,warp_factor' });
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields?.columns).toMatch(/warp_factor/);
  });

  it('the budget without requirements lists every computed line as no-requirement, with the figures behind it', async () => {
    const res = await (await api.signedIn('reviewer')).get(path('budget'));
    expect(res.status).toBe(200);
    const report = runBudgetReportSchema.parse(res.body);
    expect(report.lines.map((l) => [l.key, l.value])).toEqual(outcome.budget.lines.map((l) => [l.key, l.value]));
    expect(report.counts).toEqual({ pass: 0, fail: 0, noRequirement: outcome.budget.lines.length, noValue: 0 });
    expect(report.perturbations).toEqual(outcome.budget.perturbations);
    expect(report.momentum?.dumpCount).toBe(outcome.budget.momentum!.dumpTimesSeconds.length);
    expect(report.caution).toBe(outcome.summary.caution);
  });

  it.each(['summary', 'events', 'samples', 'series?columns=r_m', 'budget'])('GET %s of a queued run answers 409 naming its status', async (what) => {
    const res = await (await api.signedIn('engineer')).get(path(what, queued.runId));
    expect(res.status).toBe(409);
    expect(apiErrorSchema.parse(res.body).error.message).toMatch(/queued/);
  });

  it('a run of another mission answers 404, and a non-member gets 404 for the mission', async () => {
    const engineer = await api.signedIn('engineer');
    for (const what of ['summary', 'samples', 'budget']) {
      const res = await engineer.get(path(what, foreign.runId));
      expect(res.status).toBe(404);
      expect(apiErrorSchema.parse(res.body).error.code).toBe('not_found');
    }
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(path('summary', foreign.runId, ids['halyard-1']!))).status).toBe(404);
  });

  it('a malformed run id answers 400 naming runId', async () => {
    const res = await (await api.signedIn('engineer')).get(path('summary', 'not-a-run'));
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('runId');
  });
});
