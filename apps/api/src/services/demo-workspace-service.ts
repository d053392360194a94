/**
 * The demo missions' working set, so a first start shows a product in use: per demo mission a
 * vehicle (revision 1), a scenario using it, the scenario file's requirements as the mission's
 * (set by the mission's lead) and one succeeded run computed at seeding time. A mission that already
 * has a vehicle is left alone, so seeding again changes nothing and keeps the user's edits.
 */
import type { Sequelize } from 'sequelize';
import { budgetRequirementsSchema, scenarioSchema, vehicleSpecSchema } from '@photon-ledger/shared';
import type { DemoWorkspaceEntry } from '@photon-ledger/fixtures';
import { MissionMemberModel, MissionModel, RequirementModel, RunModel, ScenarioModel, UserModel, VehicleModel, VehicleRevisionModel } from '../models';
import { computeRunOutcome, storeRunOutcome } from './run-outcome';

/** What seeding the working set created. */
export interface DemoWorkspaceReport {
  vehiclesCreated: number;
  scenariosCreated: number;
  requirementsCreated: number;
  runsCreated: number;
}

/** Listing columns of a vehicle spec: kind, mass, surfaces and their total area. */
function listing(spec: ReturnType<typeof vehicleSpecSchema.parse>) {
  const areas = spec.kind === 'plates' ? spec.plates.map((p) => p.areaM2) : [spec.areaM2];
  return { kind: spec.kind, massKg: spec.massKg, surfaceCount: areas.length, totalAreaM2: areas.reduce((a, b) => a + b, 0) };
}

/** Seeds the working set of every demo mission that has no vehicle yet, each mission in one transaction. */
export async function seedDemoWorkspace(sequelize: Sequelize, entries: readonly DemoWorkspaceEntry[]): Promise<DemoWorkspaceReport> {
  const report: DemoWorkspaceReport = { vehiclesCreated: 0, scenariosCreated: 0, requirementsCreated: 0, runsCreated: 0 };
  for (const entry of entries) {
    const mission = await MissionModel.findOne({ where: { slug: entry.missionSlug } });
    if (!mission) throw new Error(`demo workspace: no mission ${entry.missionSlug} (seed the demo data first)`);
    if ((await VehicleModel.count({ where: { missionId: mission.id } })) > 0) continue;
    const vehicle = vehicleSpecSchema.parse(entry.vehicle);
    const file = entry.scenario as Record<string, unknown>;
    const requirements = budgetRequirementsSchema.parse(file.requirements ?? []);
    const lead = await UserModel.findOne({
      where: { role: 'lead' },
      include: [{ model: MissionModel, as: 'missions', attributes: [], where: { id: mission.id }, through: { attributes: [] } }],
    });
    const author = await MissionMemberModel.findOne({ where: { missionId: mission.id }, order: [['createdAt', 'ASC']] });
    const by = author?.userId ?? null;
    await sequelize.transaction(async (transaction) => {
      const v = await VehicleModel.create({ missionId: mission.id, name: vehicle.name, kind: vehicle.kind, latestRevision: 1, createdBy: by }, { transaction });
      const revision = await VehicleRevisionModel.create(
        { vehicleId: v.id, revision: 1, spec: vehicle, ...listing(vehicle), note: 'demo data', sourceUploadId: null, createdBy: by },
        { transaction },
      );
      // In the product, requirements belong to the mission: the file's move there.
      const scenario = scenarioSchema.parse({ ...file, vehicle: { ref: revision.id }, requirements: [] });
      const row = await ScenarioModel.create(
        { missionId: mission.id, name: scenario.name, vehicleRevisionId: revision.id, spec: scenario, createdBy: by },
        { transaction },
      );
      for (const r of requirements) {
        await RequirementModel.create(
          { missionId: mission.id, line: r.line, comparator: r.comparator, value: r.value, minMarginPercent: r.minMarginPercent, note: 'demo data', setBy: lead?.id ?? null },
          { transaction },
        );
      }
      const outcome = computeRunOutcome({ scenario, vehicle, vehicleRevisionId: revision.id });
      if (!outcome) throw new Error('demo workspace: the demo run was cancelled');
      const finished = new Date();
      const started = new Date(finished.getTime() - Math.round(outcome.summary.integrator.wallMs));
      const run = await RunModel.create(
        {
          missionId: mission.id,
          scenarioId: row.id,
          vehicleRevisionId: revision.id,
          scenarioSpec: scenario,
          status: 'succeeded',
          progress: 1,
          workerId: 'demo-seed',
          attempts: 1,
          startedAt: started,
          finishedAt: finished,
          createdBy: by,
        },
        { transaction },
      );
      await storeRunOutcome(run.id, outcome, transaction);
      report.vehiclesCreated += 1;
      report.scenariosCreated += 1;
      report.requirementsCreated += requirements.length;
      report.runsCreated += 1;
    });
  }
  return report;
}
