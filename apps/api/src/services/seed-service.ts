import bcrypt from 'bcryptjs';
import type { Sequelize } from 'sequelize';
import type { DemoData } from '@photon-ledger/shared';
import { MissionMemberModel, MissionModel, UserModel } from '../models';
import { hashPassword } from './auth-service';

/** What a seed run changed, for the log line. */
export interface SeedReport {
  usersCreated: number;
  missionsCreated: number;
  membershipsCreated: number;
}

/**
 * Loads the demo data idempotently in one transaction: users by e-mail, missions by slug,
 * memberships by pair. A second run creates nothing and leaves edited rows alone, except that a
 * demo user's password is reset to the documented one so the printed credentials keep working.
 */
export async function seedDemoData(sequelize: Sequelize, data: DemoData): Promise<SeedReport> {
  const report: SeedReport = { usersCreated: 0, missionsCreated: 0, membershipsCreated: 0 };
  // Hash outside the transaction: bcrypt is slow and needs no lock.
  const hashes = await Promise.all(data.users.map((u) => hashPassword(u.password)));
  await sequelize.transaction(async (transaction) => {
    const idByEmail = new Map<string, string>();
    for (const [i, u] of data.users.entries()) {
      const email = u.email.toLowerCase();
      const [row, created] = await UserModel.findOrCreate({
        where: { email },
        defaults: { email, displayName: u.displayName, role: u.role, passwordHash: hashes[i]! },
        transaction,
      });
      if (created) report.usersCreated += 1;
      else if (!(await bcrypt.compare(u.password, row.passwordHash))) {
        await row.update({ passwordHash: hashes[i]! }, { transaction });
      }
      idByEmail.set(email, row.id);
    }
    for (const m of data.missions) {
      const [mission, created] = await MissionModel.findOrCreate({
        where: { slug: m.slug },
        defaults: { slug: m.slug, name: m.name, regime: m.regime, summary: m.summary, createdBy: null },
        transaction,
      });
      if (created) report.missionsCreated += 1;
      for (const email of m.members) {
        const userId = idByEmail.get(email.toLowerCase());
        if (!userId) throw new Error(`demo mission ${m.slug}: member ${email} is not a demo user`);
        const [, made] = await MissionMemberModel.findOrCreate({
          where: { missionId: mission.id, userId },
          transaction,
        });
        if (made) report.membershipsCreated += 1;
      }
    }
  });
  return report;
}
