/**
 * Epochs: UTC at the boundary, elapsed SI seconds inside, TT for the ephemerides.
 *
 * How the time scales relate here:
 * - Inputs and outputs are UTC, ISO 8601 with a `Z`. Inside srp-core a time is "seconds from the
 *   scenario epoch": elapsed SI seconds, i.e. differences of TT (TT − UTC only changes by whole
 *   leap seconds, so across a leap second 23:59:59 → 00:00:00 is 2 s, not 1 s).
 * - TT = UTC + (TAI − UTC) + 32.184 s exactly, with TAI − UTC from the IERS leap-second table
 *   (`leap-seconds.ts`): 69.184 s since 2017-01-01.
 * - astronomy-engine computes the Sun, Moon and planets from TT (its `AstroTime.tt`, days from
 *   J2000 = 2000-01-01T12:00:00 TT). Left to itself it would take the UTC clock as UT1 and add its
 *   own ΔT = TT − UT1 from the Espenak–Meeus polynomial, an extrapolation that overestimates ΔT
 *   by about 5.5 s in 2025 (74.7 s against the true 69.2 s; true ΔT from IERS Bulletin A,
 *   UT1 − UTC within ±0.9 s). That would shift the Moon by about 5 km along its orbit, and
 *   Moon-shadow event times by seconds. So we hand it TT built from the leap-second table
 *   (`AstroTime.FromTerrestrialTime`), which is exact; its `ut` field (derived back through its
 *   ΔT model) is then not UT1 and none of our functions use it.
 * - Earth rotation (needed later for Earth-fixed frames) should take UT1 ≈ UTC from `unixMs`:
 *   |UT1 − UTC| < 0.9 s is kept by IERS and neglected here (0.9 s of Earth rotation moves a point
 *   on the equator by about 0.4 km).
 * - TDB − TT (periodic, below 2 ms) is neglected.
 *
 * Dates before 1972-01-01 (when UTC had fractional offsets from TAI) are refused.
 */
import { AstroTime } from 'astronomy-engine';
import { SrpError } from '../errors';
import {
  LEAP_TABLE_START_UNIX_MS,
  TT_MINUS_TAI_SECONDS,
  isLeapSecondBefore,
  taiMinusUtcSeconds,
  utcLabelFromTtMs,
} from './leap-seconds';

/** An instant: the scenario epoch, or any time derived from it. Immutable. */
export interface Epoch {
  /** The instant as ISO 8601 UTC with a `Z`, to the millisecond (23:59:60.xxx inside a leap second). */
  readonly utcIso: string;
  /** Unix milliseconds of the UTC label (leap seconds not counted, as JavaScript `Date`); may carry a fraction. */
  readonly unixMs: number;
  /** TT in seconds from J2000 (2000-01-01T12:00:00 TT) (s). */
  readonly ttSecondsJ2000: number;
}

/** Unix milliseconds of 2000-01-01T12:00:00 on the Unix scale; the origin of astronomy-engine's day counts. */
const J2000_UNIX_MS = Date.UTC(2000, 0, 1, 12, 0, 0);
const SECONDS_PER_DAY = 86_400;

const ISO_UTC = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(\.\d+)?Z$/;

function refuseFormat(value: unknown, field: string, why: string): never {
  throw new SrpError(
    'invalid_input',
    `${field} must be an ISO 8601 UTC date-time ending in Z, e.g. 2026-03-20T12:00:00Z (${why}); got ${JSON.stringify(value)}`,
    { field, value, limit: 'YYYY-MM-DDThh:mm:ss[.fff]Z' },
  );
}

/** TT (s from J2000) of a UTC label given as Unix ms, using the offset in force at `offsetAtUnixMs`. */
function ttSecondsFromUnixMs(unixMs: number, offsetAtUnixMs: number): number {
  const ttMinusUtc = taiMinusUtcSeconds(offsetAtUnixMs) + TT_MINUS_TAI_SECONDS;
  return (unixMs - J2000_UNIX_MS) / 1000 + ttMinusUtc;
}

function pad(n: number, width: number): string {
  return String(n).padStart(width, '0');
}

/** ISO 8601 UTC text of a TT instant (s from J2000), rounded to the millisecond. */
function isoFromTtSeconds(ttSecondsJ2000: number, field: string): { iso: string; unixMs: number } {
  const ttMs = Math.round(ttSecondsJ2000 * 1000) + J2000_UNIX_MS;
  const { unixMs, leapSecond } = utcLabelFromTtMs(ttMs);
  if (unixMs < LEAP_TABLE_START_UNIX_MS) {
    throw new SrpError('out_of_range', `${field} lies before 1972-01-01T00:00:00Z, where UTC is not defined by leap seconds`, {
      field,
      value: ttSecondsJ2000,
      limit: '>= 1972-01-01T00:00:00Z',
    });
  }
  const d = new Date(unixMs);
  const seconds = leapSecond ? 60 : d.getUTCSeconds();
  const iso =
    `${pad(d.getUTCFullYear(), 4)}-${pad(d.getUTCMonth() + 1, 2)}-${pad(d.getUTCDate(), 2)}` +
    `T${pad(d.getUTCHours(), 2)}:${pad(d.getUTCMinutes(), 2)}:${pad(seconds, 2)}.${pad(d.getUTCMilliseconds(), 3)}Z`;
  return { iso, unixMs: leapSecond ? unixMs + 1000 : unixMs };
}

