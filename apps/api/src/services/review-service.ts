/**
 * Review and approval of a study or a run's budget. States: draft (never submitted), in-review,
 * approved, changes-requested. Engineers and leads submit; leads approve or send back (with a
 * reason). Approval freezes the subject: the ids it covers and the SHA-256 of a canonical JSON of
 * their content are stored, and GET tells whether the content still hashes to it. Every change of
 * state is written to the audit log in the same transaction.
 */
import { createHash } from 'node:crypto';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Review, ReviewAction, ReviewListQuery, ReviewParams, ReviewState, User } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import { audit, ReviewModel, RunModel, RunResultModel, UserModel, VehicleRevisionModel } from '../models';
import { missionFor, type MissionAction } from './mission-access';

/** Who may ask for each transition, and from which states. */
export const reviewTransitions: Record<ReviewAction, { access: MissionAction; from: readonly ReviewState[]; to: ReviewState }> = {
  submit: { access: 'edit', from: ['draft', 'changes-requested'], to: 'in-review' },
  approve: { access: 'lead', from: ['in-review'], to: 'approved' },
  'send-back': { access: 'lead', from: ['in-review'], to: 'changes-requested' },
};

/** JSON with object keys sorted at every level, so equal content always hashes alike. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value ?? null);
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

/** What a review covers: a label for people, the content that is hashed, and its ids. */
export interface ReviewSubject {
  label: string;
  ids: Record<string, string | string[]>;
  content: unknown;
  /** Whether the subject is complete enough to be reviewed (a run must have succeeded). */
  reviewable: { ok: true } | { ok: false; why: string };
}

/** Loads the subject's current content; 404 when it is not in this mission. */
export async function loadReviewSubject(missionId: string, subjectType: ReviewParams['subjectType'], subjectId: string, transaction?: Transaction): Promise<ReviewSubject> {
  if (subjectType === 'budget') {
    const run = await RunModel.findOne({ where: { id: subjectId, missionId }, transaction });
    if (!run) throw notFound('run');
    const result = await RunResultModel.findByPk(run.id, { attributes: ['runId', 'summary', 'budget'], transaction });
    const revision = await VehicleRevisionModel.findByPk(run.vehicleRevisionId, { attributes: ['id', 'spec'], transaction });
    const label = `the budget of run ${run.id.slice(0, 8)} (${run.scenarioSpec.name ?? 'scenario'})`;
    return {
      label,
      ids: { runId: run.id, scenarioId: run.scenarioId, vehicleRevisionId: run.vehicleRevisionId },
      content: {
        vehicleRevision: { id: run.vehicleRevisionId, spec: revision?.spec ?? null },
        scenario: { id: run.scenarioId, spec: run.scenarioSpec },
        run: { id: run.id, summary: result?.summary ?? null, budget: result?.budget ?? null },
      },
      reviewable: run.status === 'succeeded' && result ? { ok: true } : { ok: false, why: `run ${run.id} has no budget yet (status ${run.status})` },
    };
  }
  // Studies are read generically (their tables belong to the studies feature and may not exist yet).
  const sequelize = ReviewModel.sequelize!;
  const [exists] = await sequelize.query<{ present: boolean }>(`SELECT to_regclass('trade_studies') IS NOT NULL AS present`, { type: QueryTypes.SELECT, transaction });
  if (!exists?.present) throw notFound('study');
  const [study] = await sequelize.query<{ row: Record<string, unknown> }>(`SELECT to_jsonb(s) AS row FROM trade_studies s WHERE s.id = :id AND s.mission_id = :missionId`, {
    replacements: { id: subjectId, missionId },
    type: QueryTypes.SELECT,
    transaction,
  });
  if (!study) throw notFound('study');
  const [casesTable] = await sequelize.query<{ present: boolean }>(
    `SELECT EXISTS (SELECT 1 FROM information_schema.columns WHERE table_name = 'study_cases' AND column_name = 'study_id') AS present`,
    { type: QueryTypes.SELECT, transaction },
  );
  const cases = casesTable?.present
    ? await sequelize.query<{ row: Record<string, unknown> }>(`SELECT to_jsonb(c) AS row FROM study_cases c WHERE c.study_id = :id ORDER BY c.id`, {
        replacements: { id: subjectId },
        type: QueryTypes.SELECT,
        transaction,
      })
    : [];
  // Bookkeeping columns (timestamps, cancel flags) change without changing what was studied.
  const strip = (row: Record<string, unknown>) => {
    const { updated_at: _u, cancel_requested: _c, heartbeat_at: _h, progress: _p, ...rest } = row;
    return rest;
  };
  return {
    label: `the trade study "${String(study.row.name ?? subjectId)}"`,
    ids: { studyId: subjectId, caseIds: cases.map((c) => String(c.row.id)) },
    content: { study: strip(study.row), cases: cases.map((c) => strip(c.row)) },
    reviewable: { ok: true },
  };
}

async function people(ids: (string | null | undefined)[]): Promise<Map<string, { id: string; displayName: string; email: string }>> {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  const rows = wanted.length ? await UserModel.findAll({ where: { id: wanted }, attributes: ['id', 'displayName', 'email'] }) : [];
  return new Map(rows.map((u) => [u.id, { id: u.id, displayName: u.displayName, email: u.email }]));
}

