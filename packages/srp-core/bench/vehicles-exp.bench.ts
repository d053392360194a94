/**
 * SRP force-and-torque evaluations per second (one core): a 10-plate box-wing vehicle with two
 * Sun-tracking wings, and a non-ideal solar sail, over a precomputed ring of Sun directions.
 * Target: ≥ 5 million 10-plate evaluations per second.
 */
import { measure } from './measure';
import { compileVehicle } from '../src/vehicles/compile-vehicle';
import { createSrpResult, evaluateSrp } from '../src/vehicles/evaluate-srp';
import type { PlateVehicleSpec, SailSpec } from '../src/vehicles/vehicle-spec';
import { radiationPressureAt } from '../src/radiation/flux';
import type { Vec3 } from '../src/math/vec3';

const DEG = Math.PI / 180;

const boxWing: PlateVehicleSpec = {
  kind: 'plates',
  name: 'bench box-wing',
  massKg: 4200,
  centreOfMassM: [0.05, -0.02, 1.4],
  plates: [
    { name: '+x', areaM2: 6.6, normal: [1, 0, 0], centroidM: [1.2, 0, 1.5], front: 'mli-kapton' },
    { name: '-x', areaM2: 6.6, normal: [-1, 0, 0], centroidM: [-1.2, 0, 1.5], front: 'mli-kapton' },
    { name: '+y', areaM2: 7.2, normal: [0, 1, 0], centroidM: [0, 1.1, 1.5], front: 'osr-radiator' },
    { name: '-y', areaM2: 7.2, normal: [0, -1, 0], centroidM: [0, -1.1, 1.5], front: 'osr-radiator' },
    { name: '+z', areaM2: 5.28, normal: [0, 0, 1], centroidM: [0, 0, 3], front: 'mli-kapton' },
    { name: '-z', areaM2: 5.28, normal: [0, 0, -1], centroidM: [0, 0, 0], front: 'mli-kapton' },
    {
      name: 'wing +y',
      areaM2: 35,
      normal: [1, 0, 0],
      centroidM: [0, 9, 1.5],
      front: 'solar-cell',
      back: 'solar-array-back',
      trackingAxis: [0, 1, 0],
    },
    {
      name: 'wing -y',
      areaM2: 35,
      normal: [1, 0, 0],
      centroidM: [0, -9, 1.5],
      front: 'solar-cell',
      back: 'solar-array-back',
      trackingAxis: [0, -1, 0],
      trackingLimitsRad: [-150 * DEG, 150 * DEG],
    },
    { name: 'reflector', areaM2: 5.31, normal: [0, 0, 1], centroidM: [1.8, 0, 3.2], front: 'white-paint', back: 'black-paint' },
    { name: 'sunshade', areaM2: 1.2, normal: [1, 0, 0], centroidM: [1.6, 0.4, 2.8], front: 'white-paint' },
  ],
};

const sail: SailSpec = {
  kind: 'sail',
  name: 'bench sail',
  massKg: 40,
  centreOfMassM: [0, 0, 0],
  areaM2: 196,
  normal: [1, 0, 0],
  centroidM: [0.01, 0.02, 0],
  optics: 'mcinnes-square-sail',
};

/** Unit Sun directions spread over the sphere (a Fibonacci lattice), packed stride 3. */
function sunDirections(count: number): Float64Array {
  const out = new Float64Array(3 * count);
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < count; i += 1) {
    const z = 1 - (2 * (i + 0.5)) / count;
    const r = Math.sqrt(1 - z * z);
    out[3 * i] = r * Math.cos(golden * i);
    out[3 * i + 1] = r * Math.sin(golden * i);
    out[3 * i + 2] = z;
  }
  return out;
}

const COUNT = 1024;
const dirs = sunDirections(COUNT);
const pressure = radiationPressureAt(149_597_870_700);
const sun: Vec3 = [0.5, 0.5, 0.5]; // doubles from the start: one elements kind throughout
const sink = new Float64Array(1); // keeps the results alive without boxing a captured number

function bench(label: string, spec: PlateVehicleSpec | SailSpec, perSurface: boolean): number {
  const vehicle = compileVehicle(spec);
  const result = createSrpResult(vehicle, { perSurface });
  const rate = measure(label, COUNT, () => {
    let acc = 0;
    for (let i = 0; i < COUNT; i += 1) {
      sun[0] = dirs[3 * i]!;
      sun[1] = dirs[3 * i + 1]!;
      sun[2] = dirs[3 * i + 2]!;
      evaluateSrp(result, vehicle, sun, pressure, 1);
      acc += result.forceBody[0] + result.torqueBody[2];
    }
    sink[0] = sink[0]! + acc;
  });
  if (!Number.isFinite(sink[0])) throw new Error('non-finite force in the benchmark');
  return rate;
}

const plates0 = bench('A 10-plate', boxWing, false);
const plates = bench('B 10-plate', boxWing, false);
bench('10-plate box-wing, force + torque + per-surface buffer', boxWing, true);
bench('non-ideal square sail, force + torque', sail, false);
const target = 5e6;
console.log(
  `10-plate target ${(target / 1e6).toFixed(1)} million/s: ${plates >= target ? 'met' : 'NOT met'} ` +
    `(ratio ${(plates / target).toFixed(2)})`,
);
