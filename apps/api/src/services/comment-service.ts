/**
 * Threaded comments on a study, one case of a study, or a budget (optionally one line of it).
 * Anyone who may comment in the mission (engineers, leads, reviewers) may write, reply, resolve
 * and reopen; only the author edits their text. Mentions (`@local-part` in the text, or user ids)
 * must name members of the mission.
 */
import { QueryTypes } from 'sequelize';
import type { Comment, CommentCreate, CommentListQuery, User } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import { audit, CommentModel, RunModel, UserModel } from '../models';
import { missionFor } from './mission-access';
import { missionMembers } from './mail-service';

type Person = { id: string; displayName: string; email: string };

/** 404 unless the subject exists in the mission. Studies and cases are read generically. */
async function assertSubject(missionId: string, subjectType: CommentCreate['subjectType'], subjectId: string): Promise<void> {
  if (subjectType === 'budget') {
    if (!(await RunModel.count({ where: { id: subjectId, missionId } }))) throw notFound('run');
    return;
  }
  const sequelize = CommentModel.sequelize!;
  const table = subjectType === 'study' ? 'trade_studies' : 'study_cases';
  const [present] = await sequelize.query<{ ok: boolean }>(`SELECT to_regclass(:table) IS NOT NULL AS ok`, { replacements: { table }, type: QueryTypes.SELECT });
  if (!present?.ok) throw notFound(subjectType);
  const sql =
    subjectType === 'study'
      ? `SELECT 1 FROM trade_studies WHERE id = :id AND mission_id = :missionId`
      : `SELECT 1 FROM study_cases c JOIN trade_studies s ON s.id = c.study_id WHERE c.id = :id AND s.mission_id = :missionId`;
  const rows = await sequelize.query(sql, { replacements: { id: subjectId, missionId }, type: QueryTypes.SELECT });
  if (rows.length === 0) throw notFound(subjectType);
}

/** `@name` tokens of a text: the e-mail local parts it mentions. */
export function mentionedLocalParts(body: string): string[] {
  return [...body.matchAll(/(?:^|[^\w.@])@([a-z0-9][a-z0-9._-]*[a-z0-9])/gi)].map((m) => m[1]!.toLowerCase());
}

async function toComments(rows: CommentModel[]): Promise<Comment[]> {
  const ids = new Set<string>();
  for (const r of rows) {
    if (r.authorId) ids.add(r.authorId);
    if (r.resolvedBy) ids.add(r.resolvedBy);
    for (const m of r.mentionUserIds) ids.add(m);
  }
  const users = ids.size ? await UserModel.findAll({ where: { id: [...ids] }, attributes: ['id', 'displayName', 'email'] }) : [];
  const who = new Map<string, Person>(users.map((u) => [u.id, { id: u.id, displayName: u.displayName, email: u.email }]));
  return rows.map((r) => ({
    id: r.id,
    missionId: r.missionId,
    subjectType: r.subjectType,
    subjectId: r.subjectId,
    lineKey: r.lineKey ?? null,
    parentId: r.parentId ?? null,
    author: (r.authorId && who.get(r.authorId)) || null,
    body: r.body,
    mentions: r.mentionUserIds.map((id) => who.get(id)).filter((p): p is Person => !!p),
    resolved: r.resolved,
    resolvedBy: (r.resolvedBy && who.get(r.resolvedBy)) || null,
    resolvedAt: r.resolvedAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  }));
}

/** Comments on a subject (all lines, or one), oldest first; replies carry their parent id. */
export async function listComments(user: User, missionId: string, query: CommentListQuery): Promise<Comment[]> {
  await missionFor(user, missionId, 'read');
  const rows = await CommentModel.findAll({
    where: { missionId, subjectType: query.subjectType, subjectId: query.subjectId, ...(query.lineKey ? { lineKey: query.lineKey } : {}) },
    order: [['createdAt', 'ASC'], ['id', 'ASC']],
    limit: 2000,
  });
  return toComments(rows);
}

