/**
 * Notifications by e-mail. Requests never talk to SMTP: they put a `send-mail` job on the
 * PostgreSQL queue (workers deliver it, with retries), and a failure to queue is logged, never
 * surfaced to the user. Without PL_SMTP_URL nothing is queued.
 */
import { Op } from 'sequelize';
import type { Role, SendMailJob } from '@photon-ledger/shared';
import { MissionMemberModel, MissionModel, UserModel } from '../models';

/** Queue of outgoing mail; payload: the shared sendMailJobSchema. */
export const SEND_MAIL_QUEUE = 'send-mail';

/** Anything that queues jobs (the API's JobSender, or a worker's pg-boss wrapped). */
export interface MailQueue {
  send(queue: string, data: object): Promise<string | null>;
}

/** What `queueMail` needs to know of the configuration. */
export interface MailSettings {
  PL_SMTP_URL?: string | undefined;
}

/** Queues one message; resolves to the job id, or null when mail is off or the queue failed (logged). */
export async function queueMail(settings: MailSettings, queue: MailQueue, message: SendMailJob): Promise<string | null> {
  const to = [...new Set(message.to)];
  if (!settings.PL_SMTP_URL || to.length === 0) return null;
  try {
    return await queue.send(SEND_MAIL_QUEUE, { ...message, to });
  } catch (err) {
    console.error(`[mail] could not queue "${message.subject}" to ${to.join(', ')}:`, err);
    return null;
  }
}

/** Members of a mission, optionally only those with one of `roles`. */
export async function missionMembers(missionId: string, roles?: Role[]): Promise<UserModel[]> {
  const links = await MissionMemberModel.findAll({ where: { missionId }, attributes: ['userId'] });
  return UserModel.findAll({
    where: { id: { [Op.in]: links.map((l) => l.userId) }, ...(roles ? { role: { [Op.in]: roles } } : {}) },
    attributes: ['id', 'email', 'displayName', 'role'],
    order: [['displayName', 'ASC']],
  });
}

async function missionName(missionId: string): Promise<string> {
  const m = await MissionModel.findByPk(missionId, { attributes: ['name'] });
  return m?.name ?? 'a mission';
}

const signature = '\n\n-- \nPhoton Ledger: solar radiation pressure budgets. This message was sent automatically.';

/** A review was requested: mail the mission's leads. */
export async function notifyReviewRequested(
  settings: MailSettings,
  queue: MailQueue,
  args: { missionId: string; subjectLabel: string; submitter: string; note?: string | null | undefined },
): Promise<void> {
  const leads = await missionMembers(args.missionId, ['lead']);
  const mission = await missionName(args.missionId);
  await queueMail(settings, queue, {
    to: leads.map((l) => l.email),
    subject: `[${mission}] Review requested: ${args.subjectLabel}`,
    text: `${args.submitter} asks for a review of ${args.subjectLabel} in ${mission}.${args.note ? `\n\nNote: ${args.note}` : ''}${signature}`,
  });
}

/** A lead decided: mail the submitter. */
export async function notifyReviewDecided(
  settings: MailSettings,
  queue: MailQueue,
  args: { missionId: string; subjectLabel: string; submitterId: string | null; decision: 'approved' | 'changes-requested'; lead: string; reason?: string | null | undefined },
): Promise<void> {
  if (!args.submitterId) return;
  const submitter = await UserModel.findByPk(args.submitterId, { attributes: ['email'] });
  if (!submitter) return;
  const mission = await missionName(args.missionId);
  const verb = args.decision === 'approved' ? 'Approved' : 'Changes requested';
  await queueMail(settings, queue, {
    to: [submitter.email],
    subject: `[${mission}] ${verb}: ${args.subjectLabel}`,
    text:
      args.decision === 'approved'
        ? `${args.lead} approved ${args.subjectLabel}. What was approved is frozen: later edits make new revisions.${args.reason ? `\n\nNote: ${args.reason}` : ''}${signature}`
        : `${args.lead} sent ${args.subjectLabel} back with this reason:\n\n${args.reason ?? ''}${signature}`,
  });
}

/** Someone was mentioned in a comment: mail them. */
export async function notifyMentioned(
  settings: MailSettings,
  queue: MailQueue,
  args: { missionId: string; recipients: string[]; author: string; where: string; body: string },
): Promise<void> {
  if (args.recipients.length === 0) return;
  const mission = await missionName(args.missionId);
  await queueMail(settings, queue, {
    to: args.recipients,
    subject: `[${mission}] ${args.author} mentioned you on ${args.where}`,
    text: `${args.author} wrote on ${args.where}:\n\n${args.body}${signature}`,
  });
}

/** A long run finished: mail its creator. Runs shorter than the threshold send nothing. */
export async function notifyRunFinished(
  settings: MailSettings & { PL_MAIL_LONG_RUN_SECONDS: number },
  queue: MailQueue,
  run: { id: string; missionId: string; createdBy: string | null; startedAt: Date | null; finishedAt: Date | null; status: string },
): Promise<void> {
  if (!run.createdBy || !run.startedAt || !run.finishedAt) return;
  const seconds = (run.finishedAt.getTime() - run.startedAt.getTime()) / 1000;
  if (seconds < settings.PL_MAIL_LONG_RUN_SECONDS) return;
  const creator = await UserModel.findByPk(run.createdBy, { attributes: ['email'] });
  if (!creator) return;
  const mission = await missionName(run.missionId);
  await queueMail(settings, queue, {
    to: [creator.email],
    subject: `[${mission}] Run ${run.status} after ${Math.round(seconds / 60)} min`,
    text: `Your run ${run.id} in ${mission} ${run.status} after ${seconds.toFixed(0)} s.${signature}`,
  });
}

/** A trade study finished: mail its creator (for the studies code to call). */
export async function notifyStudyFinished(
  settings: MailSettings,
  queue: MailQueue,
  study: { id: string; missionId: string; name: string; createdBy: string | null; caseCount: number; failedCases?: number },
): Promise<void> {
  if (!study.createdBy) return;
  const creator = await UserModel.findByPk(study.createdBy, { attributes: ['email'] });
  if (!creator) return;
  const mission = await missionName(study.missionId);
  const failed = study.failedCases ? ` (${study.failedCases} failed)` : '';
  await queueMail(settings, queue, {
    to: [creator.email],
    subject: `[${mission}] Trade study finished: ${study.name}`,
    text: `Your trade study "${study.name}" (${study.id}) finished its ${study.caseCount} cases${failed}.${signature}`,
  });
}
