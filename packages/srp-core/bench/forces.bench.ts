/**
 * Force-model throughput: full derivative evaluations per second on one core, the load the
 * integrator puts on the force models. Target (issue 4): ≥ 1 million per second for a GEO state
 * under the full model: central body + zonal J2 … J6 + Sun + Moon (interpolated ephemeris) + SRP
 * on a 10-plate box-wing vehicle with two Sun-tracking wings, Sun-pointing attitude and the conical
 * Earth + Moon shadow. Each call uses a new time (as the integrator's stages do), so the
 * ephemeris memo interpolates the Sun and the Moon once per call, not never.
 * Also printed: each force alone, to see where the time goes.
 */
import { createAttitudeLaw } from '../src/attitude/attitude-law';
import { createGeocentricEphemeris } from '../src/bodies/geocentric-ephemeris';
import { createCentralBodyForce } from '../src/propagation/forces/central-body';
import { createDynamics } from '../src/propagation/forces/dynamics';
import { createZonalForce } from '../src/propagation/forces/earth-zonal';
import type { ForceModel } from '../src/propagation/forces/force-model';
import { createSrpForce } from '../src/propagation/forces/srp-force';
import { createMoonThirdBodyForce, createSunThirdBodyForce } from '../src/propagation/forces/third-body';
import { propagateKepler } from '../src/propagation/kepler';
import type { Vec3 } from '../src/math/vec3';
import { parseUtcEpoch } from '../src/time/epoch';
import { compileVehicle } from '../src/vehicles/compile-vehicle';
import type { PlateVehicleSpec } from '../src/vehicles/vehicle-spec';
import { measure, referenceLoopNs } from './measure';
import { benchBoxWing as boxWing } from './bench-vehicles';

const DEG = Math.PI / 180;
const MU = 3.986004418e14;

/** The demo GEO box-wing (fixtures/vehicles/corvina-2: same plates and optics, written in SI here). */

const epoch = parseUtcEpoch('2026-03-20T00:00:00Z'); // equinox season: GEO eclipses occur
const DAY = 86_400;
const ephemeris = createGeocentricEphemeris(epoch, 0, 2 * DAY);
const vehicle = compileVehicle(boxWing);
const attitude = createAttitudeLaw({
  law: 'sun-pointing',
  sunAxisBody: [1, 0, 0],
  secondaryAxisBody: [0, 1, 0],
  secondaryReference: 'orbit-normal',
});

const central = createCentralBodyForce(MU);
const zonal = createZonalForce({ degree: 6 });
const sun = createSunThirdBodyForce(ephemeris);
const moon = createMoonThirdBodyForce(ephemeris);
const srp = createSrpForce({ vehicle, attitude, shadowModel: 'conical', centralBody: 'earth', ephemeris });
const forces: ForceModel[] = [central, zonal, sun, moon, srp];
const f = createDynamics(forces);

// States along one GEO orbit (inclined 0.05°), one per time; 1024 samples over a sidereal day.
const N = 1024;
const R_GEO = 42_164_170;
const V_GEO = Math.sqrt(MU / R_GEO);
const y0 = Float64Array.of(R_GEO, 0, 0, 0, V_GEO * Math.cos(0.05 * DEG), V_GEO * Math.sin(0.05 * DEG));
const states: Float64Array[] = [];
const times = new Float64Array(N);
for (let i = 0; i < N; i += 1) {
  times[i] = (86_164 * i) / N;
  states.push(propagateKepler(new Float64Array(6), y0, times[i]!, MU));
}
const dydt = new Float64Array(6);
const sink = new Float64Array(1);
let k = 0;
const nudge = new Float64Array(1); // a fresh time every call, even after the 1024 samples wrap round

console.log(`reference loop before: ${referenceLoopNs().toFixed(2)} ns per iteration`);

const FULL_LABEL = 'full force model (central + J2..J6 + Sun + Moon + SRP 10 plates, conical Earth+Moon shadow)';
function fullModel(): void {
  const i = k++ & (N - 1);
  nudge[0] = nudge[0]! + 1e-6;
  f(dydt, times[i]! + nudge[0]!, states[i]!);
  sink[0] = sink[0]! + dydt[3]!;
}
// Warm-up of 1.5 s before the first timing: on the 2-core development VM the first second runs
// about half as fast (background JIT compilation sharing the core; the reference loop shows it).
for (const start = performance.now(); performance.now() - start < 1500; ) for (let i = 0; i < 1000; i += 1) fullModel();
console.log(`reference loop after warm-up: ${referenceLoopNs().toFixed(2)} ns per iteration`);
let full = measure(FULL_LABEL, 1, fullModel);
const a: Vec3 = [0, 0, 0];
for (const force of forces) {
  measure(`  ${force.name} alone`, 1, () => {
    const i = k++ & (N - 1);
    nudge[0] = nudge[0]! + 1e-6;
    force.acceleration(a, times[i]! + nudge[0]!, states[i]!);
    sink[0] = sink[0]! + a[0];
  });
}
full = Math.max(full, measure(`${FULL_LABEL}, again`, 1, fullModel));
console.log(`reference loop after: ${referenceLoopNs().toFixed(2)} ns per iteration`);
console.log(`target 1 million/s full evaluations: ${full >= 1e6 ? 'met' : 'NOT met'} (${(full / 1e6).toFixed(2)}x)`);
if (!Number.isFinite(sink[0])) throw new Error('non-finite acceleration in the benchmark');
