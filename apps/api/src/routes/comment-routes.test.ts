/** Threaded comments on a run's budget (and its lines): who may write, mentions, resolve, edit. */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { commentListSchema, commentSchema, type Role } from '@photon-ledger/shared';
import { startApi, demoMissionIds, type ApiHarness } from '../../test/api-harness';
import { storeRun } from '../../test/stored-run';
import { mentionedLocalParts } from '../services/comment-service';

type Agent = ReturnType<typeof request.agent>;

describe('comments', () => {
  let api: ApiHarness;
  const agents = {} as Record<Role, Agent>;
  let corvina = '';
  let halyard = '';
  let runId = '';

  beforeAll(async () => {
    api = await startApi();
    for (const role of ['admin', 'engineer', 'lead', 'reviewer'] as const) agents[role] = await api.signedIn(role);
    ({ corvina, halyard } = await demoMissionIds(api));
    runId = (await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.05, outputStepS: 900 })).runId;
  }, 60_000);

  afterAll(async () => {
    await api?.close();
  });

  const path = () => `/api/missions/${corvina}/comments`;

  it('finds @mentions by e-mail local part, not inside addresses', () => {
    expect(mentionedLocalParts('@teodor.lindqvist please check; cc @mara.castellanos.')).toEqual(['teodor.lindqvist', 'mara.castellanos']);
    expect(mentionedLocalParts('mail ines.okafor@ostrander-vale.example')).toEqual([]);
  });

  it('threads replies, records mentions, and lets any commenter resolve and reopen', async () => {
    const top = await agents.reviewer.post(path()).send({ subjectType: 'budget', subjectId: runId, lineKey: 'srp.accel.max', body: 'Is the margin on @ines.okafor’s line real?' });
    expect(top.status, JSON.stringify(top.body)).toBe(201);
    const parent = commentSchema.parse(top.body);
    expect(parent.mentions.map((m) => m.email)).toEqual(['ines.okafor@ostrander-vale.example']);
    expect(parent.author?.email).toBe('mara.castellanos@ostrander-vale.example');

    const members = (await agents.engineer.get(`/api/missions/${corvina}`)).body.members as { userId: string; role: Role }[];
    const leadId = members.find((m) => m.role === 'lead')!.userId;
    const reply = await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: runId, lineKey: 'srp.accel.max', parentId: parent.id, body: 'Yes, from the measured optics.', mentionUserIds: [leadId] });
    expect(reply.status).toBe(201);
    expect(commentSchema.parse(reply.body)).toMatchObject({ parentId: parent.id, mentions: [{ id: leadId }] });

    const resolved = await agents.lead.post(`${path()}/${parent.id}/resolve`).send({ resolved: true });
    expect(resolved.status).toBe(200);
    expect(commentSchema.parse(resolved.body)).toMatchObject({ resolved: true, resolvedBy: { id: leadId } });
    const reopened = commentSchema.parse((await agents.reviewer.post(`${path()}/${parent.id}/resolve`).send({ resolved: false })).body);
    expect(reopened).toMatchObject({ resolved: false, resolvedBy: null });

    const list = commentListSchema.parse((await agents.reviewer.get(`${path()}?subjectType=budget&subjectId=${runId}`)).body);
    expect(list.comments.map((c) => c.id)).toEqual([parent.id, reply.body.id]);
    const otherLine = commentListSchema.parse((await agents.reviewer.get(`${path()}?subjectType=budget&subjectId=${runId}&lineKey=torque.max`)).body);
    expect(otherLine.comments).toEqual([]);
  });

  it('only mentions members, checks the parent and the subject', async () => {
    // The reviewer is not a member of halyard-1; nobody there is called "nobody".
    const outsider = await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: runId, body: 'ping @nobody.here' });
    expect(outsider.status).toBe(400);
    expect(outsider.body.error.fields.body).toContain('@nobody.here');
    const admins = (await agents.admin.get('/api/users')).body.users as { id: string; role: Role }[];
    const adminId = admins.find((u) => u.role === 'admin')!.id;
    const members = (await agents.admin.get(`/api/missions/${corvina}`)).body.members as { userId: string }[];
    if (!members.some((m) => m.userId === adminId)) {
      const byId = await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: runId, body: 'ping', mentionUserIds: [adminId] });
      expect(byId.status).toBe(400);
      expect(byId.body.error.fields).toHaveProperty('mentionUserIds.0');
    }
    const badParent = await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: runId, parentId: randomUUID(), body: 'reply' });
    expect(badParent.status).toBe(400);
    expect(badParent.body.error.fields).toHaveProperty('parentId');
    expect((await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: randomUUID(), body: 'x' })).status).toBe(404);
    const foreignRun = (await storeRun(api.sequelize, { missionId: halyard, spanDays: 0.05, outputStepS: 900 })).runId;
    expect((await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: foreignRun, body: 'x' })).status).toBe(404);
    const empty = await agents.engineer.post(path()).send({ subjectType: 'budget', subjectId: runId, body: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toHaveProperty('body');
  });

  it('lets reviewers comment but not admins; only the author edits the text', async () => {
    expect((await agents.admin.post(path()).send({ subjectType: 'budget', subjectId: runId, body: 'admin note' })).status).toBe(403);
    const mine = commentSchema.parse((await agents.reviewer.post(path()).send({ subjectType: 'budget', subjectId: runId, body: 'tyop' })).body);
    expect((await agents.engineer.put(`${path()}/${mine.id}`).send({ body: 'not yours' })).status).toBe(403);
    const fixed = await agents.reviewer.put(`${path()}/${mine.id}`).send({ body: 'typo' });
    expect(fixed.status).toBe(200);
    expect(fixed.body.body).toBe('typo');
    // Reviewers still may not change inputs.
    const runs = await agents.reviewer.post(`/api/missions/${corvina}/runs`).send({ scenarioId: randomUUID() });
    expect(runs.status).toBe(403);
  });
});
