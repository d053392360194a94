import { KM_PER_AU } from 'astronomy-engine';
import { speedOfLight } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { ASTRONOMICAL_UNIT, SOLAR_CONSTANT, SPEED_OF_LIGHT } from './constants';

describe('physical constants', () => {
  it('the solar constant is the IAU nominal 1361 W/m²', () => {
    // source: IAU 2015 Resolution B3 (nominal total solar irradiance)
    expect(SOLAR_CONSTANT).toBe(1361);
  });

  it('the speed of light agrees exactly with mathjs', () => {
    // source: mathjs 15.2.0 `speedOfLight` (CODATA / SI exact value); exact, both are integers
    expect(SPEED_OF_LIGHT).toBe(speedOfLight.toNumber('m/s'));
  });

  it('the astronomical unit agrees with astronomy-engine within 1e-10', () => {
    // source: astronomy-engine 2.1.19 `KM_PER_AU`. It derives the au from its light-time constant
    // and differs from the IAU 2012 Resolution B2 value by 6e-11 relative, hence 1e-10.
    const referenceM = KM_PER_AU * 1000;
    expect(Math.abs(ASTRONOMICAL_UNIT - referenceM) / referenceM).toBeLessThan(1e-10);
  });
});
