import { Seasons } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { ASTRONOMICAL_UNIT } from '../constants';
import type { Vec3 } from '../math/vec3';
import { astroTimeAt, parseUtcEpoch, secondsBetween } from '../time/epoch';
import { moonPositionEci, planetNames, planetPositionHci, sunPositionEci, type PlanetName } from './ephemeris';

const DEG = Math.PI / 180;
const norm = (v: Vec3): number => Math.hypot(v[0], v[1], v[2]);
const declinationDeg = (v: Vec3): number => Math.asin(v[2] / norm(v)) / DEG;
const rightAscensionDeg = (v: Vec3): number => Math.atan2(v[1], v[0]) / DEG;

describe('sunPositionEci', () => {
  it('keeps the Earth–Sun distance within 0.983–1.017 au over 2026, nearest in early January', () => {
    // source: perihelion ≈ 0.9833 au in early January, aphelion ≈ 1.0167 au in early July (common practice)
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    const sun: Vec3 = [0, 0, 0];
    let min = Infinity;
    let max = -Infinity;
    let dayOfMin = -1;
    let dayOfMax = -1;
    for (let day = 0; day < 365; day += 0.25) {
      const au = norm(sunPositionEci(sun, astroTimeAt(epoch, day * 86_400))) / ASTRONOMICAL_UNIT;
      if (au < min) [min, dayOfMin] = [au, day];
      if (au > max) [max, dayOfMax] = [au, day];
    }
    expect(min).toBeGreaterThan(0.983);
    expect(min).toBeLessThan(0.984);
    expect(max).toBeGreaterThan(1.016);
    expect(max).toBeLessThan(1.017);
    // Perihelion falls on 2-5 January and aphelion on 3-7 July in this century (common practice).
    expect(dayOfMin).toBeGreaterThanOrEqual(1);
    expect(dayOfMin).toBeLessThanOrEqual(5);
    expect(dayOfMax).toBeGreaterThanOrEqual(182);
    expect(dayOfMax).toBeLessThanOrEqual(188);
  });

  it('puts the Sun on the equator at the March equinox and 23.4° north at the June solstice, in EQJ', () => {
    // source: the seasons' definition (Sun at apparent longitude 0° and 90°), times from
    // astronomy-engine's own Seasons search; obliquity 23.44° (common practice). EQJ is the J2000
    // equator, and precession since 2000 (0.36° along the ecliptic) puts the equinox Sun about
    // 0.15° off it: 0.5° bounds for that, 0.2° at the solstice where it matters less.
    const seasons = Seasons(2026);
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    const sun: Vec3 = [0, 0, 0];
    const tEquinox = (seasons.mar_equinox.date.getTime() - epoch.unixMs) / 1000;
    sunPositionEci(sun, astroTimeAt(epoch, tEquinox));
    expect(Math.abs(declinationDeg(sun))).toBeLessThan(0.5);
    expect(Math.abs(rightAscensionDeg(sun))).toBeLessThan(0.5);
    const tSolstice = (seasons.jun_solstice.date.getTime() - epoch.unixMs) / 1000;
    sunPositionEci(sun, astroTimeAt(epoch, tSolstice));
    expect(Math.abs(declinationDeg(sun) - 23.44)).toBeLessThan(0.2);
    expect(Math.abs(rightAscensionDeg(sun) - 90)).toBeLessThan(0.5);
  });

  it('agrees with minus the heliocentric Earth within the Sun\'s light-time shift', () => {
    // GeoVector back-dates the Sun by the light time (~499 s); the Sun moves ~13 m/s about the
    // barycentre (common practice), so the two differ by ~7 km: bound 20 km.
    const epoch = parseUtcEpoch('2026-05-05T05:05:05Z');
    const sun: Vec3 = [0, 0, 0];
    const earth: Vec3 = [0, 0, 0];
    sunPositionEci(sun, astroTimeAt(epoch));
    planetPositionHci(earth, 'earth', astroTimeAt(epoch));
    expect(Math.hypot(sun[0] + earth[0], sun[1] + earth[1], sun[2] + earth[2])).toBeLessThan(20_000);
  });
});

describe('moonPositionEci', () => {
  it('keeps the Earth–Moon distance within 356 000–407 000 km and the Moon within 29° of the equator', () => {
    // source: perigee ≥ 356 400 km, apogee ≤ 406 700 km, |declination| ≤ 28.7° at a major lunar
    // standstill (2024-2025) (common practice)
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    const moon: Vec3 = [0, 0, 0];
    let min = Infinity;
    let max = -Infinity;
    let maxDec = 0;
    for (let hour = 0; hour < 24 * 60; hour += 1) {
      moonPositionEci(moon, astroTimeAt(epoch, hour * 3600));
      min = Math.min(min, norm(moon));
      max = Math.max(max, norm(moon));
      maxDec = Math.max(maxDec, Math.abs(declinationDeg(moon)));
    }
    expect(min).toBeGreaterThan(356_000_000);
    expect(max).toBeLessThan(407_000_000);
    expect(max - min).toBeGreaterThan(30_000_000); // perigee and apogee both reached in 60 days
    expect(maxDec).toBeGreaterThan(18);
    expect(maxDec).toBeLessThan(29);
  });
});

describe('planetPositionHci', () => {
  // source: perihelion and aphelion distances (au), NASA planetary fact sheets (common practice)
  const range: Record<PlanetName, [number, number]> = {
    mercury: [0.307, 0.467],
    venus: [0.718, 0.729],
    earth: [0.983, 1.017],
    mars: [1.381, 1.667],
    jupiter: [4.95, 5.46],
    saturn: [9.0, 10.1],
    uranus: [18.2, 20.1],
    neptune: [29.8, 30.4],
  };

  it.each(planetNames)('keeps %s within its perihelion–aphelion range through the year', (planet) => {
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    const end = parseUtcEpoch('2027-01-01T00:00:00Z');
    const p: Vec3 = [0, 0, 0];
    const [lo, hi] = range[planet];
    for (let t = 0; t <= secondsBetween(epoch, end); t += 7 * 86_400) {
      const au = norm(planetPositionHci(p, planet, astroTimeAt(epoch, t))) / ASTRONOMICAL_UNIT;
      expect(au).toBeGreaterThan(lo);
      expect(au).toBeLessThan(hi);
    }
  });

  it('puts the planets near the ecliptic, i.e. about 23.4° off the EQJ equator in places', () => {
    // A planet's orbit is inclined ≤ 7° to the ecliptic (common practice), and the ecliptic is
    // inclined 23.44° to the equator: |declination| ≤ 31°, and some planet reaches beyond 7°.
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    const p: Vec3 = [0, 0, 0];
    let maxDec = 0;
    for (const planet of planetNames) {
      planetPositionHci(p, planet, astroTimeAt(epoch));
      const dec = Math.abs(declinationDeg(p));
      expect(dec).toBeLessThan(31);
      maxDec = Math.max(maxDec, dec);
    }
    expect(maxDec).toBeGreaterThan(7);
  });
});
