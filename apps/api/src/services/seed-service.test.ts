import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Sequelize } from 'sequelize';
import { loadDemoData } from '@photon-ledger/fixtures';
import { createDatabase } from '../db';
import { MissionMemberModel, MissionModel, UserModel } from '../models';
import { seedDemoData } from './seed-service';

describe('demo data', () => {
  let sequelize: Sequelize;
  beforeAll(() => {
    sequelize = createDatabase(inject('databaseUrl'));
  });
  afterAll(() => sequelize.close());

  it('seeding again creates no duplicates', async () => {
    const before = [await UserModel.count(), await MissionModel.count(), await MissionMemberModel.count()];
    const report = await seedDemoData(sequelize, loadDemoData());
    expect(report).toEqual({ usersCreated: 0, missionsCreated: 0, membershipsCreated: 0 });
    expect([await UserModel.count(), await MissionModel.count(), await MissionMemberModel.count()]).toEqual(before);
  });

  it('a demo file naming a member who is not a demo user fails and stores nothing', async () => {
    const data = loadDemoData();
    data.missions.push({ slug: 'half-written', name: 'Half', regime: 'earth-orbit', summary: '', members: ['ghost@ostrander-vale.example'] });
    await expect(seedDemoData(sequelize, data)).rejects.toThrow(/ghost@ostrander-vale.example/);
    expect(await MissionModel.count({ where: { slug: 'half-written' } })).toBe(0);
  });
});
