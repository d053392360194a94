/**
 * Radii and gravitational parameters of the bodies that light, shadow and pull a spacecraft.
 * SI units; each value carries its source ("from memory" where the table number is not checked).
 */

/**
 * Equatorial radius of the Earth (m), used as the radius of the spherical Earth that casts shadows.
 * Source: WGS 84 defining parameter a = 6 378 137 m (NIMA TR8350.2, 3rd ed., 2000, Table 3.1;
 * table number from memory). IERS Conventions 2010 Table 1.1 gives 6 378 136.6 m (zero tide);
 * the 0.4 m difference is far below the effect of treating the oblate Earth as a sphere (21 km).
 */
export const EARTH_EQUATORIAL_RADIUS = 6_378_137;

/**
 * Geocentric gravitational constant GM⊕ (m³/s²), TT-compatible, including the atmosphere.
 * Source: IERS Conventions 2010 (IERS TN 36), Table 1.1: 3.986004418 × 10¹⁴ m³ s⁻².
 */
export const EARTH_GM = 3.986004418e14;

/**
 * Mean radius of the Moon (m).
 * Source: IAU WGCCRE report (Archinal et al., Celest. Mech. Dyn. Astr. 109, 2011): 1737.4 km.
 */
export const MOON_RADIUS = 1_737_400;

/**
 * Gravitational parameter of the Moon GM☾ (m³/s²), TDB-compatible.
 * Source: JPL DE430 (Folkner et al., IPN Progress Report 42-196, 2014): 4902.800 km³ s⁻²
 * (from memory; five digits, all that matter for third-body perturbations).
 */
export const MOON_GM = 4.9028e12;

/**
 * Nominal solar radius (m), the photospheric radius used for the solar disc in shadow models.
 * Source: IAU 2015 Resolution B3, nominal solar radius R⊙ = 695 700 km.
 */
export const SUN_RADIUS = 695_700_000;

/**
 * Heliocentric gravitational constant GM⊙ (m³/s²), TDB-compatible.
 * Source: JPL DE405 (Standish, JPL IOM 312.F-98-048, 1998): 1.32712440018 × 10²⁰ m³ s⁻²
 * (from memory; DE430 gives 1.32712440041 × 10²⁰, 2 × 10⁻¹⁰ relative apart, immaterial here).
 */
export const SUN_GM = 1.32712440018e20;
