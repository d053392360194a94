/**
 * Attitude-law evaluations per second (one core) through `attitudeAt`: the Sun-pointing law with
 * an orbit-normal secondary reference over a ring of precomputed states, the LVLH and sail laws
 * for comparison, and the tabulated law (1441 rows, one a minute for a day) with monotone time
 * (cursor) and with random times (binary search). Figures only; nothing is asserted.
 */
import { measure } from './measure';
import { attitudeAt, createAttitudeLaw } from '../src/attitude/attitude-law';
import { createQuat } from '../src/attitude/quaternion';
import type { Vec3 } from '../src/math/vec3';

const N = 1024;
const MU = 3.986004418e14; // m³/s², GM of the Earth (IERS Conventions 2010)
const A = 7.0e6; // m
const speed = Math.sqrt(MU / A);
const inc = 0.9;
const states: { r: Vec3; v: Vec3; sun: Vec3 }[] = [];
for (let i = 0; i < N; i += 1) {
  const u = (2 * Math.PI * i) / N;
  const r: Vec3 = [A * Math.cos(u), A * Math.sin(u) * Math.cos(inc), A * Math.sin(u) * Math.sin(inc)];
  const v: Vec3 = [-speed * Math.sin(u), speed * Math.cos(u) * Math.cos(inc), speed * Math.cos(u) * Math.sin(inc)];
  const lambda = (2 * Math.PI * i) / (N * 365);
  const sun: Vec3 = [1.496e11 * Math.cos(lambda), 1.372e11 * Math.sin(lambda), 0.595e11 * Math.sin(lambda)];
  states.push({ r, v, sun });
}

const out = createQuat();
let sink = 0;

function bench(label: string, law: ReturnType<typeof createAttitudeLaw>): void {
  let k = 0;
  measure(label, N, () => {
    for (let i = 0; i < N; i += 1) {
      const s = states[i]!;
      attitudeAt(out, law, k, s.r, s.v, s.sun);
      sink += out[0];
    }
    k += 1;
  });
}

bench(
  'sun-pointing (+z to the Sun, +x to the orbit normal)',
  createAttitudeLaw({ law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], secondaryReference: 'orbit-normal' }),
);
bench('lvlh with a yaw offset', createAttitudeLaw({ law: 'lvlh', offsetQuaternion: [Math.SQRT1_2, 0, 0, Math.SQRT1_2] }));
bench(
  'sail cone/clock (fixed angles)',
  createAttitudeLaw({ law: 'sail-cone-clock', normalAxisBody: [0, 0, 1], coneRad: 0.6, clockRad: 1.5 }),
);

// Tabulated: a day at one row a minute, a slow tumble about a fixed axis.
const ROWS = 1441;
const timesS = Array.from({ length: ROWS }, (_, i) => 60 * i);
const quaternions = timesS.flatMap((_, i) => {
  const half = 0.002 * i;
  return [Math.cos(half), 0.6 * Math.sin(half), 0, 0.8 * Math.sin(half)];
});
const profile = { timesS, quaternions };
const tEnd = timesS[ROWS - 1]!;

const monotone = createAttitudeLaw({ law: 'tabulated', profile });
// 10 s steps (an integrator's pace): consecutive calls stay in the same or the next interval.
const STEP = 10;
const span = STEP * N;
let sweepStart = 0;
measure(`tabulated, ${ROWS} rows, monotone time in 10 s steps (cursor)`, N, () => {
  sweepStart = (sweepStart + span) % (tEnd - span);
  for (let i = 0; i < N; i += 1) {
    attitudeAt(out, monotone, sweepStart + STEP * i, states[0]!.r, states[0]!.v, states[0]!.sun);
    sink += out[0];
  }
});

const random = createAttitudeLaw({ law: 'tabulated', profile });
let seed = 12345;
const randomTimes = Float64Array.from({ length: N }, () => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return (seed / 2147483648) * tEnd;
});
measure(`tabulated, ${ROWS} rows, random time (binary search)`, N, () => {
  for (let i = 0; i < N; i += 1) {
    attitudeAt(out, random, randomTimes[i]!, states[0]!.r, states[0]!.v, states[0]!.sun);
    sink += out[0];
  }
});

if (sink === 42) console.log('(sink)'); // keeps the results alive for the JIT
