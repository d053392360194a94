/**
 * Trade studies through the API with one in-process worker, against the real PostgreSQL: the
 * physics of a swept ideal sail, Monte Carlo statistics of a linear metric, seeded
 * reproducibility, the result routes, cancel, and refusals at definition time.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SOLAR_CONSTANT, SPEED_OF_LIGHT } from '@photon-ledger/srp-core';
import halyardScenario from '@photon-ledger/fixtures/scenarios/halyard-1-spiral.scenario.json' with { type: 'json' };
import { auditPageSchema, studySchema, studyCasePageSchema, studyStatisticsSchema, type Study, type VehicleSpec } from '@photon-ledger/shared';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { createScenarioRows, missionIdBySlug } from '../jobs/run-test-support';

let api: ApiHarness;
let engineer: Awaited<ReturnType<ApiHarness['signedIn']>>;
let reviewer: Awaited<ReturnType<ApiHarness['signedIn']>>;
let missionId = '';
let scenarioId = '';

/** An ideal (perfectly reflecting) flat sail, 100 m², 10 kg. */
const idealSail: VehicleSpec = {
  kind: 'sail',
  name: 'Ideal test sail',
  massKg: 10,
  centreOfMassM: [0, 0, 0],
  areaM2: 100,
  normal: [0, 0, 1],
  centroidM: [0, 0, 0],
  optics: 'ideal',
} as VehicleSpec;

beforeAll(async () => {
  api = await startApi({ PL_WORKERS_IN_PROCESS: '1' });
  engineer = await api.signedIn('engineer');
  reviewer = await api.signedIn('reviewer');
  missionId = await missionIdBySlug('corvina-2');
  // A heliocentric day of the demo sail scenario, coarse output: cheap cases.
  const { requirements: _r, vehicle: _v, ...spiral } = structuredClone(halyardScenario) as Record<string, unknown>;
  const rows = await createScenarioRows(api.sequelize, missionId, { ...spiral, spanDays: 1, outputStepS: 21_600, forces: { planets: [], srp: true }, tolerances: { relTol: 1e-8, absTol: 1e-6 } }, idealSail);
  scenarioId = rows.scenarioId;
}, 120_000);

afterAll(async () => {
  await api?.close();
});

const url = (path = '') => `/api/missions/${missionId}/studies${path}`;

async function create(body: object): Promise<Study> {
  const res = await engineer.post(url()).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return studySchema.parse(res.body);
}

