/**
 * The demo missions' working set, so a first start shows a product in use: per demo mission a
 * vehicle (revision 1), a scenario using it, the scenario file's requirements as the mission's
 * (set by the mission's lead) and one succeeded run computed at seeding time; corvina-2 also gets
 * a mesh vehicle (the box-wing mesh of fixtures/meshes) with its coefficient table computed at
 * seeding time. A mission that already has a vehicle is left alone, so seeding again changes
 * nothing and keeps the user's edits.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Sequelize } from 'sequelize';
import { budgetRequirementsSchema, scenarioSchema, vehicleSpecSchema, type VehicleSpec } from '@photon-ledger/shared';
import type { DemoWorkspaceEntry } from '@photon-ledger/fixtures';
import { MissionMemberModel, MissionModel, RequirementModel, RunModel, ScenarioModel, toUser, UserModel, VehicleModel, VehicleRevisionModel } from '../models';
import type { JobSender } from '../jobs/job-sender';
import { computeTableHere } from '../jobs/coefficient-table-job';
import { findVehicleTable } from './coefficient-table-service';
import { importMesh } from './mesh-service';
import { computeRunOutcome, storeRunOutcome } from './run-outcome';
import { insertVehicle, listingColumnsOf } from './vehicle-service';

/** What seeding the working set created. */
export interface DemoWorkspaceReport {
  vehiclesCreated: number;
  scenariosCreated: number;
  requirementsCreated: number;
  runsCreated: number;
}


/** The demo mesh vehicle: in this mission, from this fixture file. */
const DEMO_MESH = {
  missionSlug: 'corvina-2',
  file: '@photon-ledger/fixtures/meshes/corvina-2-box-wing.obj',
  meshName: 'Corvina-2 box-wing mesh',
  vehicleName: 'Corvina-2 mesh model',
} as const;

/**
 * Seeding runs before any worker or queue exists: the demo table's chunks are computed right here
 * (computeTableHere), so nothing is queued for them.
 */
const noQueue: JobSender = { send: async () => null, close: async () => {} };

/**
 * The corvina-2 mesh vehicle: the box-wing mesh imported as a user would, a vehicle over it (the
 * plate model's mass and centre of mass; 10° table, 4 samples per facet) and its table computed
 * here (about a second for its 880 triangles).
 */
export async function seedDemoMeshVehicle(sequelize: Sequelize, missionId: string, authorId: string, base: VehicleSpec): Promise<void> {
  const author = await UserModel.findByPk(authorId);
  if (!author) return;
  const user = toUser(author);
  const bytes = readFileSync(fileURLToPath(import.meta.resolve(DEMO_MESH.file)));
  const mesh = await importMesh(
    user,
    missionId,
    { buffer: bytes, originalName: 'corvina-2-box-wing.obj', contentType: 'model/obj', fields: {} },
    { name: DEMO_MESH.meshName, units: 'm', rotationDeg: [0, 0, 0], translationM: [0, 0, 0] },
  );
  const spec = vehicleSpecSchema.parse({
    kind: 'mesh',
    name: DEMO_MESH.vehicleName,
    description: 'The Corvina-2 box-wing as a triangle mesh: the dish shades part of the Earth-facing bus face; SRP interpolated from its coefficient table.',
    massKg: base.massKg,
    centreOfMassM: base.centreOfMassM,
    meshId: mesh.id,
    optics: {
      default: { front: 'mli-kapton' },
      groups: {
        'wing-north': { front: 'solar-cell', back: 'solar-array-back' },
        'wing-south': { front: 'solar-cell', back: 'solar-array-back' },
        dish: { front: 'white-paint', back: 'white-paint' },
      },
    },
    table: { stepDeg: 10, samplesPerFacet: 4, specularBounce: false },
  });
  await sequelize.transaction((transaction) => insertVehicle(transaction, user, missionId, DEMO_MESH.vehicleName, spec, { note: 'demo data', jobs: noQueue }));
  if (spec.kind !== 'mesh') return;
  const table = await findVehicleTable(spec);
  if (table) await computeTableHere(sequelize, table.id, 'demo-seed');
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
        { vehicleId: v.id, revision: 1, spec: vehicle, ...listingColumnsOf(vehicle), note: 'demo data', sourceUploadId: null, createdBy: by },
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
    if (entry.missionSlug === DEMO_MESH.missionSlug && by) {
      await seedDemoMeshVehicle(sequelize, mission.id, by, vehicle);
      report.vehiclesCreated += 1;
    }
  }
  return report;
}