async function toReviews(rows: ReviewModel[], intact: (row: ReviewModel) => Promise<boolean | null>): Promise<Review[]> {
  const who = await people(rows.flatMap((r) => [r.submittedBy, r.decidedBy]));
  const out: Review[] = [];
  for (const r of rows) {
    out.push({
      id: r.id,
      missionId: r.missionId,
      subjectType: r.subjectType,
      subjectId: r.subjectId,
      state: r.state,
      submittedBy: (r.submittedBy && who.get(r.submittedBy)) || null,
      submittedAt: r.submittedAt?.toISOString() ?? null,
      decidedBy: (r.decidedBy && who.get(r.decidedBy)) || null,
      decidedAt: r.decidedAt?.toISOString() ?? null,
      reason: r.reason ?? null,
      note: r.note ?? null,
      frozen: r.contentHash && r.frozenIds && r.frozenAt ? { contentHash: r.contentHash, ids: r.frozenIds, frozenAt: r.frozenAt.toISOString() } : null,
      intact: await intact(r),
      updatedAt: r.updatedAt.toISOString(),
    });
  }
  return out;
}

/** Recomputes an approved subject's hash; null when not approved. */
async function stillIntact(row: ReviewModel): Promise<boolean | null> {
  if (row.state !== 'approved' || !row.contentHash) return null;
  try {
    const subject = await loadReviewSubject(row.missionId, row.subjectType, row.subjectId);
    return sha256(canonicalJson(subject.content)) === row.contentHash;
  } catch {
    return false;
  }
}

/** One subject's review (a draft when never submitted). */
export async function getReview(user: User, params: ReviewParams): Promise<Review> {
  await missionFor(user, params.missionId, 'read');
  await loadReviewSubject(params.missionId, params.subjectType, params.subjectId);
  const row = await ReviewModel.findOne({ where: { missionId: params.missionId, subjectType: params.subjectType, subjectId: params.subjectId } });
  if (!row) return draftReview(params);
  const [review] = await toReviews([row], stillIntact);
  return review!;
}

function draftReview(params: ReviewParams): Review {
  return {
    id: null,
    missionId: params.missionId,
    subjectType: params.subjectType,
    subjectId: params.subjectId,
    state: 'draft',
    submittedBy: null,
    submittedAt: null,
    decidedBy: null,
    decidedAt: null,
    reason: null,
    note: null,
    frozen: null,
    intact: null,
    updatedAt: null,
  };
}

/** A mission's reviews (subjects ever submitted), newest change first. */
export async function listReviews(user: User, missionId: string, query: ReviewListQuery): Promise<Review[]> {
  await missionFor(user, missionId, 'read');
  const rows = await ReviewModel.findAll({
    where: { missionId, ...(query.subjectType ? { subjectType: query.subjectType } : {}), ...(query.state ? { state: query.state } : {}) },
    order: [['updatedAt', 'DESC']],
    limit: 500,
  });
  return toReviews(rows, async () => null);
}

/** The outcome of a transition, with what the notifications need. */
export interface TransitionOutcome {
  review: Review;
  subjectLabel: string;
  submitterId: string | null;
}

/** Applies `action` (403 by role, 404 for an unknown subject, 409 from a state that does not allow it). */
export async function transitionReview(user: User, params: ReviewParams, action: ReviewAction, text: string | undefined): Promise<TransitionOutcome> {
  const rule = reviewTransitions[action];
  await missionFor(user, params.missionId, rule.access);
  const sequelize = ReviewModel.sequelize!;
  const { row, label } = await sequelize.transaction(async (transaction) => {
    const subject = await loadReviewSubject(params.missionId, params.subjectType, params.subjectId, transaction);
    const where = { missionId: params.missionId, subjectType: params.subjectType, subjectId: params.subjectId };
    // The row lock orders concurrent transitions of one subject.
    let row = await ReviewModel.findOne({ where, transaction, lock: transaction.LOCK.UPDATE });
    const from: ReviewState = row?.state ?? 'draft';
    if (!rule.from.includes(from)) {
      throw new AppError('conflict', `cannot ${action} a review that is ${from} (allowed from ${rule.from.join(' or ')})`);
    }
    if (action === 'submit' && !subject.reviewable.ok) throw new AppError('conflict', subject.reviewable.why);
    const now = new Date();
    const changes: Partial<ReviewModel> = { state: rule.to };
    if (action === 'submit') Object.assign(changes, { submittedBy: user.id, submittedAt: now, decidedBy: null, decidedAt: null, reason: null, note: text ?? null });
    if (action === 'send-back') Object.assign(changes, { decidedBy: user.id, decidedAt: now, reason: text ?? null });
    if (action === 'approve') {
      if (!subject.reviewable.ok) throw new AppError('conflict', subject.reviewable.why);
      Object.assign(changes, { decidedBy: user.id, decidedAt: now, reason: null, note: text ?? row?.note ?? null, frozenIds: subject.ids, contentHash: sha256(canonicalJson(subject.content)), frozenAt: now });
    }
    if (row) await row.update(changes, { transaction });
    else row = await ReviewModel.create({ ...where, ...changes, state: rule.to }, { transaction });
    await audit(
      {
        userId: user.id,
        missionId: params.missionId,
        action: `review-${action === 'submit' ? 'submitted' : action === 'approve' ? 'approved' : 'sent-back'}`,
        entityType: params.subjectType,
        entityId: params.subjectId,
        detail: { from, to: rule.to, ...(text ? { [action === 'send-back' ? 'reason' : 'note']: text } : {}), ...(action === 'approve' ? { contentHash: row.contentHash } : {}) },
      },
      transaction,
    );
    return { row, label: subject.label };
  });
  const [review] = await toReviews([row], stillIntact);
  return { review: review!, subjectLabel: label, submitterId: row.submittedBy ?? null };
}
