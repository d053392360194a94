/**
 * Sun, Moon and planet positions straight from astronomy-engine, converted to metres.
 *
 * Frame: EQJ, the mean equator and equinox of J2000 (astronomy-engine's name; the inertial frame
 * of Photon Ledger). `…Eci` = Earth-centred EQJ axes, `…Hci` = Sun-centred EQJ axes.
 * Geometry, not apparent direction: no aberration. The Sun is light-time corrected by
 * `GeoVector` (where the Sun was when the light now at the Earth left it; it moves about 7 km in
 * those 8.3 min relative to the barycentre, so the choice is immaterial); the Moon (`GeoMoon`)
 * and the planets (`HelioVector`) are geometric. Each function's frame is stated in
 * astronomy-engine 2.1.19's `astronomy.d.ts`: GeoVector and HelioVector "J2000 equatorial
 * system", GeoMoon "oriented with respect to the Earth's equator at the J2000 epoch ... EQJ".
 *
 * These allocate (astronomy-engine returns new objects) and cost 2-20 µs each: sample them into
 * an interpolated ephemeris (`interpolated-ephemeris.ts`) for propagation.
 */
import { AstroTime, Body, GeoMoon, GeoVector, HelioVector, KM_PER_AU } from 'astronomy-engine';
import type { Vec3 } from '../math/vec3';

/**
 * Metres per astronomy-engine astronomical unit. astronomy-engine's KM_PER_AU is
 * 149 597 870.69098932 km, 9 m (6 × 10⁻¹¹) short of the IAU 2012 value; we convert with the
 * library's own constant so that its kilometres (the Moon's theory works in km) come back exactly.
 */
const M_PER_AU_ENGINE = KM_PER_AU * 1000;

/** The planets whose heliocentric positions are offered. */
export const planetNames = ['mercury', 'venus', 'earth', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune'] as const;
/** A planet name (lower case), Mercury to Neptune. */
export type PlanetName = (typeof planetNames)[number];

const planetBodies: Record<PlanetName, Body> = {
  mercury: Body.Mercury,
  venus: Body.Venus,
  earth: Body.Earth,
  mars: Body.Mars,
  jupiter: Body.Jupiter,
  saturn: Body.Saturn,
  uranus: Body.Uranus,
  neptune: Body.Neptune,
};

/**
 * Geocentric position of the Sun's centre in EQJ (ECI) (m). Light-time corrected, no aberration.
 * @param time astronomy-engine time (build it with `astroTimeAt`)
 */
export function sunPositionEci(out: Vec3, time: AstroTime): Vec3 {
  const v = GeoVector(Body.Sun, time, false);
  out[0] = v.x * M_PER_AU_ENGINE;
  out[1] = v.y * M_PER_AU_ENGINE;
  out[2] = v.z * M_PER_AU_ENGINE;
  return out;
}

/**
 * Geocentric position of the Moon's centre in EQJ (ECI) (m), geometric.
 * astronomy-engine's Moon is a truncated Brown/ILE theory (Montenbruck & Pfleger); expect
 * kilometre-level differences from JPL DE ephemerides (not verified here).
 * @param time astronomy-engine time (build it with `astroTimeAt`)
 */
export function moonPositionEci(out: Vec3, time: AstroTime): Vec3 {
  const v = GeoMoon(time);
  out[0] = v.x * M_PER_AU_ENGINE;
  out[1] = v.y * M_PER_AU_ENGINE;
  out[2] = v.z * M_PER_AU_ENGINE;
  return out;
}

/**
 * Heliocentric position of a planet's centre (the Earth's, not the Earth–Moon barycentre's) in
 * EQJ (HCI) (m), geometric (no light time, no aberration).
 * @param planet `mercury` … `neptune`
 * @param time astronomy-engine time (build it with `astroTimeAt`)
 */
export function planetPositionHci(out: Vec3, planet: PlanetName, time: AstroTime): Vec3 {
  const v = HelioVector(planetBodies[planet], time);
  out[0] = v.x * M_PER_AU_ENGINE;
  out[1] = v.y * M_PER_AU_ENGINE;
  out[2] = v.z * M_PER_AU_ENGINE;
  return out;
}
