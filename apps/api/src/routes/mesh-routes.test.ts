import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { QueryTypes } from 'sequelize';
import {
  apiErrorSchema,
  coefficientTableDataSchema,
  coefficientTableSummarySchema,
  meshListSchema,
  meshSummarySchema,
  runSchema,
  scenarioSchema,
  vehicleDetailSchema,
  vehicleSavedSchema,
  type CoefficientTableSummary,
  type MeshSummary,
  type VehicleSpec,
} from '@photon-ledger/shared';
import { computeCoefficientTable, computeCoefficientTableRows, createMeshScene, readMesh, type MeshOpticsInput } from '@photon-ledger/srp-core';
import { startApi, type ApiHarness } from '../../test/api-harness';
import { CoefficientTableModel, MissionMemberModel, MissionModel, RunResultModel, UserModel, VehicleModel, VehicleRevisionModel } from '../models';
import { seedDemoMeshVehicle } from '../services/demo-workspace-service';
import { corvinaScenarioFile, isFinished, missionIdBySlug, pollRun } from '../jobs/run-test-support';
import { computeRunOutcome } from '../services/run-outcome';
import { readSampleChunks } from '../services/sample-store';
import { encodeFloat64, findVehicleTable } from '../services/coefficient-table-service';
import { startWorker, type Worker } from '../worker';

type Agent = ReturnType<typeof request.agent>;

const boxWingObj = readFileSync(new URL('../../../../fixtures/meshes/corvina-2-box-wing.obj', import.meta.url));

/** The demo mesh's optics: MLI bus, two-sided wings (cells in front), a painted dish. */
const boxWingOptics = {
  default: { front: 'mli-kapton' },
  groups: {
    'wing-north': { front: 'solar-cell', back: 'solar-array-back' },
    'wing-south': { front: 'solar-cell', back: 'solar-array-back' },
    dish: { front: 'white-paint', back: 'white-paint' },
  },
} as const;

/**
 * A 2000 × 1000 × 500 mm box written as quads (fanned into 12 triangles by the reader), in two
 * groups, plus one degenerate triangle (a repeated corner) the reader drops.
 */
const boxMmObj = [
  '# box in millimetres',
  'v 0 0 0',
  'v 2000 0 0',
  'v 2000 1000 0',
  'v 0 1000 0',
  'v 0 0 500',
  'v 2000 0 500',
  'v 2000 1000 500',
  'v 0 1000 500',
  'g top',
  'f 5 6 7 8',
  'f 1 1 2',
  'g sides',
  'f 1 4 3 2',
  'f 1 2 6 5',
  'f 2 3 7 6',
  'f 3 4 8 7',
  'f 4 1 5 8',
  '',
].join('\n');

