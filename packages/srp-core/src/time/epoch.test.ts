import { MakeTime } from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { astroTimeAt, epochPlusSeconds, formatUtc, parseUtcEpoch, secondsBetween, ttMinusUtcSeconds } from './epoch';
import { taiMinusUtcSeconds } from './leap-seconds';

// TT is held as seconds from J2000 (~8e8 s), whose double spacing is 1.2e-7 s: 1e-6 s is the
// tolerance for anything computed from it.
const TT_TOL_S = 1e-6;

function expectSeconds(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThan(TT_TOL_S);
}

function caught(fn: () => unknown): SrpError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(SrpError);
    return error as SrpError;
  }
  throw new Error('expected an SrpError');
}

describe('parseUtcEpoch', () => {
  it('reads a plain UTC date-time and formats it back to the millisecond', () => {
    const epoch = parseUtcEpoch('2026-03-20T12:34:56Z');
    expect(epoch.utcIso).toBe('2026-03-20T12:34:56.000Z');
    expect(epoch.unixMs).toBe(Date.UTC(2026, 2, 20, 12, 34, 56));
  });

  it('keeps sub-millisecond fractions in the elapsed-time arithmetic', () => {
    const a = parseUtcEpoch('2026-03-20T00:00:00Z');
    const b = parseUtcEpoch('2026-03-20T00:00:00.0001234Z');
    // 0.1234 ms, to TT_TOL_S.
    expectSeconds(secondsBetween(a, b), 1.234e-4);
  });

  it.each([
    ['2026-03-20T12:00:00', 'no Z'],
    ['2026-03-20T12:00:00+01:00', 'an offset'],
    ['2026-03-20', 'a date only'],
    ['2026-03-20T12:00Z', 'no seconds'],
    ['2026-03-20 12:00:00Z', 'a space for T'],
  ])('refuses %s (%s) with an SrpError naming the field', (text) => {
    const error = caught(() => parseUtcEpoch(text, 'scenario.epochUtc'));
    expect(error.code).toBe('invalid_input');
    expect(error.details.field).toBe('scenario.epochUtc');
    expect(error.message).toContain('scenario.epochUtc');
    expect(error.message).toContain('ending in Z');
  });

  it.each(['2026-02-30T00:00:00Z', '2026-13-01T00:00:00Z', '2026-03-20T24:00:00Z', '2026-03-20T12:60:00Z'])(
    'refuses the impossible calendar value %s',
    (text) => {
      expect(caught(() => parseUtcEpoch(text)).details.field).toBe('epochUtc');
    },
  );

  it('refuses dates before 1972, when UTC was not stepped by whole leap seconds', () => {
    const error = caught(() => parseUtcEpoch('1971-12-31T23:59:59Z'));
    expect(error.code).toBe('out_of_range');
    expect(error.details.limit).toBe('>= 1972-01-01T00:00:00Z');
  });

  it('accepts 23:59:60 only where a leap second was inserted', () => {
    expect(parseUtcEpoch('2016-12-31T23:59:60.5Z').utcIso).toBe('2016-12-31T23:59:60.500Z');
    expect(caught(() => parseUtcEpoch('2017-12-31T23:59:60Z')).code).toBe('invalid_input');
  });
});

