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
import { RunModel } from '../models';
import { notifyRunFinished } from './mail-service';

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
