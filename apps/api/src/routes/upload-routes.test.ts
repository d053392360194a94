import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import {
  apiErrorSchema,
  attitudeProfileUploadResultSchema,
  plateSetUploadResultSchema,
  uploadListSchema,
  uploadSchema,
  vehicleCompareSchema,
  vehicleRevisionSchema,
  vehicleSavedSchema,
  vehicleSpecSchema,
  type Role,
} from '@photon-ledger/shared';
import { demoMissionIds, startApi, type ApiHarness } from '../../test/api-harness';

const fixture = (path: string) => readFileSync(new URL(`../../../../fixtures/${path}`, import.meta.url));

/** Name and area of each plate row, read with a plain split (not the parser under test). */
function platesInCsv(text: string): { name: string; areaM2: number }[] {
  const lines = text.split('\n').filter((l) => l.trim() !== '' && !l.startsWith('#'));
  const header = lines[0]!.split(',');
  const nameAt = header.indexOf('name');
  const areaAt = header.indexOf('area_m2');
  return lines.slice(1).map((l) => {
    const cells = l.split(',');
    return { name: cells[nameAt]!, areaM2: Number(cells[areaAt]) };
  });
}

const goodHeader = 'name,area_m2,normal_x,normal_y,normal_z,centroid_x_m,centroid_y_m,centroid_z_m,front_preset,front_absorbed,front_specular,front_diffuse';
const goodRow = (name: string) => `${name},1.5,0,0,1,0,0,0.5,mli-kapton,,,`;