describe('TT and leap seconds', () => {
  it('TT − UTC is 69.184 s in 2026', () => {
    // source: IERS Bulletin C (TAI − UTC = 37 s since 2017-01-01) + TT − TAI = 32.184 s (IAU 1991 A4)
    expectSeconds(ttMinusUtcSeconds(parseUtcEpoch('2026-03-20T00:00:00Z')), 69.184);
  });

  it('TT − UTC is 64.184 s in 2000 and 51.184 s in 1980', () => {
    // source: IERS Bulletin C: TAI − UTC = 32 s from 1999-01-01, 19 s from 1980-01-01
    expectSeconds(ttMinusUtcSeconds(parseUtcEpoch('2000-06-01T00:00:00Z')), 64.184);
    expectSeconds(ttMinusUtcSeconds(parseUtcEpoch('1980-06-01T00:00:00Z')), 51.184);
    expect(taiMinusUtcSeconds(Date.UTC(1980, 0, 1))).toBe(19);
  });

  it('J2000.0 (2000-01-01T12:00:00 TT) is 11:58:55.816 UTC', () => {
    // source: definition of J2000.0 = JD 2451545.0 TT; TT − UTC = 64.184 s then (common practice)
    const epoch = parseUtcEpoch('2000-01-01T11:58:55.816Z');
    expectSeconds(epoch.ttSecondsJ2000, 0);
  });

  it('astroTimeAt hands astronomy-engine the same TT', () => {
    const epoch = parseUtcEpoch('2026-03-20T00:00:00Z');
    const time = astroTimeAt(epoch, 3600);
    // FromTerrestrialTime iterates to 1e-12 day; 1e-10 day (9 µs) leaves room for rounding.
    expect(Math.abs(time.tt - (epoch.ttSecondsJ2000 + 3600) / 86_400)).toBeLessThan(1e-10);
  });

  it("astronomy-engine's own ΔT model would put TT about 5.5 s late in 2025 (why we bypass it)", () => {
    // source: true TT − UTC = 69.184 s (IERS); astronomy-engine 2.1.19 takes UTC as UT1 and adds
    // the Espenak–Meeus ΔT polynomial. Bounds 3..8 s: record the size of the effect, not its digits.
    const epoch = parseUtcEpoch('2025-06-01T00:00:00Z');
    const engine = MakeTime(new Date(epoch.unixMs));
    const lateSeconds = (engine.tt - astroTimeAt(epoch).tt) * 86_400;
    expect(lateSeconds).toBeGreaterThan(3);
    expect(lateSeconds).toBeLessThan(8);
  });
});

describe('seconds from the epoch', () => {
  it('one day after an epoch formats as the next day at the same time', () => {
    const epoch = parseUtcEpoch('2026-03-20T12:00:00Z');
    expect(formatUtc(epoch, 86_400)).toBe('2026-03-21T12:00:00.000Z');
    expect(formatUtc(epoch, -0.0004)).toBe('2026-03-20T12:00:00.000Z');
    expect(formatUtc(epoch, 1.2345)).toBe('2026-03-20T12:00:01.235Z');
  });

  it('counts the leap second: 23:59:59 to 00:00:00 across 2016-12-31 is 2 s', () => {
    // source: IERS Bulletin C 52 (leap second at the end of 2016-12-31)
    const before = parseUtcEpoch('2016-12-31T23:59:59Z');
    const after = parseUtcEpoch('2017-01-01T00:00:00Z');
    expectSeconds(secondsBetween(before, after), 2);
    expect(formatUtc(before, 1.25)).toBe('2016-12-31T23:59:60.250Z');
    expect(formatUtc(before, 2)).toBe('2017-01-01T00:00:00.000Z');
    expect(formatUtc(after, -1)).toBe('2016-12-31T23:59:60.000Z');
  });

  it('round-trips any time through text to the millisecond', () => {
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    for (const t of [0, 0.001, 59.999, 3600.5, 1e6 + 0.123, 365.25 * 86_400]) {
      const back = parseUtcEpoch(formatUtc(epoch, t));
      // formatting rounds to 1 ms, so 0.5 ms (+ TT_TOL_S) is the bound.
      expect(Math.abs(secondsBetween(epoch, back) - t)).toBeLessThanOrEqual(0.0005 + TT_TOL_S);
      expect(epochPlusSeconds(epoch, t).utcIso).toBe(back.utcIso);
    }
  });

  it('refuses a non-finite offset with an SrpError naming seconds', () => {
    const epoch = parseUtcEpoch('2026-01-01T00:00:00Z');
    expect(caught(() => epochPlusSeconds(epoch, Number.NaN)).details.field).toBe('seconds');
  });
});
