import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import {
  EPHEMERIS_CSV_COLUMNS,
  EXPORT_CAUTION,
  OEM_MANDATORY_HEADER_KEYWORDS,
  OEM_MANDATORY_METADATA_KEYWORDS,
  createSampleLayout,
  ephemerisCsv,
  oemText,
  parseEphemerisCsv,
  parseOem,
  parseUtcEpoch,
  type SampleHistory,
} from '@photon-ledger/srp-core';
import { apiErrorSchema, budgetCsvColumns, missionListSchema } from '@photon-ledger/shared';
import { RequirementModel } from '../models';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { storeRun, type StoredRun } from '../../test/stored-run';
import { SAMPLE_CHUNK_ROWS } from '../services/sample-store';

/** A supertest parser that keeps the body as text whatever the content type (the response is a Node stream). */
function asText(res: unknown, done: (err: Error | null, body: string) => void): void {
  const stream = res as NodeJS.ReadableStream;
  let text = '';
  stream.setEncoding('utf8');
  stream.on('data', (piece: string) => {
    text += piece;
  });
  stream.on('end', () => done(null, text));
}

/** Half a unit in the last printed place of each CSV column (the writer's precision). */
function printedTolerance(column: string, value: number): number {
  if (column === 't_s') return 0.5e-6;
  if (/^[xyz]_m$/.test(column)) return 0.5e-3 + 1e-8; // plus the rounding of x·1000 at GEO radii
  if (/^v[xyz]_m_s$/.test(column)) return 0.5e-6 + 1e-12;
  if (column === 'illuminated_fraction') return 0.5e-6;
  if (column === 'sun_distance_m') return 0.05 + 1e-4;
  return 0.5e-9 * Math.abs(value) + 1e-300; // 10 significant digits
}

