import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { scenarioSchema, vehicleSpecSchema } from '@photon-ledger/shared';
import { describe, expect, it } from 'vitest';
import { buildScenarioRun } from '../../io/scenario-adapter';
import { vehicleFromFile } from '../../io/vehicle-adapter';
import type { Vec3 } from '../math/vec3';
import { propagate, type PropagationResult } from '../propagation/propagate';
import { compileVehicle } from '../vehicles/compile-vehicle';
import { createSrpResult, evaluateSrp } from '../vehicles/evaluate-srp';
import type { SurfaceOptics } from '../vehicles/surface-optics';
import type { MeshTableSpec, PlateVehicleSpec } from '../vehicles/vehicle-spec';
import { srpErrorFor } from '../vehicles/vehicle-test-helpers';
import { computeCoefficientTable, interpolateCoefficientTable } from './coefficient-table';
import { createMeshIllumination, illuminateMesh } from './illuminate-mesh';
import { createMeshScene } from './mesh-scene';
import { boxPlates, MeshBuilder } from './mesh-test-helpers';

const optics: SurfaceOptics = { absorbed: 0.6, specular: 0.25, diffuse: 0.15, emissivityFront: 0.7, emissivityBack: 0.3 };
const boxMin: Vec3 = [-1, -1.1, 0];
const boxMax: Vec3 = [1.2, 1.1, 3];
const com: Vec3 = [0.08, -0.03, 1.4];

const plateSpec: PlateVehicleSpec = { kind: 'plates', name: 'box', massKg: 1800, centreOfMassM: com, plates: boxPlates(boxMin, boxMax, optics) };
const scene = createMeshScene(new MeshBuilder().box('bus', boxMin, boxMax, 3).mesh(), { default: { front: optics } });
const tableSettings = (stepDeg: number) => ({ stepDeg, samplesPerFacet: 1, specularBounce: false });
const table5 = computeCoefficientTable(scene, tableSettings(5));
const meshSpec = (stepDeg: number, table = stepDeg === 5 ? table5 : computeCoefficientTable(scene, tableSettings(stepDeg))): MeshTableSpec => ({
  kind: 'mesh',
  name: 'box as a mesh',
  massKg: 1800,
  centreOfMassM: com,
  table,
});