describe('uploads: plate sets and attitude profiles', () => {
  let api: ApiHarness;
  let corvina: string;
  let halyard: string;
  let vehicleId: string;
  let plateUploadId: string;
  const uploadsPath = () => `/api/missions/${corvina}/uploads`;

  const counts = async () => {
    const [row] = await api.sequelize.query<{ uploads: string; revisions: string; vehicles: string }>(
      'SELECT (SELECT count(*) FROM uploads) AS uploads, (SELECT count(*) FROM vehicle_revisions) AS revisions, (SELECT count(*) FROM vehicles) AS vehicles',
      { type: QueryTypes.SELECT },
    );
    return row;
  };

  beforeAll(async () => {
    api = await startApi();
    ({ corvina, halyard } = await demoMissionIds(api));
    const spec = vehicleSpecSchema.parse(JSON.parse(fixture('vehicles/corvina-2.vehicle.json').toString('utf8')));
    const res = await (await api.signedIn('engineer')).post(`/api/missions/${corvina}/vehicles`).send({ name: 'Corvina-2 (upload test)', spec });
    vehicleId = vehicleSavedSchema.parse(res.body).vehicle.id;
  });
  afterAll(() => api.close());

  it('a plate-set CSV for an existing vehicle makes the next revision with exactly those plates, keeping mass and centre of mass', async () => {
    const bytes = fixture('uploads/corvina-2.plates.csv');
    const res = await (await api.signedIn('engineer'))
      .post(`${uploadsPath()}/plate-set`)
      .field('vehicleId', vehicleId)
      .field('basedOnRevision', '1')
      .attach('file', bytes, { filename: 'corvina-2.plates.csv', contentType: 'text/csv' });
    expect(res.status).toBe(201);
    const result = plateSetUploadResultSchema.parse(res.body);
    plateUploadId = result.upload.id;

    const expected = platesInCsv(bytes.toString('utf8'));
    expect(result.revision.revision).toBe(2);
    expect(result.revision.sourceUploadId).toBe(result.upload.id);
    const spec = result.revision.spec;
    if (spec.kind !== 'plates') throw new Error('expected a plate model');
    expect(spec.plates.map((p) => ({ name: p.name, areaM2: p.areaM2 }))).toEqual(expected);
    expect(spec.massKg).toBe(4200);
    expect(spec.centreOfMassM).toEqual([0.04, -0.03, -0.15]);
    expect(result.vehicle.totalAreaM2).toBeCloseTo(expected.reduce((s, p) => s + p.areaM2, 0), 12);

    expect(result.upload).toMatchObject({
      kind: 'plate-set',
      fileName: 'corvina-2.plates.csv',
      sizeBytes: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      summary: { plateCount: expected.length, vehicleId, revision: 2 },
    });

    const compare = vehicleCompareSchema.parse((await (await api.signedIn('reviewer')).get(`/api/missions/${corvina}/vehicles/${vehicleId}/compare?from=1&to=2`)).body);
    expect(compare.changes.map((c) => [c.path, c.fields])).toEqual([
      ['plates["north wing"]', ['areaM2', 'centroidM']],
      ['plates["south wing"]', ['areaM2', 'centroidM']],
      ['plates["reflector 2.6 m"]', ['front']],
    ]);
  });

  it('a plate-set CSV with a name and mass makes a new vehicle', async () => {
    const res = await (await api.signedIn('lead'))
      .post(`${uploadsPath()}/plate-set`)
      .field('name', 'Corvina-2 plate-set variant')
      .field('massKg', '4150.5')
      .field('comX', '0.1')
      .field('comY', '0')
      .field('comZ', '-0.2')
      .attach('file', fixture('uploads/corvina-2.plates.csv'), { filename: 'variant.csv', contentType: 'text/csv' });
    expect(res.status).toBe(201);
    const result = plateSetUploadResultSchema.parse(res.body);
    expect(result.revision.revision).toBe(1);
    expect(result.revision.spec).toMatchObject({ kind: 'plates', name: 'Corvina-2 plate-set variant', massKg: 4150.5, centreOfMassM: [0.1, 0, -0.2] });
  });

  it('the upload lists without its bytes and downloads as the original bytes with its name', async () => {
    const reviewer = await api.signedIn('reviewer');
    const list = await reviewer.get(`${uploadsPath()}?kind=plate-set`);
    expect(list.status).toBe(200);
    const uploads = uploadListSchema.parse(list.body).uploads;
    expect(uploads.map((u) => u.id)).toContain(plateUploadId);
    expect(uploads.every((u) => u.kind === 'plate-set')).toBe(true);
    expect(list.body.uploads[0]).not.toHaveProperty('data');

    const content = await reviewer.get(`${uploadsPath()}/${plateUploadId}/content`);
    expect(content.status).toBe(200);
    expect(content.headers['content-type']).toMatch(/^text\/csv/);
    expect(content.headers['content-disposition']).toMatch(/^attachment; filename="corvina-2\.plates\.csv"/);
    expect(content.text).toBe(fixture('uploads/corvina-2.plates.csv').toString('utf8'));
    expect((await reviewer.get(`${uploadsPath()}/00000000-0000-4000-8000-000000000000/content`)).status).toBe(404);
  });

  const badPlateFiles: [string, Buffer | string, string][] = [
    ['a non-numeric area on line 5', [goodHeader, goodRow('a'), goodRow('b'), goodRow('c'), 'd,twelve,0,0,1,0,0,0.5,mli-kapton,,,'].join('\n'), 'row 5, column area_m2'],
    ['a missing column', ['name,normal_x,normal_y,normal_z,centroid_x_m,centroid_y_m,centroid_z_m,front_preset', 'a,0,0,1,0,0,0,mli-kapton'].join('\n'), 'row 1, column area_m2'],
    ['optics not summing to 1', [goodHeader, goodRow('a'), 'b,1,0,0,1,0,0,0,,0.5,0.3,0.3'].join('\n'), 'row 3, column front_absorbed+front_specular+front_diffuse'],
    ['an empty file', '', 'file'],
    ['a file over 2 MB', Buffer.alloc(2 * 1024 * 1024 + 1, '#'), 'file'],
  ];

  it.each(badPlateFiles)('a plate set with %s is refused with 400 naming where, and nothing is stored', async (_what, content, key) => {
    const before = await counts();
    const res = await (await api.signedIn('engineer'))
      .post(`${uploadsPath()}/plate-set`)
      .field('vehicleId', vehicleId)
      .field('basedOnRevision', '2')
      .attach('file', Buffer.from(content), { filename: 'bad.csv', contentType: 'text/csv' });
    expect(res.status).toBe(400);
    const error = apiErrorSchema.parse(res.body).error;
    expect(error.fields).toHaveProperty([key]);
    expect(error.message).toContain(key);
    expect(await counts()).toEqual(before);
  });

  it('a good file from a stale revision is a 409 and the upload row is rolled back with the revision', async () => {
    const before = await counts();
    const res = await (await api.signedIn('engineer'))
      .post(`${uploadsPath()}/plate-set`)
      .field('vehicleId', vehicleId)
      .field('basedOnRevision', '1')
      .attach('file', fixture('uploads/corvina-2.plates.csv'), { filename: 'late.csv', contentType: 'text/csv' });
    expect(res.status).toBe(409);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('basedOnRevision');
    expect(await counts()).toEqual(before);
  });

  it('a file in the wrong form field, no file, or incomplete form fields are 400s naming the field', async () => {
    const engineer = await api.signedIn('engineer');
    const wrongField = await engineer
      .post(`${uploadsPath()}/plate-set`)
      .field('name', 'x')
      .field('massKg', '10')
      .attach('attachment', Buffer.from(`${goodHeader}\n${goodRow('a')}`), { filename: 'a.csv', contentType: 'text/csv' });
    expect(wrongField.status).toBe(400);
    expect(apiErrorSchema.parse(wrongField.body).error.fields).toHaveProperty('file');

    const noFile = await engineer.post(`${uploadsPath()}/plate-set`).send({ name: 'x', massKg: 10 });
    expect(noFile.status).toBe(400);
    expect(apiErrorSchema.parse(noFile.body).error.fields).toHaveProperty('file');

    const csv = Buffer.from(`${goodHeader}\n${goodRow('a')}`);
    const noRevision = await engineer.post(`${uploadsPath()}/plate-set`).field('vehicleId', vehicleId).attach('file', csv, 'a.csv');
    expect(apiErrorSchema.parse(noRevision.body).error.fields).toHaveProperty('basedOnRevision');
    const noName = await engineer.post(`${uploadsPath()}/plate-set`).field('massKg', '12').attach('file', csv, 'a.csv');
    expect(noName.status).toBe(400);
    expect(Object.keys(apiErrorSchema.parse(noName.body).error.fields ?? {})).toEqual(['name']);
    const badMass = await engineer.post(`${uploadsPath()}/plate-set`).field('name', 'y').field('massKg', 'heavy').attach('file', csv, 'a.csv');
    expect(apiErrorSchema.parse(badMass.body).error.fields).toEqual({ massKg: 'massKg must be a number (kg)' });
  });

  it('an attitude profile is parsed and stored with its row count and time span', async () => {
    const bytes = fixture('uploads/corvina-2-yaw-follow.attitude.csv');
    const dataRows = bytes.toString('utf8').trim().split('\n').length - 1;
    const res = await (await api.signedIn('engineer'))
      .post(`${uploadsPath()}/attitude-profile`)
      .attach('file', bytes, { filename: 'corvina-2-yaw-follow.attitude.csv', contentType: 'text/csv' });
    expect(res.status).toBe(201);
    const { upload } = attitudeProfileUploadResultSchema.parse(res.body);
    expect(upload.kind).toBe('attitude-profile');
    // 37 rows ten minutes apart: 6 h (fixtures/uploads/README.md).
    expect(upload.summary).toEqual({ rowCount: dataRows, startSeconds: 0, endSeconds: (dataRows - 1) * 600, epochUtc: '2026-09-08T00:00:00Z', timeColumn: 'time_utc' });
    const listed = (await (await api.signedIn('admin')).get(`${uploadsPath()}?kind=attitude-profile`)).body as { uploads: { id: string }[] };
    expect(uploadSchema.parse(listed.uploads.find((u) => u.id === upload.id))).toEqual(upload);
  });

  const badProfiles: [string, string, string][] = [
    ['a non-numeric component on line 4', 't_s,q_w,q_x,q_y,q_z\n0,1,0,0,0\n60,1,0,0,0\n120,1,zero,0,0\n', 'row 4, column q_x'],
    ['a missing column', 't_s,q_w,q_x,q_y\n0,1,0,0\n60,1,0,0\n', 'row 1, column q_z'],
    ['a quaternion that is not unit', 't_s,q_w,q_x,q_y,q_z\n0,1,0,0,0\n60,2,0,0,0\n', 'row 3, column q_w,q_x,q_y,q_z'],
    ['an empty file', '', 'file'],
  ];

  it.each(badProfiles)('an attitude profile with %s is refused with 400 naming where, and nothing is stored', async (_what, content, key) => {
    const before = await counts();
    const res = await (await api.signedIn('lead')).post(`${uploadsPath()}/attitude-profile`).attach('file', Buffer.from(content), { filename: 'bad.csv', contentType: 'text/csv' });
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty([key]);
    expect(await counts()).toEqual(before);
  });

  it('each upload wrote an audit line, and the revision made from the plate set names it', async () => {
    const rows = await api.sequelize.query<{ action: string; detail: Record<string, unknown> }>(
      `SELECT action, detail FROM audit_log WHERE mission_id = :corvina AND (entity_id = :plateUploadId OR (entity_id = :vehicleId AND action = 'vehicle-revision-created'))`,
      { type: QueryTypes.SELECT, replacements: { corvina, plateUploadId, vehicleId } },
    );
    expect(rows.map((r) => r.action).sort()).toEqual(['upload-created', 'vehicle-revision-created']);
    expect(rows.find((r) => r.action === 'vehicle-revision-created')!.detail).toMatchObject({ revision: 2, sourceUploadId: plateUploadId });
  });

  it.each<Role>(['reviewer', 'admin'])('a %s may list and download uploads but not upload (403, nothing stored)', async (role) => {
    const agent = await api.signedIn(role);
    const before = await counts();
    const csv = Buffer.from(`${goodHeader}\n${goodRow('a')}`);
    const plate = await agent.post(`${uploadsPath()}/plate-set`).field('name', `by ${role}`).field('massKg', '5').attach('file', csv, 'a.csv');
    expect(plate.status).toBe(403);
    const profile = await agent.post(`${uploadsPath()}/attitude-profile`).attach('file', fixture('uploads/corvina-2-yaw-follow.attitude.csv'), 'p.csv');
    expect(profile.status).toBe(403);
    expect(await counts()).toEqual(before);
    expect((await agent.get(uploadsPath())).status).toBe(200);
    expect((await agent.get(`${uploadsPath()}/${plateUploadId}/content`)).status).toBe(200);
  });

  it('a reviewer gets 404 for the uploads of halyard-1, which they do not belong to', async () => {
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(`/api/missions/${halyard}/uploads`)).status).toBe(404);
    // An upload of corvina-2 is not found through halyard-1 either, even by a member of both.
    expect((await (await api.signedIn('engineer')).get(`/api/missions/${halyard}/uploads/${plateUploadId}/content`)).status).toBe(404);
  });

  it('a vehicle revision made from an upload reads back with its source', async () => {
    const revision = vehicleRevisionSchema.parse((await (await api.signedIn('engineer')).get(`/api/missions/${corvina}/vehicles/${vehicleId}/revisions/2`)).body);
    expect(revision.sourceUploadId).toBe(plateUploadId);
    expect(revision.note).toBe('plates from corvina-2.plates.csv');
  });
});
