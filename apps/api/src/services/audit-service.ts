import { Op, type WhereOptions } from 'sequelize';
import type { AuditEntry, AuditPage, AuditQuery, AuthorRef } from '@photon-ledger/shared';
import { AuditEntryModel, UserModel } from '../models';

/** Display names of users by id, for author columns (one query for a whole list). */
export async function authorsById(ids: readonly (string | null)[]): Promise<Map<string, NonNullable<AuthorRef>>> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await UserModel.findAll({ where: { id: wanted }, attributes: ['id', 'displayName'] });
  return new Map(rows.map((u) => [u.id, { id: u.id, displayName: u.displayName }]));
}

/** The author of a row, or null when it has none (the user was deleted). */
export function authorOf(authors: Map<string, NonNullable<AuthorRef>>, userId: string | null): AuthorRef {
  return userId === null ? null : (authors.get(userId) ?? null);
}

/** A page of a mission's audit log, newest first; `before` pages by entry id. */
export async function listAuditEntries(missionId: string, query: AuditQuery): Promise<AuditPage> {
  const where: WhereOptions<AuditEntryModel> = { missionId };
  if (query.before !== undefined) Object.assign(where, { id: { [Op.lt]: query.before } });
  const rows = await AuditEntryModel.findAll({ where, order: [['id', 'DESC']], limit: query.limit });
  const authors = await authorsById(rows.map((r) => r.userId));
  const entries: AuditEntry[] = rows.map((r) => ({
    id: String(r.id),
    at: r.at.toISOString(),
    user: authorOf(authors, r.userId),
    action: r.action,
    entityType: r.entityType,
    entityId: r.entityId,
    detail: r.detail,
  }));
  const last = entries[entries.length - 1];
  return { entries, nextBefore: entries.length === query.limit && last ? last.id : null };
}
