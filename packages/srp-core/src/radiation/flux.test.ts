import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { irradianceAt, radiationPressureAt } from './flux';

const AU_M = 149_597_870_700; // source: IAU 2012 Resolution B2
const S0 = 1361; // source: IAU 2015 Resolution B3
// One or two double-precision operations (rounding ~1e-16 each): 1e-13 relative leaves margin
// yet catches any wrong constant or exponent.
const REL_TOL = 1e-13;

function expectRelClose(actual: number, expected: number, relTol: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relTol * Math.abs(expected));
}

describe('irradianceAt', () => {
  it('at exactly 1 au gives the nominal solar constant', () => {
    expectRelClose(irradianceAt(AU_M), S0, REL_TOL);
  });

  it('at 0.5 au gives four times the solar constant', () => {
    // source: inverse-square law, 1361 × 4 = 5444 W/m² by hand
    expectRelClose(irradianceAt(0.5 * AU_M), 5444, REL_TOL);
  });

  it('at 5.2 au gives the solar constant divided by 27.04', () => {
    // source: inverse-square law, 1361 / 5.2² = 1361 / 27.04 = 50.332840236686… W/m² by hand
    expectRelClose(irradianceAt(5.2 * AU_M), 50.33284023668639, REL_TOL);
  });

  it('scales with a caller-supplied s0', () => {
    // source: inverse-square law by hand; 1362.5 W/m² is an arbitrary test value of s0
    expectRelClose(irradianceAt(2 * AU_M, 1362.5), 1362.5 / 4, REL_TOL);
  });

  it.each([0, -AU_M, Number.NaN, Number.POSITIVE_INFINITY])(
    'refuses a distance of %s with an SrpError naming distanceM',
    (distanceM) => {
      let caught: unknown;
      try {
        irradianceAt(distanceM);
      } catch (error) {
        caught = error;
      }
      expect(caught).toBeInstanceOf(SrpError);
      const error = caught as SrpError;
      expect(error.details.field).toBe('distanceM');
      expect(error.details.limit).toBe('> 0');
      expect(['invalid_input', 'out_of_range']).toContain(error.code);
      expect(error.message).toContain('distanceM');
    },
  );

  it('refuses a non-positive s0 with an SrpError naming s0', () => {
    expect(() => irradianceAt(AU_M, 0)).toThrow(
      expect.objectContaining({
        code: 'out_of_range',
        details: expect.objectContaining({ field: 's0' }),
      }),
    );
  });
});

describe('radiationPressureAt', () => {
  it('at 1 au gives S0 / c ≈ 4.5398e-6 Pa', () => {
    // source: 1361 W/m² (IAU 2015 Resolution B3) / 299 792 458 m/s (SI Brochure, exact)
    // = 4.539807335646850e-6 Pa, divided outside the code under test
    expectRelClose(radiationPressureAt(AU_M), 4.53980733564685e-6, REL_TOL);
  });

  it('refuses a negative distance instead of returning NaN', () => {
    expect(() => radiationPressureAt(-1)).toThrow(SrpError);
  });
});
