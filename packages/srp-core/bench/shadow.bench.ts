/**
 * Shadow-model throughput: one core, allocation-free evaluations. Target (issue "srp-core physics"):
 * at least 5 million single-body conical evaluations per second.
 * The positions walk a LEO orbit whose plane contains the Sun, so a fixed share of the calls lands
 * in the penumbra and umbra (printed below), not only in the cheap sunlit branch.
 */
import { EARTH_EQUATORIAL_RADIUS, MOON_RADIUS } from '../src/bodies/body-constants';
import type { Vec3 } from '../src/math/vec3';
import {
  conicalShadowFraction,
  cylindricalShadowFraction,
  twoBodyConicalShadowFraction,
} from '../src/radiation/shadow';
import { measure } from './measure';

const AU = 149_597_870_700;
const ORIGIN: Vec3 = [0, 0, 0];
const sunPosEci: Vec3 = [AU, 0, 0];
const N = 4096;
// Orbit radius 6778 km; points concentrated near the shadow boundary (1/4 of them) and spread elsewhere.
const positions: Vec3[] = [];
for (let i = 0; i < N; i += 1) {
  const edge = Math.asin(EARTH_EQUATORIAL_RADIUS / 6_778_000); // anti-sun angle of the shadow edge
  const theta = i % 4 === 0 ? Math.PI - edge + ((i / N) - 0.5) * 0.02 : (2 * Math.PI * i) / N;
  positions.push([6_778_000 * Math.cos(theta), 6_778_000 * Math.sin(theta), 1000 * Math.sin(i)]);
}
const moonNear: Vec3 = [-384_400_000, 3_000_000, 0]; // behind the Earth: both bodies matter at times

let lit = 0;
let partial = 0;
let dark = 0;
for (const p of positions) {
  const nu = conicalShadowFraction(p, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
  if (nu === 1) lit += 1;
  else if (nu === 0) dark += 1;
  else partial += 1;
}
console.log(`sample: ${lit} sunlit, ${partial} penumbra, ${dark} umbra of ${N}`);

let sink = 0;
let k = 0;
const conical = measure('conical shadow, one body', 1, () => {
  sink += conicalShadowFraction(positions[k++ & (N - 1)] as Vec3, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
});
measure('cylindrical shadow, one body', 1, () => {
  sink += cylindricalShadowFraction(positions[k++ & (N - 1)] as Vec3, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
});
measure('conical shadow, Earth and Moon', 1, () => {
  sink += twoBodyConicalShadowFraction(
    positions[k++ & (N - 1)] as Vec3,
    sunPosEci,
    ORIGIN,
    EARTH_EQUATORIAL_RADIUS,
    moonNear,
    MOON_RADIUS,
  );
});
// The penumbra branch alone (asin, atan2 and two acos per call).
const penumbra = positions.filter((p) => {
  const nu = conicalShadowFraction(p, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
  return nu > 0 && nu < 1;
});
const P = penumbra.length;
measure(`conical shadow, penumbra only (${P} points)`, 1, () => {
  sink += conicalShadowFraction(penumbra[k++ % P] as Vec3, sunPosEci, ORIGIN, EARTH_EQUATORIAL_RADIUS);
});
console.log(`target 5 million/s single-body conical: ${conical >= 5e6 ? 'met' : 'NOT met'} (${(conical / 5e6).toFixed(1)}x)`);
if (sink === 42) console.log('');