describe('streamed exports: CSV ephemeris, CCSDS OEM, budget CSV', () => {
  let api: ApiHarness;
  let ids: Record<string, string>;
  let run: StoredRun;
  let history: SampleHistory;
  let queued: StoredRun;
  const path = (file: string, runId = run.runId) => `/api/missions/${ids['corvina-2']}/runs/${runId}/export/${file}`;
  const filePrefix = () => `corvina-2-corvina-2-export-test-${run.runId.slice(0, 8)}`;

  beforeAll(async () => {
    api = await startApi();
    const admin = await api.signedIn('admin');
    ids = Object.fromEntries(missionListSchema.parse((await admin.get('/api/missions')).body).missions.map((m) => [m.slug, m.id]));
    await RequirementModel.destroy({ where: { missionId: ids['corvina-2']! } });
    // Half a day at 20 s: 2161 samples, three stored chunks, so the stream crosses chunk boundaries.
    run = await storeRun(api.sequelize, { missionId: ids['corvina-2']!, spanDays: 0.5, outputStepS: 20, scenarioName: 'Corvina-2 — export test' });
    const o = run.outcome!;
    history = { layout: createSampleLayout(o.layout.forceNames), samples: o.samples, sampleCount: o.sampleCount };
    queued = await storeRun(api.sequelize, { missionId: ids['corvina-2']!, status: 'running' });
  });
  afterAll(() => api.close());

  it('the CSV download is srp-core’s ephemerisCsv of the stored history, byte for byte, with the caution, frame, time scale, units and epoch', async () => {
    expect(history.sampleCount).toBeGreaterThan(2 * SAMPLE_CHUNK_ROWS);
    const res = await (await api.signedIn('reviewer')).get(path('ephemeris.csv')).buffer(true).parse(asText);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${filePrefix()}-ephemeris.csv"`);
    const text = res.body as string;
    const epoch = parseUtcEpoch(run.scenario.orbit.epochUtc);
    expect(text === ephemerisCsv(history, { epoch, centralBody: 'earth' })).toBe(true);

    const parsed = parseEphemerisCsv(text);
    expect(parsed.meta.caution).toBe(EXPORT_CAUTION);
    expect(parsed.meta.frame).toMatch(/^EQJ/);
    expect(parsed.meta.time_scale).toMatch(/^UTC/);
    expect(parsed.meta.epoch).toBe('2026-09-08T00:00:00.000Z');
    expect(parsed.meta.central_body).toBe('earth');
    for (const c of EPHEMERIS_CSV_COLUMNS) expect(parsed.meta.units).toContain(c);
    expect(parsed.columns).toEqual([...EPHEMERIS_CSV_COLUMNS]);
    expect(parsed.timeUtc).toHaveLength(history.sampleCount);
    // Every numeric column is the stored column of the same name (they share the layout order).
    const stride = history.layout.stride;
    EPHEMERIS_CSV_COLUMNS.slice(1).forEach((column, offset) => {
      const got = parsed.data[column]!;
      for (let k = 0; k < history.sampleCount; k += 1) {
        const want = history.samples[k * stride + offset]!;
        expect(Math.abs(got[k]! - want), `${column} row ${k}`).toBeLessThanOrEqual(printedTolerance(column, want));
      }
    });
  });

  it('the OEM download parses, carries every obligatory keyword and the caution, and equals oemText but for CREATION_DATE', async () => {
    const res = await (await api.signedIn('engineer')).get(path('ephemeris.oem')).buffer(true).parse(asText);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/plain; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${filePrefix()}-ephemeris.oem"`);
    const text = res.body as string;
    const oem = parseOem(text);
    for (const key of OEM_MANDATORY_HEADER_KEYWORDS) expect(oem.header[key], key).toBeTruthy();
    const segment = oem.segments[0]!;
    for (const key of OEM_MANDATORY_METADATA_KEYWORDS) expect(segment.metadata[key], key).toBeTruthy();
    expect(oem.header).toMatchObject({ CCSDS_OEM_VERS: '3.0', ORIGINATOR: 'PHOTON LEDGER', MESSAGE_ID: run.runId });
    expect(segment.metadata).toMatchObject({ OBJECT_NAME: 'Corvina-2', OBJECT_ID: run.vehicleRevisionId, CENTER_NAME: 'EARTH', REF_FRAME: 'EME2000' });
    expect(oem.comments).toContain(EXPORT_CAUTION);

    const expected = oemText(history, {
      epoch: parseUtcEpoch(run.scenario.orbit.epochUtc),
      centralBody: 'earth',
      objectName: 'Corvina-2',
      objectId: run.vehicleRevisionId,
      originator: 'PHOTON LEDGER',
      messageId: run.runId,
      creationDateUtc: `${oem.header.CREATION_DATE}Z`,
    });
    expect(text === expected).toBe(true);
    expect(segment.epochs).toHaveLength(history.sampleCount);
    const stride = history.layout.stride;
    for (let k = 0; k < history.sampleCount; k += 1) {
      for (let j = 0; j < 6; j += 1) {
        const want = history.samples[k * stride + 1 + j]! / 1000;
        // Half a unit in the last place: 1e-6 km positions, 1e-9 km/s velocities.
        expect(Math.abs(segment.statesKm[k * 6 + j]! - want)).toBeLessThanOrEqual(j < 3 ? 0.5e-6 + 1e-9 : 0.5e-9 + 1e-15);
      }
    }
  });

  it('the budget CSV parses with csv-parse: comment lines, then one row per line with requirement, margin and status', async () => {
    const lead = await api.signedIn('lead');
    const maxAccel = run.outcome!.budget.srpAcceleration.max;
    expect((await lead.put(`/api/missions/${ids['corvina-2']}/requirements/srp.accel.max`).send({ comparator: '<=', value: 2 * maxAccel, minMarginPercent: 10 })).status).toBe(201);
    try {
      const res = await (await api.signedIn('reviewer')).get(path('budget.csv')).buffer(true).parse(asText);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(res.headers['content-disposition']).toBe(`attachment; filename="${filePrefix()}-budget.csv"`);
      const text = res.body as string;
      const comments = text.split('\n').filter((l) => l.startsWith('#'));
      expect(comments[0]).toBe(`# caution: ${EXPORT_CAUTION}`);
      expect(comments.join('\n')).toContain('# mission: Corvina-2 (corvina-2)');
      expect(comments.join('\n')).toContain(`# run: ${run.runId}`);
      expect(comments.join('\n')).toMatch(/# requirements_as_of: \d{4}-\d\d-\d\dT/);
      const records = parse(text, { comment: '#', columns: true }) as Record<string, string>[];
      expect(Object.keys(records[0]!)).toEqual([...budgetCsvColumns]);
      expect(records.map((r) => r.key)).toEqual(run.outcome!.budget.lines.map((l) => l.key));
      const accel = records.find((r) => r.key === 'srp.accel.max')!;
      expect(Number(accel.value)).toBe(maxAccel);
      expect(accel).toMatchObject({ comparator: '<=', min_margin_percent: '10', status: 'pass', unit: 'm/s^2' });
      expect(Number(accel.margin_percent)).toBeCloseTo(50, 9);
      expect(records.find((r) => r.key === 'srp.deltaV.total')).toMatchObject({ comparator: '', requirement: '', status: 'no-requirement' });
    } finally {
      await RequirementModel.destroy({ where: { missionId: ids['corvina-2']! } });
    }
  });

  it.each(['ephemeris.csv', 'ephemeris.oem', 'budget.csv'])('%s of a run still running answers 409 naming its status', async (file) => {
    const res = await (await api.signedIn('engineer')).get(path(file, queued.runId));
    expect(res.status).toBe(409);
    expect(res.headers['content-disposition']).toBeUndefined();
    expect(apiErrorSchema.parse(res.body).error.message).toMatch(/running/);
  });

  it('a run of another mission answers 404', async () => {
    const foreign = await storeRun(api.sequelize, { missionId: ids['halyard-1']!, status: 'failed' });
    const res = await (await api.signedIn('engineer')).get(path('ephemeris.csv', foreign.runId));
    expect(res.status).toBe(404);
  });
});
