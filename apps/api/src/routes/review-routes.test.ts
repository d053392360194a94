/**
 * Review and approval of a run's budget: every transition × every caller (status by role and by
 * state), the audit trail, mail queued for the right people even with the SMTP relay down, and
 * that an approval stays frozen (its hash still matches) when the scenario is edited afterwards.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type request from 'supertest';
import { reviewSchema, type ReviewAction, type ReviewState, type Role } from '@photon-ledger/shared';
import { startApi, demoMissionIds, type ApiHarness } from '../../test/api-harness';
import { storeRun } from '../../test/stored-run';
import { AuditEntryModel, RunModel, RunResultModel, VehicleRevisionModel } from '../models';
import { canonicalJson, sha256 } from '../services/review-service';

type Agent = ReturnType<typeof request.agent>;
type Who = Role | 'non-member';
const everyone: Who[] = ['admin', 'engineer', 'lead', 'reviewer', 'non-member'];

describe('reviews of run budgets', () => {
  let api: ApiHarness;
  const agents = {} as Record<Role, Agent>;
  let corvina = '';
  let halyard = '';

  beforeAll(async () => {
    // A relay that is down: requests must still succeed, with the mail left on the queue.
    api = await startApi({ PL_SMTP_URL: 'smtp://127.0.0.1:9' });
    for (const role of ['admin', 'engineer', 'lead', 'reviewer'] as const) agents[role] = await api.signedIn(role);
    ({ corvina, halyard } = await demoMissionIds(api));
  }, 60_000);

  afterAll(async () => {
    await api?.close();
  });

  const newRun = async (missionId = corvina) => (await storeRun(api.sequelize, { missionId, spanDays: 0.05, outputStepS: 900 })).runId;
  const url = (missionId: string, runId: string, action?: ReviewAction) => `/api/missions/${missionId}/reviews/budget/${runId}${action ? `/${action}` : ''}`;
  const bodyFor = (action: ReviewAction) => (action === 'send-back' ? { reason: 'Please use the measured wing optics.' } : {});

  /** Brings a fresh run's review to `state` through the API. */
  async function runIn(state: ReviewState, missionId = corvina): Promise<string> {
    const runId = await newRun(missionId);
    if (state === 'draft') return runId;
    expect((await agents.engineer.post(url(missionId, runId, 'submit')).send({})).status).toBe(200);
    if (state === 'approved') expect((await agents.lead.post(url(missionId, runId, 'approve')).send({})).status).toBe(200);
    if (state === 'changes-requested') expect((await agents.lead.post(url(missionId, runId, 'send-back')).send(bodyFor('send-back'))).status).toBe(200);
    return runId;
  }

  const allowedRoles: Record<ReviewAction, Role[]> = { submit: ['engineer', 'lead'], approve: ['lead'], 'send-back': ['lead'] };
  const validFrom: Record<ReviewAction, ReviewState[]> = { submit: ['draft', 'changes-requested'], approve: ['in-review'], 'send-back': ['in-review'] };
  const states: ReviewState[] = ['draft', 'in-review', 'approved', 'changes-requested'];

  it('answers every transition × caller × starting state as the rules say', async () => {
    const wrong: string[] = [];
    const table: string[] = [];
    for (const action of ['submit', 'approve', 'send-back'] as const) {
      for (const from of states) {
        const cells: string[] = [];
        for (const who of everyone) {
          // The non-member is the reviewer on halyard-1, where they are not a member.
          const missionId = who === 'non-member' ? halyard : corvina;
          const role: Role = who === 'non-member' ? 'reviewer' : who;
          const runId = await runIn(from, missionId);
          const res = await agents[role].post(url(missionId, runId, action)).send(bodyFor(action));
          const expected = who === 'non-member' ? 404 : !allowedRoles[action].includes(role) ? 403 : validFrom[action].includes(from) ? 200 : 409;
          cells.push(`${who}=${res.status}`);
          if (res.status !== expected) wrong.push(`${action} from ${from} as ${who}: expected ${expected}, got ${res.status} ${JSON.stringify(res.body)}`);
          // A refused transition changes nothing; an accepted one lands on its target state.
          const after = reviewSchema.parse((await agents.engineer.get(url(missionId, runId))).body);
          const target: ReviewState = action === 'submit' ? 'in-review' : action === 'approve' ? 'approved' : 'changes-requested';
          if (after.state !== (res.status === 200 ? target : from)) wrong.push(`${action} from ${from} as ${who}: state is ${after.state} afterwards`);
        }
        table.push(`${action.padEnd(10)} from ${from.padEnd(18)} ${cells.join(' ')}`);
      }
    }
    console.log(`review transitions:\n${table.join('\n')}`);
    expect(wrong).toEqual([]);
  }, 240_000);

  it('moves through the states, records who and why, and audits every change', async () => {
    const runId = await newRun();
    const draft = reviewSchema.parse((await agents.reviewer.get(url(corvina, runId))).body);
    expect(draft.state).toBe('draft');

    const submitted = reviewSchema.parse((await agents.engineer.post(url(corvina, runId, 'submit')).send({ note: 'first pass' })).body);
    expect(submitted).toMatchObject({ state: 'in-review', note: 'first pass', submittedBy: { email: 'ines.okafor@ostrander-vale.example' } });

    const noReason = await agents.lead.post(url(corvina, runId, 'send-back')).send({});
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields).toHaveProperty('reason');
    const blankReason = await agents.lead.post(url(corvina, runId, 'send-back')).send({ reason: '   ' });
    expect(blankReason.status).toBe(400);

    const back = reviewSchema.parse((await agents.lead.post(url(corvina, runId, 'send-back')).send({ reason: 'Margins use last year’s optics.' })).body);
    expect(back).toMatchObject({ state: 'changes-requested', reason: 'Margins use last year’s optics.', decidedBy: { email: 'teodor.lindqvist@ostrander-vale.example' }, frozen: null });

    await agents.engineer.post(url(corvina, runId, 'submit')).send({});
    const approved = reviewSchema.parse((await agents.lead.post(url(corvina, runId, 'approve')).send({})).body);
    expect(approved.state).toBe('approved');
    expect(approved.frozen?.ids).toMatchObject({ runId });
    expect(approved.intact).toBe(true);

    const audit = await AuditEntryModel.findAll({ where: { entityType: 'budget', entityId: runId }, order: [['id', 'ASC']] });
    expect(audit.map((a) => `${a.action}:${String(a.detail.from)}->${String(a.detail.to)}`)).toEqual([
      'review-submitted:draft->in-review',
      'review-sent-back:in-review->changes-requested',
      'review-submitted:changes-requested->in-review',
      'review-approved:in-review->approved',
    ]);
    expect(audit[1]!.detail.reason).toBe('Margins use last year’s optics.');

    const list = await agents.reviewer.get(`/api/missions/${corvina}/reviews?state=approved`);
    expect(list.status).toBe(200);
    expect(list.body.reviews.map((r: { subjectId: string }) => r.subjectId)).toContain(runId);
  });

  it('refuses a run without a budget (409), unknown runs and runs of another mission (404)', async () => {
    const { runId } = await storeRun(api.sequelize, { missionId: corvina, status: 'failed', spanDays: 0.05 });
    expect((await agents.engineer.post(url(corvina, runId, 'submit')).send({})).status).toBe(409);
    expect((await agents.engineer.post(url(corvina, randomUUID(), 'submit')).send({})).status).toBe(404);
    const foreign = await newRun(halyard);
    expect((await agents.engineer.post(url(corvina, foreign, 'submit')).send({})).status).toBe(404);
    expect((await agents.engineer.get(`/api/missions/${corvina}/reviews/study/${randomUUID()}`)).status).toBe(404);
    expect((await agents.engineer.get(`/api/missions/${corvina}/reviews/plan/${runId}`)).status).toBe(400);
  });

  it('keeps an approval frozen: a later scenario edit leaves the approved snapshot and hash intact', async () => {
    const stored = await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.05, outputStepS: 900 });
    await agents.engineer.post(url(corvina, stored.runId, 'submit')).send({});
    const approved = reviewSchema.parse((await agents.lead.post(url(corvina, stored.runId, 'approve')).send({})).body);

    // The hash is what the test computes itself from the stored rows.
    const hashNow = async () => {
      const run = (await RunModel.findByPk(stored.runId))!;
      const result = (await RunResultModel.findByPk(stored.runId))!;
      const revision = (await VehicleRevisionModel.findByPk(run.vehicleRevisionId))!;
      return sha256(
        canonicalJson({
          vehicleRevision: { id: revision.id, spec: revision.spec },
          scenario: { id: run.scenarioId, spec: run.scenarioSpec },
          run: { id: run.id, summary: result.summary, budget: result.budget },
        }),
      );
    };
    expect(approved.frozen?.contentHash).toBe(await hashNow());
    expect(approved.frozen?.ids).toEqual({ runId: stored.runId, scenarioId: stored.scenarioId, vehicleRevisionId: stored.vehicleRevisionId });

    // Edit the scenario the approved run was made from.
    const scenario = (await agents.engineer.get(`/api/missions/${corvina}/scenarios/${stored.scenarioId}`)).body as { name: string; spec: Record<string, unknown> };
    const edited = await agents.engineer
      .put(`/api/missions/${corvina}/scenarios/${stored.scenarioId}`)
      .send({ name: scenario.name, spec: { ...scenario.spec, requirements: [], description: 'edited after approval', spanDays: 0.04 } });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect((await agents.engineer.get(`/api/missions/${corvina}/scenarios/${stored.scenarioId}`)).body.spec.description).toBe('edited after approval');

    const after = reviewSchema.parse((await agents.reviewer.get(url(corvina, stored.runId))).body);
    expect(after.state).toBe('approved');
    expect(after.frozen).toEqual(approved.frozen);
    expect(after.intact).toBe(true);
    expect(await hashNow()).toBe(approved.frozen?.contentHash);
    expect((await RunModel.findByPk(stored.runId))!.scenarioSpec).toEqual(stored.scenario);

    // The check can fail: content changed behind the API's back no longer matches.
    await api.sequelize.query(`UPDATE run_results SET budget = jsonb_set(budget, '{tampered}', 'true') WHERE run_id = :id`, { replacements: { id: stored.runId } });
    expect(reviewSchema.parse((await agents.reviewer.get(url(corvina, stored.runId))).body).intact).toBe(false);
  });

  it('queues mail for the leads and the submitter even while the relay is down', async () => {
    const runId = await newRun();
    const submit = await agents.engineer.post(url(corvina, runId, 'submit')).send({});
    expect(submit.status).toBe(200);
    const back = await agents.lead.post(url(corvina, runId, 'send-back')).send({ reason: 'Recheck the eclipse model.' });
    expect(back.status).toBe(200);
    const all = (
      await api.sequelize.query<{ data: { to: string[]; subject: string; text: string } }>(
        `SELECT data FROM pgboss.job WHERE name = 'send-mail' AND data->>'subject' LIKE :pattern ORDER BY created_on`,
        { replacements: { pattern: `%${runId.slice(0, 8)}%` }, type: QueryTypes.SELECT },
      )
    ).map((j) => j.data);
    expect(all).toHaveLength(2);
    const requested = all.find((m) => m.subject.includes('Review requested'));
    const decided = all.find((m) => m.subject.includes('Changes requested'));
    expect(requested?.to).toEqual(['teodor.lindqvist@ostrander-vale.example']);
    expect(decided?.to).toEqual(['ines.okafor@ostrander-vale.example']);
    expect(decided?.text).toContain('Recheck the eclipse model.');
  });
});
