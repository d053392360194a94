/**
 * Test support for runs: vehicle, revision, scenario and upload rows made directly with the models
 * (the vehicle and scenario routes are not needed to test the queue), and polling of a run.
 */
import { createHash, randomUUID } from 'node:crypto';
import type request from 'supertest';
import type { Sequelize, Transaction } from 'sequelize';
import { runSchema, scenarioSchema, vehicleSpecSchema, type Run, type Scenario, type VehicleSpec } from '@photon-ledger/shared';
import corvinaVehicleFile from '@photon-ledger/fixtures/vehicles/corvina-2.vehicle.json' with { type: 'json' };
import corvinaScenario from '@photon-ledger/fixtures/scenarios/corvina-2-geo-30d.scenario.json' with { type: 'json' };
import { MeshModel, MissionModel, ScenarioModel, UploadModel, VehicleModel, VehicleRevisionModel } from '../models';
import { listingColumnsOf } from '../services/vehicle-service';

/** The demo GEO satellite (fixtures/vehicles/corvina-2.vehicle.json). */
export function corvinaVehicle(): VehicleSpec {
  return vehicleSpecSchema.parse(corvinaVehicleFile);
}

/** The demo GEO scenario file (30 days), as written, for tests to shorten. */
export function corvinaScenarioFile(): Record<string, unknown> {
  return structuredClone(corvinaScenario) as Record<string, unknown>;
}

/** The id of a demo mission by slug. */
export async function missionIdBySlug(slug: string): Promise<string> {
  const mission = await MissionModel.findOne({ where: { slug } });
  if (!mission) throw new Error(`no demo mission ${slug}`);
  return mission.id;
}

/** What `createScenarioRows` made. */
export interface ScenarioRows {
  scenarioId: string;
  vehicleRevisionId: string;
  /** The stored spec (parsed, with `vehicle: { ref: revision id }`). */
  scenario: Scenario;
  vehicle: VehicleSpec;
}

/**
 * A vehicle with one revision and a scenario using it, in `missionId`: the corvina-2 scenario with
 * `changes` applied over it (e.g. a shorter span), written in `transaction` or a transaction of its own.
 * The scenario carries no requirements: in the API they belong to the mission.
 */
export async function createScenarioRows(
  sequelize: Sequelize,
  missionId: string,
  changes: Record<string, unknown>,
  vehicle: VehicleSpec = corvinaVehicle(),
  transaction?: Transaction,
): Promise<ScenarioRows> {
  if (!transaction) return sequelize.transaction((t) => createScenarioRows(sequelize, missionId, changes, vehicle, t));
  const tag = randomUUID().slice(0, 8);
  const v = await VehicleModel.create({ missionId, name: `${vehicle.name} ${tag}`, kind: vehicle.kind, latestRevision: 1, createdBy: null }, { transaction });
  // A mesh vehicle lists its mesh's triangles and area (its table is the caller's business).
  const mesh = vehicle.kind === 'mesh' ? await MeshModel.findByPk(vehicle.meshId, { attributes: ['triangleCount', 'totalAreaM2'], transaction }) : null;
  const revision = await VehicleRevisionModel.create(
    {
      vehicleId: v.id,
      revision: 1,
      spec: vehicle,
      ...listingColumnsOf(vehicle, mesh ?? undefined),
      sourceUploadId: null,
      createdBy: null,
    },
    { transaction },
  );
  const parsed = scenarioSchema.parse({ ...corvinaScenarioFile(), requirements: [], ...changes, vehicle: { ref: revision.id } });
  // A unique name unless the caller chose one.
  const name = typeof changes.name === 'string' ? parsed.name : `${parsed.name} ${tag}`;
  const row = await ScenarioModel.create(
    { missionId, name, vehicleRevisionId: revision.id, spec: { ...parsed, name }, createdBy: null },
    { transaction },
  );
  return { scenarioId: row.id, vehicleRevisionId: revision.id, scenario: row.spec, vehicle };
}

/** An uploaded attitude profile (CSV text) in `missionId`; returns its id. */
export async function createAttitudeUpload(missionId: string, csv: string): Promise<string> {
  const data = Buffer.from(csv, 'utf8');
  const upload = await UploadModel.create({
    missionId,
    kind: 'attitude-profile',
    fileName: 'profile.csv',
    contentType: 'text/csv',
    sizeBytes: data.length,
    sha256: createHash('sha256').update(data).digest('hex'),
    data,
    createdBy: null,
  });
  return upload.id;
}

type Agent = ReturnType<typeof request.agent>;

/** Reads a run through the API. */
export async function readRun(agent: Agent, missionId: string, runId: string): Promise<Run> {
  const res = await agent.get(`/api/missions/${missionId}/runs/${runId}`);
  if (res.status !== 200) throw new Error(`GET run answered ${res.status}: ${JSON.stringify(res.body)}`);
  return runSchema.parse(res.body);
}

/**
 * Polls a run every `everyMs` until `until` holds; `seen` hears every reading. Throws with the last
 * reading after `timeoutMs` (a hang, not a speed check).
 */
export async function pollRun(
  agent: Agent,
  missionId: string,
  runId: string,
  until: (run: Run) => boolean,
  { timeoutMs = 60_000, everyMs = 100, seen }: { timeoutMs?: number; everyMs?: number; seen?: (run: Run) => void } = {},
): Promise<Run> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const run = await readRun(agent, missionId, runId);
    seen?.(run);
    if (until(run)) return run;
    if (Date.now() > deadline) throw new Error(`run ${runId} did not reach the awaited state; last: ${JSON.stringify(run)}`);
    await new Promise((resolve) => setTimeout(resolve, everyMs));
  }
}

/** A finished status. */
export const isFinished = (run: Run) => run.status === 'succeeded' || run.status === 'failed' || run.status === 'cancelled';