describe('the mesh vehicle kind', () => {
  it('compiles to one surface named mesh that keeps its table; other kinds have none', () => {
    const v = compileVehicle(meshSpec(5));
    expect(v.kind).toBe('mesh');
    expect(v.surfaceNames).toEqual(['mesh']);
    expect(v.surfaceCount).toBe(1);
    expect(v.meshTable).toBe(table5);
    expect(compileVehicle(plateSpec).meshTable).toBeNull();
  });

  it('evaluateSrp scales the interpolated force by P f and takes torque about the centre of mass', () => {
    const v = compileVehicle(meshSpec(5));
    const result = createSrpResult(v, { perSurface: true });
    const s: Vec3 = [0.3, -0.5, Math.sqrt(1 - 0.34)];
    const P = 4.56e-6;
    evaluateSrp(result, v, s, P, 0.7);
    const m = interpolateCoefficientTable(new Float64Array(6), table5, s);
    const F: Vec3 = [0.7 * P * m[0]!, 0.7 * P * m[1]!, 0.7 * P * m[2]!];
    for (let k = 0; k < 3; k += 1) expect(result.forceBody[k]).toBeCloseTo(F[k]!, 18);
    // τ_CoM = τ_origin - r_CoM × F.
    const tc: Vec3 = [
      0.7 * P * m[3]! - (com[1] * F[2] - com[2] * F[1]),
      0.7 * P * m[4]! - (com[2] * F[0] - com[0] * F[2]),
      0.7 * P * m[5]! - (com[0] * F[1] - com[1] * F[0]),
    ];
    for (let k = 0; k < 3; k += 1) expect(result.torqueBody[k]).toBeCloseTo(tc[k]!, 18);
    expect(Array.from(result.surfacesBody)).toEqual([...result.forceBody, ...result.torqueBody]);
    evaluateSrp(result, v, s, P, 0);
    expect([...result.forceBody, ...result.torqueBody]).toEqual([0, 0, 0, 0, 0, 0]);
  });

  it('at the table nodes the mesh vehicle equals the 6-plate vehicle (convex box, nothing shades)', () => {
    const mesh = compileVehicle(meshSpec(10));
    const plates = compileVehicle(plateSpec);
    const a = createSrpResult(mesh);
    const b = createSrpResult(plates);
    for (let i = 1; i < 18; i += 1) {
      for (let j = 0; j < 36; j += 1) {
        const th = (i * 10 * Math.PI) / 180;
        const ph = (j * 10 * Math.PI) / 180;
        const s: Vec3 = [Math.sin(th) * Math.cos(ph), Math.sin(th) * Math.sin(ph), Math.cos(th)];
        evaluateSrp(a, mesh, s, 1, 1);
        evaluateSrp(b, plates, s, 1, 1);
        const scale = Math.hypot(...b.forceBody);
        for (let k = 0; k < 3; k += 1) {
          // 1e-12: at a node the blend weights are 1 and 0 up to the rounding of acos/atan2.
          expect(Math.abs(a.forceBody[k]! - b.forceBody[k]!)).toBeLessThanOrEqual(1e-12 * scale);
          // Torque judged against |F| × the box size (3 m): a torque that cancels is not judged against itself.
          expect(Math.abs(a.torqueBody[k]! - b.torqueBody[k]!)).toBeLessThanOrEqual(1e-12 * scale * 3);
        }
      }
    }
  });

  it('refuses a table of the wrong shape or with a non-finite number, naming the field', () => {
    expect(() => compileVehicle({ ...meshSpec(5), table: { ...table5, azimuthCount: 71 } })).toThrow(
      srpErrorFor('invalid_input', 'table.azimuthCount'),
    );
    expect(() => compileVehicle({ ...meshSpec(5), table: { ...table5, stepDeg: 7 } })).toThrow(srpErrorFor('invalid_input', 'table.stepDeg'));
    const values = Float64Array.from(table5.values);
    values[99] = Number.POSITIVE_INFINITY;
    expect(() => compileVehicle({ ...meshSpec(5), table: { ...table5, values } })).toThrow(srpErrorFor('invalid_input', 'table.values.99'));
    expect(() => compileVehicle({ ...meshSpec(5), table: undefined as never })).toThrow(srpErrorFor('invalid_input', 'table'));
  });
});

describe('vehicleFromFile for a mesh vehicle', () => {
  const file = vehicleSpecSchema.parse({
    kind: 'mesh',
    name: 'Box mesh',
    massKg: 1800,
    centreOfMassM: com,
    meshId: '0b8a4c43-36f4-4d51-9a3c-6f0b1b7c7e11',
    optics: { default: { front: optics } },
    table: { stepDeg: 5, samplesPerFacet: 1 },
  });

  it('without its coefficient table: an SrpError saying the mesh vehicle needs it', () => {
    expect(() => vehicleFromFile(file)).toThrow(srpErrorFor('invalid_input', 'table'));
    expect(() => vehicleFromFile(file)).toThrow(/needs its coefficient table/);
  });

  it('with it: a MeshTableSpec around the table; a table of another step is refused', () => {
    const spec = vehicleFromFile(file, { meshTable: table5 });
    expect(spec).toEqual({ kind: 'mesh', name: 'Box mesh', massKg: 1800, centreOfMassM: com, table: table5 });
    expect(compileVehicle(spec).meshTable).toBe(table5);
    const table10 = computeCoefficientTable(scene, tableSettings(10));
    expect(() => vehicleFromFile(file, { meshTable: table10 })).toThrow(srpErrorFor('invalid_input', 'table.stepDeg'));
  });
});

