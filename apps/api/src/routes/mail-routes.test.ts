/**
 * E-mail end to end: a capture SMTP server on port 0, the API with one in-process worker pointed
 * at it, and the messages that reach it (recipients, subject, text); the administrators' list of
 * captured mail; the long-run notice.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openQueue } from '../jobs/queue';
import { SEND_MAIL_QUEUE } from '../services/mail-service';
import type request from 'supertest';
import { mailListSchema, type Role } from '@photon-ledger/shared';
import { startApi, demoMissionIds, type ApiHarness } from '../../test/api-harness';
import { storeRun } from '../../test/stored-run';
import { RunModel } from '../models';
import { startMailCapture, storeCapturedMail, parseMessage, type CapturedMail, type MailCapture } from '../services/mail-capture';
import { deliverMail } from '../services/mail-delivery';

type Agent = ReturnType<typeof request.agent>;

describe('e-mail notifications through a capture SMTP server', () => {
  let api: ApiHarness;
  let capture: MailCapture;
  const received: CapturedMail[] = [];
  const agents = {} as Record<Role, Agent>;
  let corvina = '';
  const saved: Record<string, string | undefined> = {};

  beforeAll(async () => {
    capture = await startMailCapture({
      port: 0,
      onMessage: async (mail) => {
        received.push(mail);
        await storeCapturedMail(mail);
      },
    });
    // The worker reads its mail settings from its environment, like a separate worker process.
    for (const key of ['PL_SMTP_URL', 'PL_MAIL_LONG_RUN_SECONDS']) saved[key] = process.env[key];
    process.env.PL_SMTP_URL = capture.url;
    process.env.PL_MAIL_LONG_RUN_SECONDS = '0';
    // Earlier test files share this database and queue mail too (with no relay to take it): drop
    // that backlog, or this file's worker spends its time delivering other files' messages first.
    const boss = await openQueue(inject('databaseUrl'), { maxConnections: 1, maintenance: false });
    await boss.createQueue(SEND_MAIL_QUEUE);
    await boss.purgeQueue(SEND_MAIL_QUEUE);
    await boss.stop({ graceful: false, wait: true });
    api = await startApi({ PL_SMTP_URL: capture.url, PL_WORKERS_IN_PROCESS: '1', PL_WORKER_POLL_SECONDS: '0.5' });
    for (const role of ['admin', 'engineer', 'lead', 'reviewer'] as const) agents[role] = await api.signedIn(role);
    ({ corvina } = await demoMissionIds(api));
  }, 60_000);

  afterAll(async () => {
    await api?.close();
    await capture?.close();
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  });

  /** Waits until a message whose subject contains `fragment` has arrived. */
  async function arrival(fragment: string): Promise<CapturedMail> {
    for (let i = 0; i < 300; i += 1) {
      const found = received.find((m) => m.subject.includes(fragment));
      if (found) return found;
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error(`no message with "${fragment}" arrived; got: ${received.map((m) => m.subject).join(' | ')}`);
  }

  it('delivers and decodes a message with non-ASCII text', async () => {
    await deliverMail({ PL_SMTP_URL: capture.url, PL_MAIL_FROM: 'Photon Ledger <noreply@photon-ledger.invalid>' }, { to: ['a@example.org', 'b@example.org'], subject: 'Δv check – ünïcode', text: 'Margin ≥ 10 %\nsecond line' });
    const mail = await arrival('Δv check');
    expect(mail).toMatchObject({ to: ['a@example.org', 'b@example.org'], from: 'noreply@photon-ledger.invalid', subject: 'Δv check – ünïcode', text: 'Margin ≥ 10 %\nsecond line' });
  });

  it('mails the leads on submit, the submitter on approval, and the mentioned on a comment', async () => {
    const { runId } = await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.05, outputStepS: 900 });
    const tag = runId.slice(0, 8);
    const base = `/api/missions/${corvina}/reviews/budget/${runId}`;
    expect((await agents.engineer.post(`${base}/submit`).send({ note: 'ready' })).status).toBe(200);
    const requested = await arrival(`Review requested: the budget of run ${tag}`);
    expect(requested.to).toEqual(['teodor.lindqvist@ostrander-vale.example']);
    expect(requested.text).toContain('Note: ready');

    expect((await agents.lead.post(`${base}/approve`).send({})).status).toBe(200);
    const approved = await arrival(`Approved: the budget of run ${tag}`);
    expect(approved.to).toEqual(['ines.okafor@ostrander-vale.example']);

    const comment = await agents.engineer.post(`/api/missions/${corvina}/comments`).send({ subjectType: 'budget', subjectId: runId, lineKey: 'torque.max', body: `@mara.castellanos could you look at ${tag}?` });
    expect(comment.status).toBe(201);
    const mention = await arrival('mentioned you');
    expect(mention.to).toEqual(['mara.castellanos@ostrander-vale.example']);
    expect(mention.text).toContain(tag);

    // The administrators' page lists what the capture server stored.
    const list = await agents.admin.get('/api/admin/mail?limit=50');
    expect(list.status).toBe(200);
    const { messages } = mailListSchema.parse(list.body);
    expect(messages.find((m) => m.subject.includes(`Approved: the budget of run ${tag}`))?.to).toEqual(['ines.okafor@ostrander-vale.example']);
    expect((await agents.lead.get('/api/admin/mail')).status).toBe(403);
    expect((await agents.admin.get('/api/admin/mail?limit=0')).status).toBe(400);
  });

  it('mails the creator when a run that took longer than the threshold finishes', async () => {
    const { scenarioId } = await storeRun(api.sequelize, { missionId: corvina, spanDays: 0.05, outputStepS: 900 });
    const started = await agents.engineer.post(`/api/missions/${corvina}/runs`).send({ scenarioId });
    expect(started.status).toBe(201);
    const mail = await arrival('Run succeeded');
    expect(mail.to).toEqual(['ines.okafor@ostrander-vale.example']);
    expect(mail.text).toContain(started.body.id);
    expect((await RunModel.findByPk(started.body.id))!.status).toBe('succeeded');
  }, 60_000);

  it('parses quoted-printable and multipart messages', () => {
    const raw = ['Subject: =?UTF-8?Q?caf=C3=A9?=', 'Content-Type: multipart/alternative; boundary="xx"', '', '--xx', 'Content-Type: text/plain; charset=utf-8', 'Content-Transfer-Encoding: quoted-printable', '', 'na=C3=AFve =', 'join', '--xx', 'Content-Type: text/html', '', '<p>x</p>', '--xx--', ''].join('\r\n');
    expect(parseMessage(raw)).toEqual({ subject: 'café', text: 'naïve join' });
  });
});
