/**
 * Nominal total solar irradiance at 1 au (W/m²).
 * Source: IAU 2015 Resolution B3, nominal solar value S⊙ = 1361 W m⁻².
 */
export const SOLAR_CONSTANT = 1361;

/**
 * Astronomical unit (m), exact by definition.
 * Source: IAU 2012 Resolution B2, 1 au = 149 597 870 700 m.
 */
export const ASTRONOMICAL_UNIT = 149_597_870_700;

/**
 * Speed of light in vacuum (m/s), exact by definition.
 * Source: SI Brochure, 9th edition (2019), defining constant c = 299 792 458 m s⁻¹.
 */
export const SPEED_OF_LIGHT = 299_792_458;
