import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import {
  apiErrorSchema,
  vehicleCompareSchema,
  vehicleDetailSchema,
  vehicleListSchema,
  vehicleRevisionSchema,
  vehicleSavedSchema,
  vehicleSpecSchema,
  type Role,
  type VehicleSpec,
} from '@photon-ledger/shared';
import { demoMissionIds, startApi, type ApiHarness } from '../../test/api-harness';

type PlatesSpec = Extract<VehicleSpec, { kind: 'plates' }>;

/** The demo vehicle file, as the web client would send it. */
function corvinaSpec(): PlatesSpec {
  const raw: unknown = JSON.parse(readFileSync(new URL('../../../../fixtures/vehicles/corvina-2.vehicle.json', import.meta.url), 'utf8'));
  const spec = vehicleSpecSchema.parse(raw);
  if (spec.kind !== 'plates') throw new Error('the Corvina-2 fixture should be a plate model');
  return spec;
}

describe('vehicles and their immutable revisions', () => {
  let api: ApiHarness;
  let corvina: string;
  let halyard: string;
  const vehicleName = 'Corvina-2 (vehicle routes test)';
  let vehicleId: string;

  const count = async (sql: string, replacements: Record<string, unknown> = {}) => {
    const [row] = await api.sequelize.query<{ n: string }>(sql, { type: QueryTypes.SELECT, replacements });
    return Number(row!.n);
  };
  const vehiclesPath = () => `/api/missions/${corvina}/vehicles`;

  beforeAll(async () => {
    api = await startApi();
    ({ corvina, halyard } = await demoMissionIds(api));
  });
  afterAll(() => api.close());

  it('an engineer creates a vehicle from the demo file: revision 1 with its listing columns, audited', async () => {
    const spec = corvinaSpec();
    const engineer = await api.signedIn('engineer');
    const res = await engineer.post(vehiclesPath()).send({ name: vehicleName, spec, note: 'from the demo file' });
    expect(res.status).toBe(201);
    const saved = vehicleSavedSchema.parse(res.body);
    vehicleId = saved.vehicle.id;
    expect(saved.revision.revision).toBe(1);
    expect(saved.revision.author?.displayName).toBe('Ines Okafor');
    expect(saved.vehicle).toMatchObject({ name: vehicleName, kind: 'plates', massKg: 4200, surfaceCount: spec.plates.length, revision: 1 });
    const fileArea = spec.plates.reduce((sum, p) => sum + p.areaM2, 0);
    expect(saved.vehicle.totalAreaM2).toBeCloseTo(fileArea, 12);

    const listed = vehicleListSchema.parse((await engineer.get(vehiclesPath())).body).vehicles.find((v) => v.id === vehicleId);
    expect(listed).toMatchObject({ revision: 1, surfaceCount: 10, latestRevisionId: saved.revision.id });
    expect(await count('SELECT count(*) AS n FROM vehicle_revisions WHERE vehicle_id = :vehicleId', { vehicleId })).toBe(1);
    expect(
      await count(`SELECT count(*) AS n FROM audit_log WHERE entity_id = :vehicleId AND action = 'vehicle-created' AND mission_id = :corvina`, { vehicleId, corvina }),
    ).toBe(1);
  });

  it('a second vehicle with the same name in the mission is a 409 on name, and nothing more is stored', async () => {
    const res = await (await api.signedIn('lead')).post(vehiclesPath()).send({ name: vehicleName, spec: corvinaSpec() });
    expect(res.status).toBe(409);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('name');
    expect(await count('SELECT count(*) AS n FROM vehicles WHERE name = :vehicleName', { vehicleName })).toBe(1);
  });

  it('a bad spec is a 400 naming the field, and no vehicle is created', async () => {
    const spec = corvinaSpec();
    spec.plates[0]!.areaM2 = -1;
    const res = await (await api.signedIn('engineer')).post(vehiclesPath()).send({ name: 'Refused vehicle', spec });
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty(['spec.plates.0.areaM2']);
    expect(await count(`SELECT count(*) AS n FROM vehicles WHERE name = 'Refused vehicle'`)).toBe(0);
  });

  it('a new revision from the latest is stored; a save from a stale revision is a 409 and stores nothing', async () => {
    const engineer = await api.signedIn('engineer');
    const spec = corvinaSpec();
    spec.plates.find((p) => p.name === 'bus +x (east)')!.areaM2 = 7.25;
    const res = await engineer.post(`${vehiclesPath()}/${vehicleId}/revisions`).send({ spec, note: 'east face re-measured', basedOnRevision: 1 });
    expect(res.status).toBe(201);
    const saved = vehicleSavedSchema.parse(res.body);
    expect(saved.revision.revision).toBe(2);
    expect(saved.vehicle.revision).toBe(2);
    expect(saved.vehicle.totalAreaM2).toBeCloseTo(corvinaSpec().plates.reduce((s, p) => s + p.areaM2, 0) + (7.25 - 6.6), 12);

    // The lead edited revision 1 too, but saves after the engineer: refused.
    const stale = await (await api.signedIn('lead')).post(`${vehiclesPath()}/${vehicleId}/revisions`).send({ spec: corvinaSpec(), basedOnRevision: 1 });
    expect(stale.status).toBe(409);
    expect(apiErrorSchema.parse(stale.body).error.fields).toHaveProperty('basedOnRevision');
    expect(await count('SELECT count(*) AS n FROM vehicle_revisions WHERE vehicle_id = :vehicleId', { vehicleId })).toBe(2);
    expect(await count('SELECT latest_revision AS n FROM vehicles WHERE id = :vehicleId', { vehicleId })).toBe(2);
  });

  it('compare shows the changed plate area as one change of that plate', async () => {
    const res = await (await api.signedIn('reviewer')).get(`${vehiclesPath()}/${vehicleId}/compare?from=1&to=2`);
    expect(res.status).toBe(200);
    const compare = vehicleCompareSchema.parse(res.body);
    expect(compare.changes).toHaveLength(1);
    const [change] = compare.changes;
    expect(change).toMatchObject({ path: 'plates["bus +x (east)"]', change: 'changed', fields: ['areaM2'] });
    expect((change!.from as { areaM2: number }).areaM2).toBe(6.6);
    expect((change!.to as { areaM2: number }).areaM2).toBe(7.25);
  });

  it('reordering plates is no change; mass, an added and a removed plate each read as one change', async () => {
    const engineer = await api.signedIn('engineer');
    const latest = vehicleDetailSchema.parse((await engineer.get(`${vehiclesPath()}/${vehicleId}`)).body).latestSpec as PlatesSpec;
    const plates = [...latest.plates].reverse().filter((p) => p.name !== 'feed horn sunshield');
    plates.push({ name: 'star tracker baffle', areaM2: 0.12, normal: [0, 0, -1], centroidM: [0.5, 0.5, -1.6], front: 'black-paint' });
    const res = await engineer.post(`${vehiclesPath()}/${vehicleId}/revisions`).send({ spec: { ...latest, massKg: 4310, plates }, basedOnRevision: 2 });
    expect(res.status).toBe(201);
    const compare = vehicleCompareSchema.parse((await engineer.get(`${vehiclesPath()}/${vehicleId}/compare?from=2&to=3`)).body);
    expect(compare.changes.map((c) => [c.path, c.change])).toEqual([
      ['massKg', 'changed'],
      ['plates["star tracker baffle"]', 'added'],
      ['plates["feed horn sunshield"]', 'removed'],
    ]);
    expect(compare.changes[0]).toMatchObject({ from: 4200, to: 4310 });
  });

  it('revisions are immutable: revision 1 reads as it was saved and no route changes or deletes one', async () => {
    const engineer = await api.signedIn('engineer');
    const path = `${vehiclesPath()}/${vehicleId}/revisions/1`;
    const first = vehicleRevisionSchema.parse((await engineer.get(path)).body);
    expect(first.spec).toEqual(corvinaSpec());
    for (const method of ['put', 'patch', 'delete'] as const) {
      const res = await engineer[method](path).send({ spec: corvinaSpec() });
      expect(res.status, `${method.toUpperCase()} ${path}`).toBe(404);
    }
    const [row] = await api.sequelize.query<{ spec: unknown }>('SELECT spec FROM vehicle_revisions WHERE vehicle_id = :vehicleId AND revision = 1', {
      type: QueryTypes.SELECT,
      replacements: { vehicleId },
    });
    expect(row!.spec).toEqual(corvinaSpec());
  });

  it('the detail lists every revision newest first with note and author, and the latest spec', async () => {
    const detail = vehicleDetailSchema.parse((await (await api.signedIn('reviewer')).get(`${vehiclesPath()}/${vehicleId}`)).body);
    expect(detail.revisions.map((r) => r.revision)).toEqual([3, 2, 1]);
    expect(detail.revisions[1]).toMatchObject({ note: 'east face re-measured', author: { displayName: 'Ines Okafor' } });
    expect(detail.latestSpec.massKg).toBe(4310);
    expect(detail.revision).toBe(3);
  });

  it('unknown revisions and bad queries answer 404 and 400 naming the field', async () => {
    const engineer = await api.signedIn('engineer');
    expect((await engineer.get(`${vehiclesPath()}/${vehicleId}/revisions/99`)).status).toBe(404);
    const bad = await engineer.get(`${vehiclesPath()}/${vehicleId}/compare?from=0&to=x`);
    expect(bad.status).toBe(400);
    expect(Object.keys(apiErrorSchema.parse(bad.body).error.fields ?? {}).sort()).toEqual(['from', 'to']);
    const badRevision = await engineer.post(`${vehiclesPath()}/${vehicleId}/revisions`).send({ spec: corvinaSpec() });
    expect(badRevision.status).toBe(400);
    expect(apiErrorSchema.parse(badRevision.body).error.fields).toHaveProperty('basedOnRevision');
  });

  it('a vehicle is not reachable through another mission, even by a member of both', async () => {
    const engineer = await api.signedIn('engineer');
    expect((await engineer.get(`/api/missions/${halyard}/vehicles/${vehicleId}`)).status).toBe(404);
    const res = await engineer.post(`/api/missions/${halyard}/vehicles/${vehicleId}/revisions`).send({ spec: corvinaSpec(), basedOnRevision: 3 });
    expect(res.status).toBe(404);
  });

  it.each<Role>(['reviewer', 'admin'])('a %s reads every vehicle route (200) and is refused every write (403)', async (role) => {
    const agent = await api.signedIn(role);
    for (const path of [
      vehiclesPath(),
      `${vehiclesPath()}/${vehicleId}`,
      `${vehiclesPath()}/${vehicleId}/revisions/1`,
      `${vehiclesPath()}/${vehicleId}/compare?from=1&to=3`,
    ]) {
      expect((await agent.get(path)).status, path).toBe(200);
    }
    const create = await agent.post(vehiclesPath()).send({ name: `by ${role}`, spec: corvinaSpec() });
    expect(create.status).toBe(403);
    const revise = await agent.post(`${vehiclesPath()}/${vehicleId}/revisions`).send({ spec: corvinaSpec(), basedOnRevision: 3 });
    expect(revise.status).toBe(403);
    expect(await count('SELECT count(*) AS n FROM vehicle_revisions WHERE vehicle_id = :vehicleId', { vehicleId })).toBe(3);
  });

  it('two saves from the same revision at the same moment: one is stored, the other is a 409', async () => {
    const [engineer, lead] = await Promise.all([api.signedIn('engineer'), api.signedIn('lead')]);
    const path = `${vehiclesPath()}/${vehicleId}/revisions`;
    const [a, b] = await Promise.all([
      engineer.post(path).send({ spec: { ...corvinaSpec(), massKg: 4400 }, basedOnRevision: 3 }),
      lead.post(path).send({ spec: { ...corvinaSpec(), massKg: 4500 }, basedOnRevision: 3 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    expect(await count('SELECT count(*) AS n FROM vehicle_revisions WHERE vehicle_id = :vehicleId', { vehicleId })).toBe(4);
  });

  it('a reviewer who is not a member of halyard-1 gets 404 there, as for an unknown mission', async () => {
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(`/api/missions/${halyard}/vehicles`)).status).toBe(404);
    expect((await reviewer.post(`/api/missions/${halyard}/vehicles`).send({ name: 'x', spec: corvinaSpec() })).status).toBe(404);
  });
});
