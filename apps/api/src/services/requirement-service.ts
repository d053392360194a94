/**
 * A mission's requirements on budget lines: one per line, set and removed by leads (audited), and
 * applied to every run's budget when it is read.
 */
import { UniqueConstraintError } from 'sequelize';
import { budgetLineDefinitions, budgetLineKeys, type BudgetRequirement } from '@photon-ledger/srp-core';
import type { BudgetLineKey, MissionRequirement, MissionRequirementList, RequirementUpsert, User } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import { audit, RequirementModel } from '../models';
import { missionFor } from './mission-access';

/** Report order of the budget lines. */
const lineOrder = (line: string): number => budgetLineKeys.indexOf(line as BudgetLineKey);

function toMissionRequirement(row: RequirementModel): MissionRequirement {
  const definition = budgetLineDefinitions[row.line as BudgetLineKey];
  return {
    id: row.id,
    line: row.line as BudgetLineKey,
    label: definition.label,
    unit: definition.unit,
    comparator: row.comparator,
    value: row.value,
    minMarginPercent: row.minMarginPercent,
    note: row.note,
    setBy: row.setBy,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The requirements as srp-core applies them (no access check: callers have done it). */
export async function currentRequirements(missionId: string): Promise<BudgetRequirement[]> {
  const rows = await RequirementModel.findAll({ where: { missionId } });
  return rows
    .sort((a, b) => lineOrder(a.line) - lineOrder(b.line))
    .map((r) => ({ line: r.line as BudgetLineKey, comparator: r.comparator, value: r.value, minMarginPercent: r.minMarginPercent }));
}

/** Every requirement of the mission, in budget line order (any member may read them). */
export async function listRequirements(user: User, missionId: string): Promise<MissionRequirementList> {
  await missionFor(user, missionId, 'read');
  const rows = await RequirementModel.findAll({ where: { missionId } });
  return { requirements: rows.sort((a, b) => lineOrder(a.line) - lineOrder(b.line)).map(toMissionRequirement) };
}

/** Plain fields of a requirement, for the audit log. */
const auditView = (r: RequirementModel) => ({ comparator: r.comparator, value: r.value, minMarginPercent: r.minMarginPercent, note: r.note });

/** Sets (creates or replaces) the requirement on one line; leads only; audited in the same transaction. */
export async function upsertRequirement(
  user: User,
  missionId: string,
  input: RequirementUpsert,
): Promise<{ requirement: MissionRequirement; created: boolean }> {
  await missionFor(user, missionId, 'lead');
  const sequelize = RequirementModel.sequelize!;
  try {
    return await sequelize.transaction(async (transaction) => {
      const fields = {
        comparator: input.comparator,
        value: input.value,
        minMarginPercent: input.minMarginPercent,
        note: input.note ?? '',
        setBy: user.id,
      };
      const existing = await RequirementModel.findOne({ where: { missionId, line: input.line }, transaction, lock: transaction.LOCK.UPDATE });
      const before = existing ? auditView(existing) : null;
      const row = existing
        ? await existing.update(fields, { transaction })
        : await RequirementModel.create({ missionId, line: input.line, ...fields }, { transaction });
      await audit(
        {
          userId: user.id,
          missionId,
          action: 'requirement-set',
          entityType: 'requirement',
          entityId: row.id,
          detail: { line: input.line, before, after: auditView(row) },
        },
        transaction,
      );
      return { requirement: toMissionRequirement(row), created: existing === null };
    });
  } catch (err) {
    // Two leads creating the same line at once: the unique index lets one through.
    if (err instanceof UniqueConstraintError) {
      throw new AppError('conflict', `the requirement on ${input.line} was set by someone else at the same moment: reload and try again`, {
        fields: { line: 'set concurrently: reload and try again' },
        cause: err,
      });
    }
    throw err;
  }
}

/** Removes the requirement on one line; leads only; audited. 404 when the line has none. */
export async function deleteRequirement(user: User, missionId: string, line: BudgetLineKey): Promise<void> {
  await missionFor(user, missionId, 'lead');
  const sequelize = RequirementModel.sequelize!;
  await sequelize.transaction(async (transaction) => {
    const row = await RequirementModel.findOne({ where: { missionId, line }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new AppError('not_found', `no requirement is set on line ${line}`);
    await row.destroy({ transaction });
    await audit(
      {
        userId: user.id,
        missionId,
        action: 'requirement-deleted',
        entityType: 'requirement',
        entityId: row.id,
        detail: { line, before: auditView(row) },
      },
      transaction,
    );
  });
}
