/**
 * The `send-mail` job: workers hand each queued message to the SMTP relay named by PL_SMTP_URL
 * (read from the worker's own environment). A failed delivery throws, so pg-boss retries it.
 */
import os from 'node:os';
import nodemailer from 'nodemailer';
import type PgBoss from 'pg-boss';
import { fieldErrors, sendMailJobSchema, type SendMailJob } from '@photon-ledger/shared';
import { loadConfig, mailConfigSchema, type MailConfig } from '../config';
import type { JobContext, JobSlot } from '../jobs';
import { sendJob } from '../jobs/queue';
import { QueryTypes, type Sequelize } from 'sequelize';
import { AuditEntryModel, RunModel, TradeStudyModel, audit } from '../models';
import { notifyRunFinished, notifyStudyFinished } from './mail-service';

/** Sends one message through the relay; throws when the relay refuses or cannot be reached. */
export async function deliverMail(config: Pick<MailConfig, 'PL_SMTP_URL' | 'PL_MAIL_FROM'>, message: SendMailJob): Promise<void> {
  if (!config.PL_SMTP_URL) throw new Error('PL_SMTP_URL is not set: mail cannot be delivered');
  const transport = nodemailer.createTransport(config.PL_SMTP_URL);
  try {
    await transport.sendMail({ from: config.PL_MAIL_FROM, to: message.to, subject: message.subject, text: message.text });
  } finally {
    transport.close();
  }
}

let mailSlots = 0;

/** A worker slot for `send-mail`. */
export class MailSlot implements JobSlot {
  readonly workerId = `${os.hostname()}:${process.pid}:mail-${mailSlots++}`;
  private readonly config: MailConfig;
  private idle: Promise<void> = Promise.resolve();

  constructor(_context: JobContext, config?: MailConfig) {
    this.config = config ?? loadConfig(process.env, mailConfigSchema);
  }

  readonly handle = async (jobs: PgBoss.Job<unknown>[]): Promise<void> => {
    let ended!: () => void;
    this.idle = new Promise((resolve) => (ended = resolve));
    try {
      for (const job of jobs) {
        const payload = sendMailJobSchema.safeParse(job.data);
        if (!payload.success) {
          console.error(`[mail] job ${job.id} ignored: ${Object.entries(fieldErrors(payload.error)).map(([k, v]) => `${k}: ${v}`).join('; ')}`);
          continue;
        }
        if (!this.config.PL_SMTP_URL) {
          console.warn(`[mail] PL_SMTP_URL is not set in this worker: "${payload.data.subject}" is dropped`);
          continue;
        }
        await deliverMail(this.config, payload.data);
      }
    } finally {
      ended();
    }
  };

  whenIdle(): Promise<void> {
    return this.idle;
  }

  async release(): Promise<void> {
    await this.idle;
  }

  async close(): Promise<void> {}
}

/** After a run finished (worker side): mail its creator when it ran longer than PL_MAIL_LONG_RUN_SECONDS. Never throws. */
export async function mailIfLongRun(boss: PgBoss, runId: string): Promise<void> {
  try {
    const config = loadConfig(process.env, mailConfigSchema);
    if (!config.PL_SMTP_URL) return;
    const run = await RunModel.findByPk(runId, { attributes: ['id', 'missionId', 'createdBy', 'startedAt', 'finishedAt', 'status'] });
    if (!run) return;
    await notifyRunFinished(config, { send: (queue, data) => sendJob(boss, queue, data) }, run);
  } catch (err) {
    console.error(`[mail] long-run notice for run ${runId} failed:`, err);
  }
}

/**
 * After a study case ended (worker side): when it was the study's last open case, records
 * 'study-finished' in the audit log and mails the study's creator. An advisory lock on the study
 * and the audit line make it happen once even when two workers end the last cases together; a
 * cancelled study sends nothing. Never throws.
 */
export async function noteStudyFinishedIfLast(boss: PgBoss, sequelize: Sequelize, caseId: string): Promise<void> {
  try {
    const [row] = await sequelize.query<{ study_id: string }>('SELECT study_id FROM study_cases WHERE id = $1', { bind: [caseId], type: QueryTypes.SELECT });
    if (!row) return;
    const studyId = row.study_id;
    const finished = await sequelize.transaction(async (transaction) => {
      await sequelize.query('SELECT pg_advisory_xact_lock(hashtext($1))', { bind: [`study-finished:${studyId}`], transaction });
      const [counts] = await sequelize.query<{ open: string; failed: string }>(
        `SELECT count(*) FILTER (WHERE status IN ('queued','running')) AS open, count(*) FILTER (WHERE status = 'failed') AS failed
           FROM study_cases WHERE study_id = $1`,
        { bind: [studyId], type: QueryTypes.SELECT, transaction },
      );
      if (!counts || Number(counts.open) > 0) return null;
      const study = await TradeStudyModel.findByPk(studyId, { transaction });
      if (!study || study.cancelRequested) return null;
      const already = await AuditEntryModel.findOne({ where: { entityType: 'study', entityId: studyId, action: 'study-finished' }, transaction });
      if (already) return null;
      const failedCases = Number(counts.failed);
      await audit(
        { userId: null, missionId: study.missionId, action: 'study-finished', entityType: 'study', entityId: studyId, detail: { caseCount: study.caseCount, failedCases } },
        transaction,
      );
      return { id: study.id, missionId: study.missionId, name: study.name, createdBy: study.createdBy, caseCount: study.caseCount, failedCases };
    });
    if (!finished) return;
    const config = loadConfig(process.env, mailConfigSchema);
    await notifyStudyFinished(config, { send: (queue, data) => sendJob(boss, queue, data) }, finished);
  } catch (err) {
    console.error(`[mail] study-finished notice after case ${caseId} failed:`, err);
  }
}