/**
 * Parses an ISO 8601 UTC date-time with a `Z` (`2026-03-20T12:00:00Z`, optional fraction of a
 * second, `23:59:60` only at the end of a day with an inserted leap second) into an epoch.
 * Offsets other than `Z`, dates without a time and dates before 1972 are refused.
 * @param iso the text, e.g. `epochUtc` of a scenario
 * @param field the name to put in the error (default `epochUtc`)
 * @throws SrpError `invalid_input` (format, calendar) or `out_of_range` (before 1972), naming `field`
 */
export function parseUtcEpoch(iso: string, field = 'epochUtc'): Epoch {
  if (typeof iso !== 'string') refuseFormat(iso, field, 'not a string');
  const m = ISO_UTC.exec(iso);
  if (!m) {
    const offsetGiven = /[+-]\d{2}:?\d{2}$/.test(iso) || !iso.endsWith('Z');
    refuseFormat(iso, field, offsetGiven ? 'UTC only: end with Z, no offset' : 'expected YYYY-MM-DDThh:mm:ss[.fff]Z');
  }
  const [year, month, day, hour, minute, second] = m.slice(1, 7).map(Number) as [
    number,
    number,
    number,
    number,
    number,
    number,
  ];
  const fraction = m[7] ? Number(m[7]) : 0;
  const dayStart = Date.UTC(year, month - 1, day);
  const check = new Date(dayStart);
  if (month < 1 || month > 12 || check.getUTCDate() !== day || check.getUTCMonth() !== month - 1) {
    refuseFormat(iso, field, 'no such calendar date');
  }
  if (hour > 23 || minute > 59 || second > 60) refuseFormat(iso, field, 'hour, minute or second out of range');
  const nextDay = dayStart + SECONDS_PER_DAY * 1000;
  if (second === 60 && !(hour === 23 && minute === 59 && isLeapSecondBefore(nextDay))) {
    refuseFormat(iso, field, 'second 60 exists only at 23:59:60 before an inserted leap second');
  }
  // Inside a leap second the label is 23:59:60.f; Unix time calls it next-day 00:00:00.f, but the
  // offset still in force is the old one (the new one starts when the leap second ends).
  const unixMs = Date.UTC(year, month - 1, day, hour, minute, second) + fraction * 1000;
  if (unixMs < LEAP_TABLE_START_UNIX_MS) {
    throw new SrpError('out_of_range', `${field} must be on or after 1972-01-01T00:00:00Z; got ${iso}`, {
      field,
      value: iso,
      limit: '>= 1972-01-01T00:00:00Z',
    });
  }
  const offsetAt = second === 60 ? nextDay - 1 : unixMs;
  const ttSecondsJ2000 = ttSecondsFromUnixMs(unixMs, offsetAt);
  return { utcIso: isoFromTtSeconds(ttSecondsJ2000, field).iso, unixMs, ttSecondsJ2000 };
}

/**
 * The instant `seconds` elapsed SI seconds after (or before, if negative) `epoch`.
 * @param seconds elapsed time (s)
 * @throws SrpError `invalid_input` if seconds is not finite; `out_of_range` before 1972
 */
export function epochPlusSeconds(epoch: Epoch, seconds: number): Epoch {
  if (!Number.isFinite(seconds)) {
    throw new SrpError('invalid_input', `seconds must be a finite number (s); got ${String(seconds)}`, {
      field: 'seconds',
      value: seconds,
    });
  }
  const ttSecondsJ2000 = epoch.ttSecondsJ2000 + seconds;
  const { iso, unixMs } = isoFromTtSeconds(ttSecondsJ2000, 'seconds');
  return { utcIso: iso, unixMs, ttSecondsJ2000 };
}

/**
 * Elapsed SI seconds from `from` to `to` (negative if `to` is earlier); leap seconds counted.
 * @returns time difference (s)
 */
export function secondsBetween(from: Epoch, to: Epoch): number {
  return to.ttSecondsJ2000 - from.ttSecondsJ2000;
}

/**
 * ISO 8601 UTC text (millisecond resolution, `Z`) of the instant `tSeconds` after `epoch`.
 * @param tSeconds seconds from the epoch (s), default 0
 */
export function formatUtc(epoch: Epoch, tSeconds = 0): string {
  return tSeconds === 0 ? epoch.utcIso : epochPlusSeconds(epoch, tSeconds).utcIso;
}

/**
 * The astronomy-engine time of the instant `tSeconds` after `epoch`, built from TT (exact; see
 * the file comment). Allocates; meant for sampling ephemerides, not for hot loops.
 * @param tSeconds seconds from the epoch (s), default 0
 */
export function astroTimeAt(epoch: Epoch, tSeconds = 0): AstroTime {
  return AstroTime.FromTerrestrialTime((epoch.ttSecondsJ2000 + tSeconds) / SECONDS_PER_DAY);
}

/**
 * TT − UTC (s) at an epoch: 32.184 s + the leap seconds in force (69.184 s since 2017-01-01).
 * Source: IAU 1991 Resolution A4 (TT − TAI = 32.184 s), IERS Bulletin C (TAI − UTC).
 */
export function ttMinusUtcSeconds(epoch: Epoch): number {
  return epoch.ttSecondsJ2000 - (epoch.unixMs - J2000_UNIX_MS) / 1000;
}