/** A new comment, with who it mentions (to notify). */
export async function createComment(user: User, missionId: string, input: CommentCreate): Promise<{ comment: Comment; mentioned: Person[] }> {
  await missionFor(user, missionId, 'comment');
  await assertSubject(missionId, input.subjectType, input.subjectId);
  if (input.parentId) {
    const parent = await CommentModel.findOne({ where: { id: input.parentId, missionId }, attributes: ['id', 'subjectType', 'subjectId', 'lineKey'] });
    if (!parent) throw new AppError('validation_failed', 'parentId: no such comment in this mission', { fields: { parentId: 'no such comment in this mission' } });
    if (parent.subjectType !== input.subjectType || parent.subjectId !== input.subjectId) {
      throw new AppError('validation_failed', 'parentId: a reply must be on the same subject as its parent', { fields: { parentId: 'a reply must be on the same subject as its parent' } });
    }
  }
  const members = await missionMembers(missionId);
  const byLocal = new Map(members.map((m) => [m.email.split('@')[0]!.toLowerCase(), m]));
  const memberIds = new Set(members.map((m) => m.id));
  const mentioned = new Map<string, UserModel>();
  for (const local of mentionedLocalParts(input.body)) {
    const m = byLocal.get(local);
    if (!m) throw new AppError('validation_failed', `body: @${local} is not a member of this mission`, { fields: { body: `@${local} is not a member of this mission` } });
    mentioned.set(m.id, m);
  }
  for (const [i, id] of (input.mentionUserIds ?? []).entries()) {
    if (!memberIds.has(id)) {
      throw new AppError('validation_failed', `mentionUserIds.${i}: only members of this mission can be mentioned`, { fields: { [`mentionUserIds.${i}`]: 'only members of this mission can be mentioned' } });
    }
    mentioned.set(id, members.find((m) => m.id === id)!);
  }
  const sequelize = CommentModel.sequelize!;
  const row = await sequelize.transaction(async (transaction) => {
    const created = await CommentModel.create(
      {
        missionId,
        subjectType: input.subjectType,
        subjectId: input.subjectId,
        lineKey: input.lineKey ?? null,
        parentId: input.parentId ?? null,
        authorId: user.id,
        body: input.body,
        mentionUserIds: [...mentioned.keys()],
      },
      { transaction },
    );
    await audit(
      { userId: user.id, missionId, action: 'comment-added', entityType: 'comment', entityId: created.id, detail: { subjectType: input.subjectType, subjectId: input.subjectId, lineKey: input.lineKey ?? null } },
      transaction,
    );
    return created;
  });
  const [comment] = await toComments([row]);
  const others = [...mentioned.values()].filter((m) => m.id !== user.id);
  return { comment: comment!, mentioned: others.map((m) => ({ id: m.id, displayName: m.displayName, email: m.email })) };
}

async function commentIn(missionId: string, commentId: string): Promise<CommentModel> {
  const row = await CommentModel.findOne({ where: { id: commentId, missionId } });
  if (!row) throw notFound('comment');
  return row;
}

/** The author changes their text (mentions are not re-sent). */
export async function editComment(user: User, missionId: string, commentId: string, body: string): Promise<Comment> {
  await missionFor(user, missionId, 'comment');
  const row = await commentIn(missionId, commentId);
  if (row.authorId !== user.id) throw new AppError('forbidden', 'only the author may edit a comment');
  await CommentModel.sequelize!.transaction(async (transaction) => {
    await row.update({ body }, { transaction });
    await audit({ userId: user.id, missionId, action: 'comment-edited', entityType: 'comment', entityId: row.id }, transaction);
  });
  const [comment] = await toComments([row]);
  return comment!;
}

/** Resolves or reopens a comment (anyone who may comment). */
export async function resolveComment(user: User, missionId: string, commentId: string, resolved: boolean): Promise<Comment> {
  await missionFor(user, missionId, 'comment');
  const row = await commentIn(missionId, commentId);
  await CommentModel.sequelize!.transaction(async (transaction) => {
    await row.update(resolved ? { resolved: true, resolvedBy: user.id, resolvedAt: new Date() } : { resolved: false, resolvedBy: null, resolvedAt: null }, { transaction });
    await audit({ userId: user.id, missionId, action: resolved ? 'comment-resolved' : 'comment-reopened', entityType: 'comment', entityId: row.id }, transaction);
  });
  const [comment] = await toComments([row]);
  return comment!;
}