/** A binary STL of a tetrahedron with corners at the origin and 1 m along each axis. */
function tetrahedronStl(): Buffer {
  const corners: [number, number, number][] = [
    [0, 0, 0],
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const faces = [
    [0, 2, 1],
    [0, 1, 3],
    [0, 3, 2],
    [1, 2, 3],
  ];
  const buffer = Buffer.alloc(84 + faces.length * 50);
  buffer.write('binary tetrahedron for the mesh tests', 0, 'ascii');
  buffer.writeUInt32LE(faces.length, 80);
  faces.forEach((face, t) => {
    let at = 84 + t * 50 + 12; // the stated normal is left zero (readers ignore it)
    for (const c of face) {
      for (const x of corners[c]!) {
        buffer.writeFloatLE(x, at);
        at += 4;
      }
    }
  });
  return buffer;
}

describe('meshes and coefficient tables', () => {
  let api: ApiHarness;
  let engineer: Agent;
  let reviewer: Agent;
  let corvina: string;
  let halyard: string;
  let boxWing: MeshSummary;
  let worker: Worker | null = null;

  const meshesPath = (missionId = corvina) => `/api/missions/${missionId}/meshes`;

  async function upload(bytes: Buffer, fileName: string, fields: Record<string, string>, agent: Agent = engineer) {
    let req = agent.post(meshesPath());
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return req.attach('file', bytes, fileName);
  }

  async function counts(): Promise<{ uploads: number; meshes: number }> {
    const [row] = await api.sequelize.query<{ uploads: number; meshes: number }>(
      `SELECT (SELECT count(*)::int FROM uploads) AS uploads, (SELECT count(*)::int FROM meshes) AS meshes`,
      { type: QueryTypes.SELECT },
    );
    return row!;
  }

  async function pollTable(tableId: string, until: (t: CoefficientTableSummary) => boolean, timeoutMs = 60_000): Promise<CoefficientTableSummary> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const res = await engineer.get(`/api/missions/${corvina}/coefficient-tables/${tableId}`);
      expect(res.status).toBe(200);
      const table = coefficientTableSummarySchema.parse(res.body);
      if (until(table)) return table;
      if (Date.now() > deadline) throw new Error(`table ${tableId} did not reach the awaited state; last: ${JSON.stringify(table)}`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }

  /** Starts one worker in this process (the harness runs none), for the parts that compute. */
  async function ensureWorker(): Promise<void> {
    worker ??= await startWorker({ databaseUrl: api.config.PL_DATABASE_URL, concurrency: 1, staleSeconds: 30, pollSeconds: 0.5, sequelize: api.sequelize });
    worker.wake();
  }

  beforeAll(async () => {
    api = await startApi();
    engineer = await api.signedIn('engineer');
    reviewer = await api.signedIn('reviewer');
    corvina = await missionIdBySlug('corvina-2');
    halyard = await missionIdBySlug('halyard-1');
    const res = await upload(boxWingObj, 'corvina-2-box-wing.obj', { units: 'm', name: `Box-wing ${randomUUID().slice(0, 8)}` });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    boxWing = meshSummarySchema.parse(res.body);
  }, 60_000);

  afterAll(async () => {
    await worker?.stop();
    await api?.close();
  });

  it('imports an OBJ in millimetres, rotated and shifted, with its groups, area, bounds and dropped triangles', async () => {
    const before = await counts();
    const res = await upload(Buffer.from(boxMmObj), 'box.obj', { units: 'mm', rotationDeg: '[0, 0, 90]', translationM: '[1, 0, 0]' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const mesh = meshSummarySchema.parse(res.body);
    expect(mesh).toMatchObject({ name: 'box.obj', format: 'obj', units: 'mm', rotationDeg: [0, 0, 90], translationM: [1, 0, 0], triangleCount: 12, droppedDegenerate: 1 });
    // 2 × (2·1 + 2·0.5 + 1·0.5) m²; tolerance: the mm → m scaling rounds in the last bits.
    expect(mesh.totalAreaM2).toBeCloseTo(7, 12);
    expect(mesh.groups.map((g) => [g.name, g.triangleCount])).toEqual([
      ['top', 2],
      ['sides', 10],
    ]);
    expect(mesh.groups[0]!.areaM2).toBeCloseTo(2, 12);
    // Rotating x → y by 90° about Z then shifting +1 m in x puts the box in [0, 1] × [0, 2] × [0, 0.5].
    const flat = [...mesh.boundsM.min, ...mesh.boundsM.max];
    [0, 0, 0, 1, 2, 0.5].forEach((expected, k) => expect(flat[k]).toBeCloseTo(expected, 12));
    expect(await counts()).toEqual({ uploads: before.uploads + 1, meshes: before.meshes + 1 });

    // The upload is kept like the others: kind mesh, size and checksum, pointing at the mesh.
    const uploads = await engineer.get(`/api/missions/${corvina}/uploads?kind=mesh`);
    expect(uploads.status).toBe(200);
    const stored = (uploads.body.uploads as { id: string; sizeBytes: number; summary: { meshId: string } }[]).find((u) => u.id === mesh.uploadId);
    expect(stored).toMatchObject({ sizeBytes: Buffer.byteLength(boxMmObj), summary: { meshId: mesh.id, triangleCount: 12 } });
  });

  it('imports a binary STL', async () => {
    const res = await upload(tetrahedronStl(), 'tetra.stl', { units: 'm', name: `Tetra ${randomUUID().slice(0, 8)}` });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const mesh = meshSummarySchema.parse(res.body);
    expect(mesh).toMatchObject({ format: 'stl-binary', triangleCount: 4, droppedDegenerate: 0, boundsM: { min: [0, 0, 0], max: [1, 1, 1] } });
    // Three right triangles of 1/2 m² and an equilateral one of side √2: (√3/4)·2.
    expect(mesh.totalAreaM2).toBeCloseTo(1.5 + Math.sqrt(3) / 2, 6);
  });

  it('refuses a file with bad syntax with its line number on `file`, and stores nothing', async () => {
    const before = await counts();
    const bad = ['v 0 0 0', 'v 1 0 0', 'v 0 1 zero', 'f 1 2 3', ''].join('\n');
    const res = await upload(Buffer.from(bad), 'bad.obj', { units: 'm' });
    expect(res.status).toBe(400);
    const body = apiErrorSchema.parse(res.body);
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.fields?.file).toMatch(/^line 3: /);
    expect(await counts()).toEqual(before);
  });

  it('refuses a file over the size limit naming `file` and the limit', async () => {
    const before = await counts();
    const res = await upload(Buffer.alloc(32 * 1024 * 1024 + 1, 0x20), 'huge.obj', { units: 'm' });
    expect([400, 413]).toContain(res.status);
    expect(res.body.error.fields.file).toContain('32 MB');
    expect(await counts()).toEqual(before);
  });

  it('refuses bad form fields by name', async () => {
    const res = await upload(Buffer.from(boxMmObj), 'box.obj', { units: 'inch', rotationDeg: '[0, 0]' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['rotationDeg', 'units']);
  });

  it('lists and reads meshes, and serves the geometry as float32 coordinates and uint32 groups', async () => {
    const list = meshListSchema.parse((await reviewer.get(meshesPath())).body);
    expect(list.meshes.map((m) => m.id)).toContain(boxWing.id);
    const one = await reviewer.get(`${meshesPath()}/${boxWing.id}`);
    expect(meshSummarySchema.parse(one.body)).toEqual(boxWing);
    expect((await engineer.get(`${meshesPath(halyard)}/${boxWing.id}`)).status).toBe(404);

    const res = await reviewer
      .get(`${meshesPath()}/${boxWing.id}/geometry`)
      .buffer(true)
      .parse((r, done) => {
        const parts: Buffer[] = [];
        r.on('data', (c: Buffer) => parts.push(c));
        r.on('end', () => done(null, Buffer.concat(parts)));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/octet-stream');
    const count = Number(res.headers['x-triangle-count']);
    expect(count).toBe(boxWing.triangleCount);
    const body = res.body as Buffer;
    expect(body.length).toBe(count * 40);
    const direct = readMesh(new Uint8Array(boxWingObj), { fileName: 'x.obj', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 200_000 });
    const coordinates = Array.from({ length: count * 9 }, (_, i) => body.readFloatLE(i * 4));
    expect(coordinates).toEqual(Array.from(direct.mesh.positions, (x) => Math.fround(x)));
    const groups = Array.from({ length: count }, (_, t) => body.readUInt32LE(count * 36 + t * 4));
    expect(groups).toEqual(Array.from(direct.mesh.groupOfTriangle));
    expect(boxWing.groups.map((g) => g.name)).toEqual(['bus', 'wing-north', 'wing-south', 'dish']);
  });

  it('refuses optics naming a group the mesh does not have', async () => {
    const res = await engineer.post(`${meshesPath()}/${boxWing.id}/tables`).send({ optics: { default: { front: 'white-paint' }, groups: { antenna: { front: 'black-paint' } } }, table: { stepDeg: 15 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['optics.groups.antenna']);
  });

  let tableId = '';

  it('computes a table through the queue in several chunks, equal to srp-core computing it whole, and caches it', async () => {
    const settings = { stepDeg: 15, samplesPerFacet: 4, specularBounce: false };
    const first = await engineer.post(`${meshesPath()}/${boxWing.id}/tables`).send({ optics: boxWingOptics, table: settings });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    const queued = coefficientTableSummarySchema.parse(first.body);
    tableId = queued.id;
    expect(queued).toMatchObject({ status: 'queued', progress: 0, chunksDone: 0, meshId: boxWing.id, settings });
    expect(queued.chunkCount).toBeGreaterThan(1);
    // Every chunk's job went in with the table (same transaction).
    const [jobs] = await api.sequelize.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM pgboss.job j JOIN coefficient_table_chunks k ON k.id::text = j.data->>'chunkId' WHERE j.name = 'coefficient-table-chunk' AND k.table_id = :id`,
      { replacements: { id: tableId }, type: QueryTypes.SELECT },
    );
    expect(jobs!.n).toBe(queued.chunkCount);
    // Not computed yet: no values.
    expect((await reviewer.get(`/api/missions/${corvina}/coefficient-tables/${tableId}/data`)).status).toBe(409);

    await ensureWorker();
    const done = await pollTable(tableId, (t) => t.status !== 'queued' && t.status !== 'running');
    expect(done).toMatchObject({ status: 'succeeded', progress: 1, chunksDone: queued.chunkCount, error: null });
    expect(done.stats!.rays).toBeGreaterThan(0);

    // The same scene computed whole on this thread: the same bits.
    const scene = createMeshScene(
      readMesh(new Uint8Array(boxWingObj), { fileName: 'x.obj', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 200_000 }).mesh,
      boxWingOptics as unknown as MeshOpticsInput,
    );
    const direct = computeCoefficientTable(scene, settings);
    const row = await CoefficientTableModel.unscoped().findByPk(tableId);
    expect(row!.data!.equals(encodeFloat64(direct.values))).toBe(true);
    // The ray count depends on the bands (srp-core skips a facet's prism test for a few directions
    // after it found an occluder, within one band): the chunks' bands computed here cast as many.
    const bands = await api.sequelize.query<{ first_polar_row: number; end_polar_row: number }>(
      'SELECT first_polar_row, end_polar_row FROM coefficient_table_chunks WHERE table_id = :id ORDER BY first_polar_row',
      { replacements: { id: tableId }, type: QueryTypes.SELECT },
    );
    const bandRays = bands.reduce((sum, b) => sum + computeCoefficientTableRows(scene, settings, b.first_polar_row, b.end_polar_row).rays, 0);
    expect(done.stats!.rays).toBe(bandRays);
    const data = coefficientTableDataSchema.parse((await reviewer.get(`/api/missions/${corvina}/coefficient-tables/${tableId}/data`)).body);
    expect(data).toMatchObject({ id: tableId, stepDeg: 15, polarCount: direct.polarCount, azimuthCount: direct.azimuthCount });
    // JSON has no negative zero; otherwise the numbers are the same.
    expect(data.values).toEqual(Array.from(direct.values, (v) => (v === 0 ? 0 : v)));

    // Asked again with the same optics (another key order, a preset spelled out the same): the cached table.
    const again = await engineer
      .post(`${meshesPath()}/${boxWing.id}/tables`)
      .send({ table: settings, optics: { groups: { dish: boxWingOptics.groups.dish, 'wing-south': boxWingOptics.groups['wing-south'], 'wing-north': boxWingOptics.groups['wing-north'] }, default: { front: 'mli-kapton' } } });
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(tableId);
    const other = await engineer.post(`${meshesPath()}/${boxWing.id}/tables`).send({ optics: boxWingOptics, table: { ...settings, samplesPerFacet: 1 } });
    expect(other.status).toBe(201);
    expect(other.body.id).not.toBe(tableId);
    expect((await engineer.post(`/api/missions/${corvina}/coefficient-tables/${other.body.id}/cancel`)).status).toBe(200);
    expect((await engineer.post(`/api/missions/${corvina}/coefficient-tables/${tableId}/cancel`)).status).toBe(409);
  }, 120_000);

  it('cancelling a running table stops its band in hand at the next heartbeat and its queued bands at once', async () => {
    // A 2° grid at 16 samples: dozens of bands of seconds each, so it is still running when cancelled.
    const res = await engineer.post(`${meshesPath()}/${boxWing.id}/tables`).send({ optics: boxWingOptics, table: { stepDeg: 2, samplesPerFacet: 16 } });
    expect(res.status).toBe(201);
    const id = res.body.id as string;
    await ensureWorker();
    await pollTable(id, (t) => t.status === 'running');
    const cancelled = await engineer.post(`/api/missions/${corvina}/coefficient-tables/${id}/cancel`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    const chunkStatuses = async () =>
      (await api.sequelize.query<{ status: string }>('SELECT status FROM coefficient_table_chunks WHERE table_id = :id', { replacements: { id }, type: QueryTypes.SELECT })).map((r) => r.status);
    const deadline = Date.now() + 30_000;
    while ((await chunkStatuses()).some((s) => s === 'running' || s === 'queued')) {
      if (Date.now() > deadline) throw new Error(`chunks still open after the cancel: ${(await chunkStatuses()).join(', ')}`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    const statuses = await chunkStatuses();
    expect(statuses.filter((s) => s === 'cancelled').length).toBeGreaterThan(statuses.length / 2);
    expect(new Set(statuses)).toEqual(new Set(statuses.filter((s) => s === 'cancelled' || s === 'succeeded')));
    expect((await engineer.get(`/api/missions/${corvina}/coefficient-tables/${id}`)).body.status).toBe('cancelled');
    expect((await reviewer.get(`/api/missions/${corvina}/coefficient-tables/${id}/data`)).status).toBe(409);
  }, 60_000);

  it('a mesh vehicle lists its mesh, refuses foreign meshes and unknown groups, and runs only once its table is ready', async () => {
    await worker?.stop();
    worker = null;
    const optics = { default: { front: 'mli-kapton' }, groups: { dish: { front: 'white-paint', back: 'white-paint' }, 'wing-north': { front: 'solar-cell', back: 'solar-array-back' } } };
    const spec = (extra: Record<string, unknown> = {}) => ({
      kind: 'mesh',
      name: 'Corvina-2 mesh test',
      massKg: 3200,
      centreOfMassM: [0.05, 0, 0.1],
      meshId: boxWing.id,
      optics,
      table: { stepDeg: 15, samplesPerFacet: 1 },
      ...extra,
    });
    const vehiclesPath = `/api/missions/${corvina}/vehicles`;
    const foreign = await engineer.post(vehiclesPath).send({ name: `Mesh ${randomUUID().slice(0, 8)}`, spec: spec({ meshId: randomUUID() }) });
    expect(foreign.status).toBe(400);
    expect(Object.keys(foreign.body.error.fields)).toEqual(['spec.meshId']);
    const unknownGroup = await engineer.post(vehiclesPath).send({ name: `Mesh ${randomUUID().slice(0, 8)}`, spec: spec({ optics: { ...optics, groups: { boom: { front: 'black-paint' } } } }) });
    expect(unknownGroup.status).toBe(400);
    expect(Object.keys(unknownGroup.body.error.fields)).toEqual(['spec.optics.groups.boom']);

    const created = await engineer.post(vehiclesPath).send({ name: `Mesh ${randomUUID().slice(0, 8)}`, spec: spec() });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const saved = vehicleSavedSchema.parse(created.body);
    expect(saved.vehicle).toMatchObject({ kind: 'mesh', surfaceCount: boxWing.triangleCount, totalAreaM2: boxWing.totalAreaM2 });
    const detail = vehicleDetailSchema.parse((await reviewer.get(`${vehiclesPath}/${saved.vehicle.id}`)).body);
    expect(detail.coefficientTable).toMatchObject({ status: 'queued', meshId: boxWing.id, settings: { stepDeg: 15, samplesPerFacet: 1, specularBounce: false } });
    // A second vehicle with the same mesh, optics and settings shares the table.
    const twin = vehicleSavedSchema.parse((await engineer.post(vehiclesPath).send({ name: `Mesh twin ${randomUUID().slice(0, 8)}`, spec: spec({ massKg: 1000 }) })).body);
    const twinDetail = vehicleDetailSchema.parse((await reviewer.get(`${vehiclesPath}/${twin.vehicle.id}`)).body);
    expect(twinDetail.coefficientTable!.id).toBe(detail.coefficientTable!.id);

    const scenarioName = `Mesh scenario ${randomUUID().slice(0, 8)}`;
    const scenarioSpec = { ...corvinaScenarioFile(), requirements: [], name: scenarioName, spanDays: 0.25, outputStepS: 900, vehicle: { ref: saved.revision.id } };
    const scenario = await engineer.post(`/api/missions/${corvina}/scenarios`).send({ name: scenarioName, spec: scenarioSpec });
    expect(scenario.status, JSON.stringify(scenario.body)).toBe(201);
    const scenarioId = scenario.body.id as string;

    // No worker: the table is still queued, and the run is refused saying so.
    const early = await engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/coefficient table is queued \(0 % done\)/);
    // A study over the vehicle may vary mass and centre of mass only.
    const badStudy = await engineer
      .post(`/api/missions/${corvina}/studies`)
      .send({ name: `Mesh study ${randomUUID().slice(0, 8)}`, scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.table.stepDeg', values: [10] }] }, lines: ['srp.accel.max'] });
    expect(badStudy.status).toBe(400);
    expect(Object.keys(badStudy.body.error.fields)).toEqual(['design.parameters.0.path']);

    await ensureWorker();
    const table = await pollTable(detail.coefficientTable!.id, (t) => t.status === 'succeeded' || t.status === 'failed');
    expect(table.status, table.error ?? '').toBe('succeeded');

    const posted = await engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId });
    expect(posted.status, JSON.stringify(posted.body)).toBe(201);
    const run = await pollRun(engineer, corvina, runSchema.parse(posted.body).id, isFinished, { timeoutMs: 120_000 });
    expect(run.status, run.errorMessage ?? '').toBe('succeeded');

    // srp-core propagating the same vehicle with the table it computes itself gives the same samples.
    const direct = computeCoefficientTable(
      createMeshScene(
        readMesh(new Uint8Array(boxWingObj), { fileName: 'x.obj', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 200_000 }).mesh,
        optics as unknown as MeshOpticsInput,
      ),
      { stepDeg: 15, samplesPerFacet: 1, specularBounce: false },
    );
    const vehicle = saved.revision.spec as VehicleSpec;
    const outcome = computeRunOutcome({
      scenario: scenarioSchema.parse({ ...scenarioSpec, vehicle: { ref: saved.revision.id } }),
      vehicle,
      vehicleRevisionId: saved.revision.id,
      meshTable: { stepDeg: direct.stepDeg, polarCount: direct.polarCount, azimuthCount: direct.azimuthCount, values: direct.values },
    })!;
    const result = await RunResultModel.findByPk(run.id);
    expect(result!.sampleCount).toBe(outcome.sampleCount);
    const chunks: Float64Array[] = [];
    for await (const chunk of readSampleChunks(api.sequelize, run.id)) chunks.push(chunk.rows);
    const samples = Float64Array.from(chunks.flatMap((c) => Array.from(c)));
    expect(samples).toEqual(outcome.samples);
    expect(outcome.summary.vehicle.kind).toBe('mesh');
    // SRP acted (the table is not zero).
    expect(outcome.summary.srpAcceleration.max).toBeGreaterThan(0);

    const study = await engineer
      .post(`/api/missions/${corvina}/studies`)
      .send({ name: `Mesh study ${randomUUID().slice(0, 8)}`, scenarioId, design: { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [3000, 3400] }] }, lines: ['srp.accel.max'] });
    expect(study.status, JSON.stringify(study.body)).toBe(201);
  }, 240_000);

  it('a reviewer reads but may not import or request tables', async () => {
    expect((await upload(Buffer.from(boxMmObj), 'box.obj', { units: 'm' }, reviewer)).status).toBe(403);
    expect((await reviewer.post(`${meshesPath()}/${boxWing.id}/tables`).send({ optics: boxWingOptics })).status).toBe(403);
    expect((await reviewer.get(`/api/missions/${corvina}/coefficient-tables/${tableId}`)).status).toBe(200);
  });

  it('the demo seeding adds the box-wing mesh vehicle with its table computed (the same bits as srp-core)', async () => {
    const mission = await MissionModel.create({ slug: `mesh-seed-${randomUUID().slice(0, 8)}`, name: 'Mesh seed test', regime: 'earth-orbit', summary: '', createdBy: null });
    const engineerRow = (await UserModel.findOne({ where: { role: 'engineer' } }))!;
    await MissionMemberModel.create({ missionId: mission.id, userId: engineerRow.id });
    const base = { kind: 'cannonball', name: 'base', massKg: 3100, centreOfMassM: [0, 0, 0.2], areaM2: 10, cr: 1.3 } as VehicleSpec;
    await seedDemoMeshVehicle(api.sequelize, mission.id, engineerRow.id, base);
    const vehicle = (await VehicleModel.findOne({ where: { missionId: mission.id } }))!;
    const revision = (await VehicleRevisionModel.findOne({ where: { vehicleId: vehicle.id } }))!;
    expect(revision).toMatchObject({ kind: 'mesh', massKg: 3100, surfaceCount: 880 });
    const spec = revision.spec as Extract<VehicleSpec, { kind: 'mesh' }>;
    expect(spec).toMatchObject({ name: 'Corvina-2 mesh model', centreOfMassM: [0, 0, 0.2], table: { stepDeg: 10, samplesPerFacet: 4, specularBounce: false } });
    const table = (await findVehicleTable(spec))!;
    expect(table.status).toBe('succeeded');
    const direct = computeCoefficientTable(
      createMeshScene(
        readMesh(new Uint8Array(boxWingObj), { fileName: 'x.obj', units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0], maxTriangles: 200_000 }).mesh,
        spec.optics as unknown as MeshOpticsInput,
      ),
      spec.table,
    );
    const row = await CoefficientTableModel.unscoped().findByPk(table.id);
    expect(row!.data!.equals(encodeFloat64(direct.values))).toBe(true);
    await MissionModel.destroy({ where: { id: mission.id } });
  });
});
