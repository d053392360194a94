import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  apiErrorSchema,
  attitudeProfileUploadResultSchema,
  auditPageSchema,
  scenarioDetailSchema,
  vehicleSavedSchema,
  type AuditEntry,
  type Role,
} from '@photon-ledger/shared';
import { demoMissionIds, startApi, type ApiHarness } from '../../test/api-harness';

const fixtureText = (path: string) => readFileSync(new URL(`../../../../fixtures/${path}`, import.meta.url), 'utf8');

describe('the mission audit log', () => {
  let api: ApiHarness;
  let corvina: string;
  let halyard: string;
  /** entity id -> actions written by this file's set-up, in order. */
  const written: [action: string, entityId: string, by: string][] = [];
  const auditPath = () => `/api/missions/${corvina}/audit`;

  beforeAll(async () => {
    api = await startApi();
    ({ corvina, halyard } = await demoMissionIds(api));

    const engineer = await api.signedIn('engineer');
    const lead = await api.signedIn('lead');
    const spec = JSON.parse(fixtureText('vehicles/corvina-2.vehicle.json')) as Record<string, unknown>;
    const created = vehicleSavedSchema.parse((await engineer.post(`/api/missions/${corvina}/vehicles`).send({ name: 'Corvina-2 (audit test)', spec })).body);
    written.push(['vehicle-created', created.vehicle.id, 'Ines Okafor']);
    const revised = await lead.post(`/api/missions/${corvina}/vehicles/${created.vehicle.id}/revisions`).send({ spec: { ...spec, massKg: 4250 }, basedOnRevision: 1, note: 'fuel load' });
    expect(revised.status).toBe(201);
    written.push(['vehicle-revision-created', created.vehicle.id, 'Teodor Lindqvist']);
    const profile = attitudeProfileUploadResultSchema.parse(
      (await engineer.post(`/api/missions/${corvina}/uploads/attitude-profile`).attach('file', Buffer.from(fixtureText('uploads/corvina-2-yaw-follow.attitude.csv')), 'yaw.csv')).body,
    );
    written.push(['upload-created', profile.upload.id, 'Ines Okafor']);
    const { requirements: _r, ...scenario } = JSON.parse(fixtureText('scenarios/corvina-2-geo-30d.scenario.json')) as Record<string, unknown>;
    const body = { name: 'audit test scenario', spec: { ...scenario, vehicle: { ref: created.revision.id } } };
    const made = scenarioDetailSchema.parse((await engineer.post(`/api/missions/${corvina}/scenarios`).send(body)).body);
    written.push(['scenario-created', made.id, 'Ines Okafor']);
    expect((await engineer.put(`/api/missions/${corvina}/scenarios/${made.id}`).send({ ...body, spec: { ...body.spec, spanDays: 1 } })).status).toBe(200);
    written.push(['scenario-updated', made.id, 'Ines Okafor']);
    expect((await lead.delete(`/api/missions/${corvina}/scenarios/${made.id}`)).status).toBe(204);
    written.push(['scenario-deleted', made.id, 'Teodor Lindqvist']);
  });
  afterAll(() => api.close());

  const readAll = async (role: Role, limit: number): Promise<AuditEntry[]> => {
    const agent = await api.signedIn(role);
    const entries: AuditEntry[] = [];
    let before: string | null = null;
    for (let page = 0; page < 1000; page += 1) {
      const res = await agent.get(auditPath()).query({ limit, ...(before ? { before } : {}) });
      expect(res.status).toBe(200);
      const parsed = auditPageSchema.parse(res.body);
      expect(parsed.entries.length).toBeLessThanOrEqual(limit);
      entries.push(...parsed.entries);
      before = parsed.nextBefore;
      if (before === null) break;
    }
    return entries;
  };

  it('every write of the set-up has its line, newest first, with the display name of who made it', async () => {
    const entries = (await readAll('reviewer', 200)).filter((e) => written.some(([, id]) => id === e.entityId));
    expect(entries.map((e) => [e.action, e.entityId, e.user?.displayName])).toEqual([...written].reverse());
    const revision = entries.find((e) => e.action === 'vehicle-revision-created')!;
    expect(revision.detail).toMatchObject({ revision: 2, basedOnRevision: 1, note: 'fuel load', changed: ['changed massKg'] });
  });

  it('paging by id with a small limit gives the same lines as one big page, strictly newest first', async () => {
    const whole = await readAll('engineer', 200);
    const paged = await readAll('engineer', 2);
    expect(paged.map((e) => e.id)).toEqual(whole.map((e) => e.id));
    const ids = whole.map((e) => BigInt(e.id));
    expect(ids.every((id, i) => i === 0 || id < ids[i - 1]!)).toBe(true);
  });

  it('another mission shows none of these lines', async () => {
    const res = await (await api.signedIn('engineer')).get(`/api/missions/${halyard}/audit?limit=200`);
    expect(res.status).toBe(200);
    const ids = new Set(written.map(([, id]) => id));
    expect(auditPageSchema.parse(res.body).entries.filter((e) => ids.has(e.entityId))).toEqual([]);
  });

  it('a bad limit or before is a 400 naming the field', async () => {
    const agent = await api.signedIn('engineer');
    const res = await agent.get(`${auditPath()}?limit=0&before=abc`);
    expect(res.status).toBe(400);
    expect(Object.keys(apiErrorSchema.parse(res.body).error.fields ?? {}).sort()).toEqual(['before', 'limit']);
  });

  it('an admin reads it; a reviewer who is not a member of halyard-1 gets 404 there; nobody writes to it', async () => {
    expect((await (await api.signedIn('admin')).get(auditPath())).status).toBe(200);
    const reviewer = await api.signedIn('reviewer');
    expect((await reviewer.get(`/api/missions/${halyard}/audit`)).status).toBe(404);
    expect((await (await api.signedIn('lead')).post(auditPath()).send({ action: 'forged' })).status).toBe(404);
  });
});
