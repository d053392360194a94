/**
 * TAI − UTC since 1972, the step table of leap seconds.
 * Source: IERS Bulletin C, as in the IERS `leap-seconds.list` (the copy distributed with tzdata
 * was checked line by line: 28 entries from 10 s on 1972-01-01 to 37 s on 2017-01-01).
 * That copy, updated through Bulletin C and valid until 28 June 2026, lists none after 2017-01-01;
 * when a new one is announced, append a row here. CGPM 2022 Resolution 4 plans to stop inserting
 * them by 2035.
 */
const LEAP_TABLE: readonly (readonly [year: number, month: number, taiMinusUtcS: number])[] = [
  [1972, 1, 10], [1972, 7, 11], [1973, 1, 12], [1974, 1, 13], [1975, 1, 14], [1976, 1, 15],
  [1977, 1, 16], [1978, 1, 17], [1979, 1, 18], [1980, 1, 19], [1981, 7, 20], [1982, 7, 21],
  [1983, 7, 22], [1985, 7, 23], [1988, 1, 24], [1990, 1, 25], [1991, 1, 26], [1992, 7, 27],
  [1993, 7, 28], [1994, 7, 29], [1996, 1, 30], [1997, 7, 31], [1999, 1, 32], [2006, 1, 33],
  [2009, 1, 34], [2012, 7, 35], [2015, 7, 36], [2017, 1, 37],
];

/** Unix milliseconds (UTC label, leap seconds not counted) at which each table row starts. */
const startUnixMs = LEAP_TABLE.map(([y, m]) => Date.UTC(y, m - 1, 1));
const offsetS = LEAP_TABLE.map(([, , s]) => s);

/** TT − TAI (s), exact by definition. Source: IAU 1991 Resolution A4 (TT), IAU 2000 Resolution B1.9. */
export const TT_MINUS_TAI_SECONDS = 32.184;

/** The first UTC instant the leap-second table covers, 1972-01-01T00:00:00Z, as Unix milliseconds. */
export const LEAP_TABLE_START_UNIX_MS = startUnixMs[0] as number;

/** Index of the table row in force at a UTC label (Unix ms), or -1 before 1972. */
function rowAtUnixMs(unixMs: number): number {
  let i = startUnixMs.length - 1;
  while (i >= 0 && unixMs < (startUnixMs[i] as number)) i -= 1;
  return i;
}

/**
 * TAI − UTC (s) in force at a UTC instant given as Unix milliseconds (the calendar label;
 * JavaScript's `Date.UTC` count, which ignores leap seconds).
 * @returns whole seconds, 10 to 37; NaN before 1972-01-01 (callers refuse such dates first)
 */
export function taiMinusUtcSeconds(unixMs: number): number {
  const i = rowAtUnixMs(unixMs);
  return i < 0 ? Number.NaN : (offsetS[i] as number);
}

/** True when the UTC day that starts at `nextDayUnixMs` (midnight) is preceded by an inserted leap second. */
export function isLeapSecondBefore(nextDayUnixMs: number): boolean {
  const i = startUnixMs.indexOf(nextDayUnixMs);
  return i > 0;
}

/**
 * Splits a TT instant into the UTC label it carries: Unix milliseconds of the label and whether it
 * lies inside an inserted leap second (23:59:60.xxx, which Unix time cannot name). Inside one,
 * `unixMs` is that of 23:59:59.xxx and `leapSecond` is true.
 * @param ttMs TT as milliseconds on the Unix scale (Unix ms of the UTC label + (TT − UTC)·1000)
 */
export function utcLabelFromTtMs(ttMs: number): { unixMs: number; leapSecond: boolean } {
  // The row whose first TT instant is at or before ttMs.
  let i = startUnixMs.length - 1;
  while (i > 0 && ttMs < (startUnixMs[i] as number) + ((offsetS[i] as number) + TT_MINUS_TAI_SECONDS) * 1000) {
    i -= 1;
  }
  const unixMs = ttMs - ((offsetS[i] as number) + TT_MINUS_TAI_SECONDS) * 1000;
  const next = startUnixMs[i + 1];
  if (next !== undefined && unixMs >= next) {
    // The TT second between the old and the new offset: the inserted 23:59:60.
    return { unixMs: unixMs - 1000, leapSecond: true };
  }
  return { unixMs, leapSecond: false };
}