describe('the same vehicle as plates and as a mesh propagates to the same trajectory (issue 8 item 4)', () => {
  // One day in GEO in LVLH attitude, so that the Sun sweeps the whole equator of the body frame
  // and the table is interpolated between nodes all the time; SRP only (with the central body),
  // conical Earth shadow.
  const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../../fixtures');
  const base = JSON.parse(readFileSync(path.join(fixtures, 'scenarios/corvina-2-geo-30d.scenario.json'), 'utf8')) as Record<string, unknown>;
  const scenario = scenarioSchema.parse({
    ...base,
    spanDays: 1,
    outputStepS: 1800,
    forces: { zonalDegree: 0, sun: false, moon: false, srp: true },
    shadow: { model: 'conical', bodies: ['earth'] },
    events: { nodes: false, radiiKm: [] },
    requirements: [],
  });
  const run = (spec: PlateVehicleSpec | MeshTableSpec): PropagationResult => propagate(buildScenarioRun(scenario, spec).request);
  const plates = run(plateSpec);

  function maxPositionDifference(other: PropagationResult): number {
    expect(other.sampleCount).toBe(plates.sampleCount);
    const stride = plates.layout.stride;
    let max = 0;
    for (let r = 0; r < plates.sampleCount; r += 1) {
      const o = r * stride + plates.layout.r;
      max = Math.max(
        max,
        Math.hypot(other.samples[o]! - plates.samples[o]!, other.samples[o + 1]! - plates.samples[o + 1]!, other.samples[o + 2]! - plates.samples[o + 2]!),
      );
    }
    return max;
  }

  /** Largest |ΔF| / |F| of the table against direct evaluation over Sun directions in the body's xy plane (LVLH sweeps it). */
  function tableError(stepDeg: number): number {
    const table = stepDeg === 5 ? table5 : computeCoefficientTable(scene, tableSettings(stepDeg));
    const out = new Float64Array(6);
    const direct = createMeshIllumination(scene);
    let max = 0;
    for (let k = 0; k < 720; k += 1) {
      const phi = ((k + 0.37) * Math.PI) / 360;
      // Up to 25° off the xy plane: LVLH at zero inclination keeps the Sun within the season's declination.
      const lat = (((k * 7) % 51) - 25) * (Math.PI / 180);
      const s: Vec3 = [Math.cos(lat) * Math.cos(phi), Math.cos(lat) * Math.sin(phi), Math.sin(lat)];
      interpolateCoefficientTable(out, table, s);
      illuminateMesh(scene, s, tableSettings(stepDeg), direct);
      const f = direct.forcePerPressure;
      max = Math.max(max, Math.hypot(out[0]! - f[0], out[1]! - f[1], out[2]! - f[2]) / Math.hypot(...f));
    }
    return max;
  }

  it('within the bound 3 e_table × a_SRP × t²/2, and closer with a finer table (differences printed)', () => {
    // SRP acceleration scale: the largest over the run's samples (SRP columns of the plate run).
    const srpAccel = plates.layout.srpAccelInertial;
    let aMax = 0;
    for (let r = 0; r < plates.sampleCount; r += 1) {
      const o = r * plates.layout.stride + srpAccel;
      aMax = Math.max(aMax, Math.hypot(plates.samples[o]!, plates.samples[o + 1]!, plates.samples[o + 2]!));
    }
    const t = scenario.spanDays * 86_400;
    const coarse = maxPositionDifference(run(meshSpec(5)));
    const fine = maxPositionDifference(run(meshSpec(1)));
    const e5 = tableError(5);
    // A constant force error δa displaces the orbit by δa t²/2 in free space; in orbit an
    // along-track δa also changes the period, and the Clohessy–Wiltshire solution's along-track
    // drift grows as (3/2) δa t² for t beyond an orbit: three times more. So the bound is
    // 3 e_table a_SRP t²/2, with e_table the table's worst relative force error.
    const bound5 = (3 * e5 * aMax * (t * t)) / 2;
    const srpDisplacement = aMax * (t * t) / 2;
    console.log(
      `plates vs mesh table, 1 day GEO, LVLH: max position difference 5° table ${coarse.toFixed(3)} m, 1° table ${fine.toFixed(4)} m; ` +
        `SRP ${aMax.toExponential(3)} m/s² (a t²/2 = ${srpDisplacement.toFixed(1)} m); 5° table error ${(100 * e5).toFixed(3)} % → bound ${bound5.toFixed(2)} m`,
    );
    expect(coarse).toBeGreaterThan(0); // the table really differs from the plates between nodes
    expect(coarse).toBeLessThan(bound5);
    // Interpolation error falls as the step squared: (5/1)² = 25; measured ratio ~78.
    expect(fine).toBeLessThan(coarse / 10);
  });
});
