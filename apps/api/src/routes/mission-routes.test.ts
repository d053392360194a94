import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { apiErrorSchema, missionDetailSchema, missionListSchema, type Role } from '@photon-ledger/shared';
import { startApi, type ApiHarness } from '../../test/api-harness';

describe('missions and membership', () => {
  let api: ApiHarness;
  let ids: Record<string, string>;
  beforeAll(async () => {
    api = await startApi();
    const admin = await api.signedIn('admin');
    const list = missionListSchema.parse((await admin.get('/api/missions')).body);
    ids = Object.fromEntries(list.missions.map((m) => [m.slug, m.id]));
  });
  afterAll(() => api.close());

  const slugsSeenBy = async (role: Role) => {
    const res = await (await api.signedIn(role)).get('/api/missions');
    expect(res.status).toBe(200);
    return missionListSchema.parse(res.body).missions.map((m) => m.slug);
  };

  it('without a session the mission list answers 401', async () => {
    const res = await request(api.baseUrl).get('/api/missions');
    expect(res.status).toBe(401);
    expect(apiErrorSchema.parse(res.body).error.code).toBe('unauthenticated');
  });

  it('the engineer sees both demo missions; the reviewer only the one they belong to', async () => {
    expect(await slugsSeenBy('engineer')).toEqual(expect.arrayContaining(['corvina-2', 'halyard-1']));
    const reviewer = await slugsSeenBy('reviewer');
    expect(reviewer).toContain('corvina-2');
    expect(reviewer).not.toContain('halyard-1');
  });

  it('the list filters by regime and by a search text', async () => {
    const agent = await api.signedIn('engineer');
    const helio = missionListSchema.parse((await agent.get('/api/missions?regime=heliocentric')).body);
    expect(helio.missions.map((m) => m.slug)).toEqual(['halyard-1']);
    const found = missionListSchema.parse((await agent.get('/api/missions?q=CORVINA')).body);
    expect(found.missions.map((m) => m.slug)).toEqual(['corvina-2']);
  });

  it('a bad query answers 400 naming the field', async () => {
    const res = await (await api.signedIn('engineer')).get('/api/missions?regime=lunar');
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('regime');
  });

  it('a member reads a mission with its members', async () => {
    const res = await (await api.signedIn('reviewer')).get(`/api/missions/${ids['corvina-2']}`);
    expect(res.status).toBe(200);
    const detail = missionDetailSchema.parse(res.body);
    expect(detail.members.map((m) => m.role).sort()).toEqual(['engineer', 'lead', 'reviewer']);
  });

  it('a mission the user does not belong to answers 404, like an unknown one', async () => {
    const reviewer = await api.signedIn('reviewer');
    const foreign = await reviewer.get(`/api/missions/${ids['halyard-1']}`);
    expect(foreign.status).toBe(404);
    const unknown = await reviewer.get('/api/missions/00000000-0000-4000-8000-000000000000');
    expect(unknown.status).toBe(404);
    expect(foreign.body).toEqual(unknown.body);
  });

  it('a malformed mission id answers 400 naming missionId', async () => {
    const res = await (await api.signedIn('engineer')).get('/api/missions/not-a-uuid');
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty('missionId');
  });

  it.each<Role>(['engineer', 'reviewer'])('creating a mission as %s is refused with 403', async (role) => {
    const res = await (await api.signedIn(role))
      .post('/api/missions')
      .send({ slug: `refused-${role}`, name: 'Refused', regime: 'earth-orbit' });
    expect(res.status).toBe(403);
    expect(apiErrorSchema.parse(res.body).error.code).toBe('forbidden');
  });

  it('a lead creating a mission with bad fields gets 400 with each field named, and nothing is stored', async () => {
    const lead = await api.signedIn('lead');
    const res = await lead.post('/api/missions').send({ slug: 'Bad Slug!', name: '', regime: 'mars-orbit' });
    expect(res.status).toBe(400);
    const fields = apiErrorSchema.parse(res.body).error.fields ?? {};
    expect(Object.keys(fields).sort()).toEqual(['name', 'regime', 'slug']);
    expect(await slugsSeenBy('admin')).not.toContain('bad-slug');
  });

  it('a lead creates a mission, becomes its member, and a second one with the same slug is a 409 on slug', async () => {
    const lead = await api.signedIn('lead');
    const body = { slug: 'wren-test-mission', name: 'Wren test mission', regime: 'earth-orbit', summary: 'test' };
    const created = await lead.post('/api/missions').send(body);
    expect(created.status).toBe(201);
    expect(await slugsSeenBy('lead')).toContain('wren-test-mission');
    expect(await slugsSeenBy('engineer')).not.toContain('wren-test-mission');
    const again = await lead.post('/api/missions').send(body);
    expect(again.status).toBe(409);
    expect(apiErrorSchema.parse(again.body).error.fields).toHaveProperty('slug');
  });

  it('only an admin manages membership', async () => {
    const admin = await api.signedIn('admin');
    const users = (await admin.get('/api/users')).body.users as { id: string; role: Role }[];
    const reviewerId = users.find((u) => u.role === 'reviewer')!.id;
    const path = `/api/missions/${ids['halyard-1']}/members`;

    const asLead = await (await api.signedIn('lead')).post(path).send({ userId: reviewerId });
    expect(asLead.status).toBe(403);
    expect((await (await api.signedIn('lead')).get('/api/users')).status).toBe(403);

    expect((await admin.post(path).send({ userId: reviewerId })).status).toBe(204);
    expect(await slugsSeenBy('reviewer')).toContain('halyard-1');
    expect((await admin.delete(`${path}/${reviewerId}`)).status).toBe(204);
    expect(await slugsSeenBy('reviewer')).not.toContain('halyard-1');
  });

  it('an unknown API route answers 404 in the shared error shape', async () => {
    const res = await (await api.signedIn('engineer')).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(apiErrorSchema.parse(res.body).error.code).toBe('not_found');
  });
});
