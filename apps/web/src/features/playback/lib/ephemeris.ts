import {
  astroTimeAt,
  planetPositionHci,
  sunPositionEci,
  type Epoch,
  type PlanetName,
  type Vec3 as CoreVec3,
} from '@photon-ledger/srp-core';

/** Unit vector from the Earth's centre to the Sun's in EQJ at `tSeconds` after the epoch. */
export function sunDirectionEci(epoch: Epoch, tSeconds: number): [number, number, number] {
  const out: CoreVec3 = [0, 0, 0];
  sunPositionEci(out, astroTimeAt(epoch, tSeconds));
  const n = Math.hypot(out[0], out[1], out[2]);
  return [out[0] / n, out[1] / n, out[2] / n];
}

/** Heliocentric position of a planet in EQJ (m) at `tSeconds` after the epoch. */
export function planetPosition(epoch: Epoch, planet: PlanetName, tSeconds: number): [number, number, number] {
  const out: CoreVec3 = [0, 0, 0];
  planetPositionHci(out, planet, astroTimeAt(epoch, tSeconds));
  return [out[0], out[1], out[2]];
}

/** Sidereal periods (days) of the planets drawn around the Sun; source: from memory (standard values). */
export const planetPeriodDays = { venus: 224.701, earth: 365.256, mars: 686.98 } as const;
/** The planets drawn in heliocentric playback. */
export type DrawnPlanet = keyof typeof planetPeriodDays;

/** One orbit of a planet from the epoch, `points` positions in EQJ (m), from srp-core's ephemeris. */
export function planetOrbit(epoch: Epoch, planet: DrawnPlanet, points = 160): [number, number, number][] {
  const period = planetPeriodDays[planet] * 86_400;
  const out: [number, number, number][] = [];
  for (let i = 0; i <= points; i += 1) out.push(planetPosition(epoch, planet, (period * i) / points));
  return out;
}