/** Polls until every case has finished (a hang guard, not a speed check). */
async function finished(studyId: string, timeoutMs = 240_000): Promise<Study> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const study = studySchema.parse((await engineer.get(url(`/${studyId}`))).body);
    if (study.status === 'finished' || study.status === 'cancelled') return study;
    if (Date.now() > deadline) throw new Error(`study ${studyId} did not finish: ${JSON.stringify(study.progress)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function allCases(studyId: string, query = '') {
  const res = await engineer.get(url(`/${studyId}/cases?limit=5000${query}`));
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  const page = studyCasePageSchema.parse(res.body);
  // Case ids differ between studies; reproducibility compares everything else.
  return { ...page, cases: page.cases.map(({ id: _id, ...c }) => c) };
}

const monteCarlo = (seed: string, samples: number) => ({
  name: `Sail loading dispersion ${seed}`,
  scenarioId,
  design: { kind: 'monte-carlo', samples, seed, parameters: [{ path: 'vehicle.massKg', distribution: { kind: 'normal', mean: 10, sd: 0.5 } }] },
  lines: ['sail.loading', 'sail.characteristicAccel'],
});

describe('trade studies', () => {
  let gridId = '';

  it('sweeps an ideal sail: every case has a_c = 2 P A / m with P = S0 / c (McInnes, Solar Sailing, 1999, eq. 2.27 ff.)', async () => {
    const study = await create({
      name: 'Ideal sail grid',
      scenarioId,
      design: { kind: 'grid', parameters: [{ path: 'vehicle.areaM2', from: 50, to: 200, steps: 3 }, { path: 'vehicle.massKg', values: [5, 10] }] },
      lines: ['sail.characteristicAccel', 'sail.loading'],
    });
    gridId = study.id;
    expect(study.progress.total).toBe(6);
    expect(study.parameterPaths).toEqual(['vehicle.areaM2', 'vehicle.massKg']);
    const done = await finished(study.id);
    expect(done.progress).toMatchObject({ succeeded: 6, failed: 0, fractionDone: 1 });
    const { cases } = await allCases(study.id);
    const pressure = SOLAR_CONSTANT / SPEED_OF_LIGHT; // N/m² at 1 au
    for (const c of cases) {
      const a = c.parameters['vehicle.areaM2']!;
      const m = c.parameters['vehicle.massKg']!;
      expect(c.lines!['sail.characteristicAccel']! / ((2 * pressure * a) / m)).toBeCloseTo(1, 9);
      expect(c.lines!['sail.loading']).toBeCloseTo(m / a, 12);
    }
    expect(new Set(cases.map((c) => `${c.parameters['vehicle.areaM2']}/${c.parameters['vehicle.massKg']}`)).size).toBe(6);
    // The worker that ended the last case records the study's end once (the creator's mail hangs on it).
    const audit = auditPageSchema.parse((await engineer.get(`/api/missions/${missionId}/audit?limit=200`)).body);
    expect(audit.entries.filter((e) => e.entityId === study.id && e.action === 'study-finished')).toHaveLength(1);
  }, 300_000);

  it('sorts, filters, finds the best and the Pareto cases, and exports the table as CSV', async () => {
    const desc = await allCases(gridId, '&sort=line:sail.characteristicAccel&dir=desc');
    const values = desc.cases.map((c) => c.lines!['sail.characteristicAccel']!);
    expect(values).toEqual([...values].sort((a, b) => b - a));
    // Largest a_c: the largest area on the smallest mass.
    expect(desc.cases[0]!.parameters).toEqual({ 'vehicle.areaM2': 200, 'vehicle.massKg': 5 });
    const byParam = await allCases(gridId, '&sort=param:vehicle.areaM2&dir=asc');
    expect(byParam.cases.map((c) => c.parameters['vehicle.areaM2'])).toEqual([50, 50, 125, 125, 200, 200]);
    const loading = await allCases(gridId, '&line=sail.loading&min=0.05&max=0.1');
    expect(loading.cases.map((c) => c.lines!['sail.loading']!).every((v) => v >= 0.05 && v <= 0.1)).toBe(true);
    expect(loading.total).toBe(3); // 5/50 = 0.1, 10/125 = 0.08, 5/125 = 0.04 (out), 10/200 = 0.05, 5/200 = 0.025 (out), 10/50 = 0.2 (out)
    expect((await allCases(gridId, '&status=failed')).total).toBe(0);

    const best = await engineer.get(url(`/${gridId}/best?line=sail.loading&dir=min`));
    expect(best.status).toBe(200);
    expect(best.body.case.parameters).toEqual({ 'vehicle.areaM2': 200, 'vehicle.massKg': 5 });

    // More a_c with less loading is the same direction here: one case dominates.
    const pareto = await engineer.get(url(`/${gridId}/pareto?x=sail.characteristicAccel&xDir=max&y=sail.loading&yDir=min`));
    expect(pareto.status).toBe(200);
    expect(pareto.body.cases.map((c: { index: number }) => c.index)).toEqual([best.body.case.index]);
    // Wanting more loading and more a_c trades one against the other: every mass gives a front point.
    const trade = await engineer.get(url(`/${gridId}/pareto?x=sail.characteristicAccel&xDir=max&y=sail.loading&yDir=max`));
    expect(trade.body.cases.length).toBeGreaterThan(1);

    const csv = await reviewer.get(url(`/${gridId}/export/cases.csv?sort=line:sail.loading`));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const lines = csv.text.trim().split('\n');
    expect(lines[0]).toMatch(/^# caution: /);
    const header = lines.find((l) => !l.startsWith('#'))!;
    expect(header).toBe('case,status,vehicle.areaM2,vehicle.massKg,sail.characteristicAccel,sail.loading,error');
    expect(lines.filter((l) => !l.startsWith('#'))).toHaveLength(7);

    const bad = await engineer.get(url(`/${gridId}/cases?min=1`));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('line');
  });

  let statsAlpha: unknown;
  let casesAlpha: unknown;

  it('matches the analytic mean and SD of a linear metric (sail loading m/A, m normal) within sampling error', async () => {
    const samples = 60;
    const study = await create(monteCarlo('alpha', samples));
    await finished(study.id);
    const res = await engineer.get(url(`/${study.id}/statistics`));
    expect(res.status).toBe(200);
    const stats = studyStatisticsSchema.parse(res.body);
    expect(stats.caution.length).toBeGreaterThan(20);
    const loading = stats.lines.find((l) => l.line === 'sail.loading')!;
    expect(loading.count).toBe(samples);
    // σ = m/A with m ~ N(10, 0.5), A = 100 m²: mean 0.1 kg/m², SD 0.005 kg/m² (linear, so exact).
    const mean = 10 / 100;
    const sd = 0.5 / 100;
    // Tolerance: 4 standard errors, SE(mean) = σ/√n and SE(sd) ≈ σ/√(2(n − 1)) (normal samples).
    expect(Math.abs(loading.mean! - mean)).toBeLessThan((4 * sd) / Math.sqrt(samples));
    expect(Math.abs(loading.sd! - sd)).toBeLessThan((4 * sd) / Math.sqrt(2 * (samples - 1)));
    expect(loading.p95!).toBeGreaterThan(loading.mean!);
    expect(loading.p99!).toBeGreaterThanOrEqual(loading.p95!);
    statsAlpha = stats;
    casesAlpha = (await allCases(study.id)).cases;
  }, 300_000);

  it('reproduces a study from its seed: same seed, identical cases and statistics; another seed, different', async () => {
    const again = await create(monteCarlo('alpha', 60));
    await finished(again.id);
    expect((await allCases(again.id)).cases).toEqual(casesAlpha);
    expect((await engineer.get(url(`/${again.id}/statistics`))).body).toEqual(statsAlpha);

    const other = await create(monteCarlo('beta', 60));
    await finished(other.id);
    expect((await allCases(other.id)).cases).not.toEqual(casesAlpha);
    expect((await engineer.get(url(`/${other.id}/statistics`))).body).not.toEqual(statsAlpha);
  }, 300_000);

  it('cancels a study: queued cases are cancelled, the rest finish, an audit line is written', async () => {
    const study = await create({ ...monteCarlo('cancel', 200), name: 'To cancel' });
    const res = await engineer.post(url(`/${study.id}/cancel`));
    expect(res.status).toBe(200);
    expect(res.body.cancelRequested).toBe(true);
    const done = await finished(study.id);
    expect(done.status).toBe('cancelled');
    expect(done.progress.queued + done.progress.running).toBe(0);
    expect(done.progress.cancelled).toBeGreaterThan(0);
    expect((await engineer.post(url(`/${study.id}/cancel`))).status).toBe(409);
    expect((await reviewer.post(url(`/${study.id}/cancel`))).status).toBe(403);
    const audit = auditPageSchema.parse((await engineer.get(`/api/missions/${missionId}/audit`)).body);
    const mine = audit.entries.filter((e) => e.entityId === study.id).map((e) => e.action);
    expect(mine).toContain('study-created');
    expect(mine).toContain('study-cancelled');
    expect(mine).not.toContain('study-finished');
  }, 120_000);

  it('refuses bad definitions naming the parameter, the case and the field', async () => {
    const missing = await engineer.post(url()).send({ name: 'x', scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.plates.3.front.specular', values: [0.5] }] }, lines: ['sail.loading'] });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty(['design.parameters.0.path']);
    const negative = await engineer.post(url()).send({ name: 'x', scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [10, 0] }] }, lines: ['sail.loading'] });
    expect(negative.status).toBe(400);
    expect(negative.body.error.message).toMatch(/^case 1 \(vehicle\.massKg = 0\)/);
    expect(negative.body.error.fields).toHaveProperty(['vehicle.massKg']);
    const noLines = await engineer.post(url()).send({ name: 'x', scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [10] }] }, lines: [] });
    expect(noLines.status).toBe(400);
    expect(noLines.body.error.fields).toHaveProperty('lines');
    expect((await reviewer.post(url()).send(monteCarlo('r', 2))).status).toBe(403);
  });
});
