/**
 * The inputs a shadow evaluation needs during propagation: Sun and Moon positions from the
 * interpolated ephemeris, against astronomy-engine called directly. Prints the speed-up.
 */
import { createGeocentricEphemeris } from '../src/bodies/geocentric-ephemeris';
import { moonPositionEci, sunPositionEci } from '../src/bodies/ephemeris';
import type { Vec3 } from '../src/math/vec3';
import { astroTimeAt, parseUtcEpoch } from '../src/time/epoch';
import { measure } from './measure';

const epoch = parseUtcEpoch('2026-03-01T00:00:00Z');
const span = 30 * 86_400;
const t0 = performance.now();
const eph = createGeocentricEphemeris(epoch, 0, span);
console.log(`fit Sun and Moon over 30 days: ${(performance.now() - t0).toFixed(1)} ms`);

const out: Vec3 = [0, 0, 0];
let t = 0;
let sink = 0;
const step = 12_345.678;
const interpSun = measure('interpolated Sun position', 1, () => {
  t = (t + step) % span;
  sink += eph.sunPositionAt(out, t)[0];
});
const interpMoon = measure('interpolated Moon position', 1, () => {
  t = (t + step) % span;
  sink += eph.moonPositionAt(out, t)[0];
});
const directSun = measure('astronomy-engine Sun (GeoVector), with time conversion', 1, () => {
  t = (t + step) % span;
  sink += sunPositionEci(out, astroTimeAt(epoch, t))[0];
}, 100);
const directMoon = measure('astronomy-engine Moon (GeoMoon), with time conversion', 1, () => {
  t = (t + step) % span;
  sink += moonPositionEci(out, astroTimeAt(epoch, t))[0];
}, 100);
console.log(`speed-up: Sun ${(interpSun / directSun).toFixed(0)}x, Moon ${(interpMoon / directMoon).toFixed(0)}x`);
if (sink === 42) console.log('');
