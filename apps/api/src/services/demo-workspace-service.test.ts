import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Sequelize } from 'sequelize';
import { loadDemoWorkspace } from '@photon-ledger/fixtures';
import { createDatabase } from '../db';
import { MissionMemberModel, MissionModel, RequirementModel, RunModel, RunResultModel, ScenarioModel, UserModel, VehicleModel } from '../models';
import { seedDemoWorkspace } from './demo-workspace-service';

describe('demo workspace', () => {
  let sequelize: Sequelize;
  let missionId = '';
  beforeAll(async () => {
    sequelize = createDatabase(inject('databaseUrl'));
    // A mission of its own, so the demo missions stay as other test files expect them.
    const mission = await MissionModel.create({ slug: 'workspace-seed-test', name: 'Workspace seed test', regime: 'earth-orbit', summary: '', createdBy: null });
    missionId = mission.id;
    const lead = await UserModel.findOne({ where: { role: 'lead' } });
    await MissionMemberModel.create({ missionId, userId: lead!.id });
  });
  afterAll(async () => {
    await MissionModel.destroy({ where: { id: missionId } });
    await sequelize.close();
  });

  it('gives a mission a vehicle, a scenario, the file’s requirements and one succeeded run with results, once', async () => {
    const corvina = loadDemoWorkspace().find((e) => e.missionSlug === 'corvina-2')!;
    const entry = { ...corvina, missionSlug: 'workspace-seed-test', scenario: { ...(corvina.scenario as object), spanDays: 1 } };
    const report = await seedDemoWorkspace(sequelize, [entry]);
    const fileRequirements = ((corvina.scenario as { requirements?: unknown[] }).requirements ?? []).length;
    expect(report).toEqual({ vehiclesCreated: 1, scenariosCreated: 1, requirementsCreated: fileRequirements, runsCreated: 1 });
    expect(await VehicleModel.count({ where: { missionId } })).toBe(1);
    const scenario = await ScenarioModel.findOne({ where: { missionId } });
    expect(scenario!.spec.requirements).toEqual([]);
    expect(await RequirementModel.count({ where: { missionId } })).toBe(fileRequirements);
    const run = await RunModel.findOne({ where: { missionId } });
    expect(run!.status).toBe('succeeded');
    const result = await RunResultModel.findByPk(run!.id);
    expect(result!.sampleCount).toBe(1 + 86_400 / (corvina.scenario as { outputStepS: number }).outputStepS);

    // Seeding again leaves the mission alone.
    expect(await seedDemoWorkspace(sequelize, [entry])).toEqual({ vehiclesCreated: 0, scenariosCreated: 0, requirementsCreated: 0, runsCreated: 0 });
    expect(await RunModel.count({ where: { missionId } })).toBe(1);
  });
});
