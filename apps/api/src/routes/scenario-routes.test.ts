import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import {
  apiErrorSchema,
  attitudeProfileUploadResultSchema,
  plateSetUploadResultSchema,
  scenarioDetailSchema,
  scenarioListSchema,
  vehicleSavedSchema,
  type Role,
} from '@photon-ledger/shared';
import { demoMissionIds, startApi, type ApiHarness } from '../../test/api-harness';

const fixtureText = (path: string) => readFileSync(new URL(`../../../../fixtures/${path}`, import.meta.url), 'utf8');
const fixtureJson = (path: string) => JSON.parse(fixtureText(path)) as Record<string, unknown>;

/** A demo scenario file with its vehicle named by revision id and without requirements (set per mission by a lead). */
function scenarioFile(path: string, revisionId: string): Record<string, unknown> {
  const { requirements: _requirements, ...rest } = fixtureJson(path);
  return { ...rest, vehicle: { ref: revisionId } };
}

describe('scenarios', () => {
  let api: ApiHarness;
  let corvina: string;
  let halyard: string;
  let corvinaRevisionId: string;
  let halyardRevisionId: string;
  let corvinaProfileId: string;
  let corvinaPlateUploadId: string;
  let halyardProfileId: string;
  let scenarioId: string;
  const name = 'GEO 30 days (scenario routes test)';
  const scenariosPath = () => `/api/missions/${corvina}/scenarios`;
  const fieldsOf = (body: unknown) => apiErrorSchema.parse(body).error.fields ?? {};
  const count = async (sql: string, replacements: Record<string, unknown> = {}) => {
    const [row] = await api.sequelize.query<{ n: string }>(sql, { type: QueryTypes.SELECT, replacements });
    return Number(row!.n);
  };

  beforeAll(async () => {
    api = await startApi();
    ({ corvina, halyard } = await demoMissionIds(api));
    const engineer = await api.signedIn('engineer');
    const makeVehicle = async (missionId: string, file: string, vehicleName: string) => {
      const res = await engineer.post(`/api/missions/${missionId}/vehicles`).send({ name: vehicleName, spec: fixtureJson(file) });
      return vehicleSavedSchema.parse(res.body).revision.id;
    };
    corvinaRevisionId = await makeVehicle(corvina, 'vehicles/corvina-2.vehicle.json', 'Corvina-2 (scenario test)');
    halyardRevisionId = await makeVehicle(halyard, 'vehicles/halyard-1.vehicle.json', 'Halyard-1 (scenario test)');
    const profile = Buffer.from(fixtureText('uploads/corvina-2-yaw-follow.attitude.csv'));
    const uploadProfile = async (missionId: string) =>
      attitudeProfileUploadResultSchema.parse((await engineer.post(`/api/missions/${missionId}/uploads/attitude-profile`).attach('file', profile, 'yaw.csv')).body).upload.id;
    corvinaProfileId = await uploadProfile(corvina);
    halyardProfileId = await uploadProfile(halyard);
    const plates = await engineer
      .post(`/api/missions/${corvina}/uploads/plate-set`)
      .field('name', 'Corvina-2 plates (scenario test)')
      .field('massKg', '4200')
      .attach('file', Buffer.from(fixtureText('uploads/corvina-2.plates.csv')), 'plates.csv');
    corvinaPlateUploadId = plateSetUploadResultSchema.parse(plates.body).upload.id;
  });
  afterAll(() => api.close());

  it('an engineer creates a scenario from the demo file with its vehicle named by revision id, audited', async () => {
    const spec = scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId);
    const res = await (await api.signedIn('engineer')).post(scenariosPath()).send({ name, spec });
    expect(res.status).toBe(201);
    const detail = scenarioDetailSchema.parse(res.body);
    scenarioId = detail.id;
    expect(detail).toMatchObject({
      name,
      vehicleRevisionId: corvinaRevisionId,
      vehicle: { name: 'Corvina-2 (scenario test)', revision: 1 },
      centralBody: 'earth',
      spanDays: 30,
      attitudeLaw: 'lvlh',
      runCount: 0,
      author: { displayName: 'Ines Okafor' },
    });
    expect(detail.spec.orbit).toEqual(spec.orbit);
    expect(detail.spec.vehicle).toEqual({ ref: corvinaRevisionId });
    expect(await count('SELECT count(*) AS n FROM scenarios WHERE id = :scenarioId AND vehicle_revision_id = :corvinaRevisionId', { scenarioId, corvinaRevisionId })).toBe(1);
    expect(await count(`SELECT count(*) AS n FROM audit_log WHERE entity_id = :scenarioId AND action = 'scenario-created'`, { scenarioId })).toBe(1);
    const listed = scenarioListSchema.parse((await (await api.signedIn('reviewer')).get(scenariosPath())).body).scenarios;
    expect(listed.map((s) => s.id)).toContain(scenarioId);
  });

  it('a second scenario with the same name is a 409 on name', async () => {
    const spec = scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId);
    const res = await (await api.signedIn('lead')).post(scenariosPath()).send({ name, spec });
    expect(res.status).toBe(409);
    expect(fieldsOf(res.body)).toHaveProperty('name');
  });

  it('a vehicle revision of another mission, an unknown one, or an inline vehicle is refused on spec.vehicle.ref', async () => {
    const engineer = await api.signedIn('engineer');
    const before = await count('SELECT count(*) AS n FROM scenarios');
    const refs = [{ ref: halyardRevisionId }, { ref: '00000000-0000-4000-8000-000000000000' }, { ref: 'corvina.vehicle.json' }, fixtureJson('vehicles/corvina-2.vehicle.json')];
    for (const vehicle of refs) {
      const spec = { ...scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId), vehicle };
      const res = await engineer.post(scenariosPath()).send({ name: 'refused', spec });
      expect(res.status, JSON.stringify(vehicle).slice(0, 60)).toBe(400);
      expect(fieldsOf(res.body)).toHaveProperty(['spec.vehicle.ref']);
    }
    expect(await count('SELECT count(*) AS n FROM scenarios')).toBe(before);
  });

  it('requirements in the spec are refused on spec.requirements', async () => {
    const spec = { ...fixtureJson('scenarios/corvina-2-geo-30d.scenario.json'), vehicle: { ref: corvinaRevisionId } };
    const res = await (await api.signedIn('lead')).post(scenariosPath()).send({ name: 'with requirements', spec });
    expect(res.status).toBe(400);
    expect(fieldsOf(res.body)).toHaveProperty(['spec.requirements']);
  });

  it('the central body must fit the mission regime', async () => {
    const engineer = await api.signedIn('engineer');
    const helio = scenarioFile('scenarios/halyard-1-spiral.scenario.json', corvinaRevisionId);
    const inEarthMission = await engineer.post(scenariosPath()).send({ name: 'heliocentric in GEO mission', spec: helio });
    expect(inEarthMission.status).toBe(400);
    expect(fieldsOf(inEarthMission.body)).toHaveProperty(['spec.orbit.centralBody']);

    const geo = scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', halyardRevisionId);
    const inSunMission = await engineer.post(`/api/missions/${halyard}/scenarios`).send({ name: 'GEO in sail mission', spec: geo });
    expect(inSunMission.status).toBe(400);
    expect(fieldsOf(inSunMission.body)).toHaveProperty(['spec.orbit.centralBody']);

    const sail = await engineer.post(`/api/missions/${halyard}/scenarios`).send({ name: 'Spiral (scenario test)', spec: scenarioFile('scenarios/halyard-1-spiral.scenario.json', halyardRevisionId) });
    expect(sail.status).toBe(201);
  });

  it('an edit to a tabulated attitude must name an attitude profile uploaded to this mission; the audit line says what changed', async () => {
    const engineer = await api.signedIn('engineer');
    const base = scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId);
    const put = (profileId: string) =>
      engineer.put(`${scenariosPath()}/${scenarioId}`).send({ name, spec: { ...base, attitude: { law: 'tabulated', profileId, outside: 'clamp' } } });
    for (const wrong of [halyardProfileId, corvinaPlateUploadId]) {
      const res = await put(wrong);
      expect(res.status).toBe(400);
      expect(fieldsOf(res.body)).toHaveProperty(['spec.attitude.profileId']);
    }
    const ok = await put(corvinaProfileId);
    expect(ok.status).toBe(200);
    expect(scenarioDetailSchema.parse(ok.body).spec.attitude).toEqual({ law: 'tabulated', profileId: corvinaProfileId, outside: 'clamp' });

    const renamed = await engineer.put(`${scenariosPath()}/${scenarioId}`).send({ name: `${name} (renamed)`, spec: { ...base, spanDays: 2 } });
    expect(renamed.status).toBe(200);
    expect(scenarioDetailSchema.parse(renamed.body)).toMatchObject({ name: `${name} (renamed)`, spanDays: 2, attitudeLaw: 'lvlh' });

    const lines = await api.sequelize.query<{ detail: { changed: string[] } }>(
      `SELECT detail FROM audit_log WHERE entity_id = :scenarioId AND action = 'scenario-updated' ORDER BY id`,
      { type: QueryTypes.SELECT, replacements: { scenarioId } },
    );
    expect(lines.map((l) => l.detail.changed)).toEqual([['spec.attitude'], ['name', 'spec.attitude', 'spec.spanDays']]);
  });

  it('a scenario with a run cannot be deleted (409); one without runs is deleted, audited', async () => {
    const engineer = await api.signedIn('engineer');
    const [scenario] = await api.sequelize.query<{ spec: unknown }>('SELECT spec FROM scenarios WHERE id = :scenarioId', { type: QueryTypes.SELECT, replacements: { scenarioId } });
    await api.sequelize.query(
      'INSERT INTO runs (mission_id, scenario_id, vehicle_revision_id, scenario_spec) VALUES (:corvina, :scenarioId, :corvinaRevisionId, :spec)',
      { replacements: { corvina, scenarioId, corvinaRevisionId, spec: JSON.stringify(scenario!.spec) } },
    );
    const refused = await engineer.delete(`${scenariosPath()}/${scenarioId}`);
    expect(refused.status).toBe(409);
    const detail = scenarioDetailSchema.parse((await engineer.get(`${scenariosPath()}/${scenarioId}`)).body);
    expect(detail.runCount).toBe(1);

    const spare = await engineer.post(scenariosPath()).send({ name: 'spare (scenario test)', spec: scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId) });
    const spareId = scenarioDetailSchema.parse(spare.body).id;
    expect((await engineer.delete(`${scenariosPath()}/${spareId}`)).status).toBe(204);
    expect((await engineer.get(`${scenariosPath()}/${spareId}`)).status).toBe(404);
    expect(await count(`SELECT count(*) AS n FROM audit_log WHERE entity_id = :spareId AND action = 'scenario-deleted'`, { spareId })).toBe(1);
  });

  it.each<Role>(['reviewer', 'admin'])('a %s reads scenarios (200) and is refused every write (403)', async (role) => {
    const agent = await api.signedIn(role);
    expect((await agent.get(scenariosPath())).status).toBe(200);
    expect((await agent.get(`${scenariosPath()}/${scenarioId}`)).status).toBe(200);
    const spec = scenarioFile('scenarios/corvina-2-geo-30d.scenario.json', corvinaRevisionId);
    expect((await agent.post(scenariosPath()).send({ name: `by ${role}`, spec })).status).toBe(403);
    expect((await agent.put(`${scenariosPath()}/${scenarioId}`).send({ name: `by ${role}`, spec })).status).toBe(403);
    expect((await agent.delete(`${scenariosPath()}/${scenarioId}`)).status).toBe(403);
    expect(await count(`SELECT count(*) AS n FROM scenarios WHERE name = :n`, { n: `by ${role}` })).toBe(0);
  });

  it('a reviewer gets 404 for the scenarios of halyard-1, which they do not belong to', async () => {
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(`/api/missions/${halyard}/scenarios`)).status).toBe(404);
    // A corvina-2 scenario is not found through halyard-1, even by a member of both.
    expect((await (await api.signedIn('engineer')).get(`/api/missions/${halyard}/scenarios/${scenarioId}`)).status).toBe(404);
  });
});
