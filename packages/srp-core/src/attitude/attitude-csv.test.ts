import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseAttitudeCsv } from './attitude-csv';
import { createQuat } from './quaternion';
import { createTabulatedLaw, tabulatedAttitude } from './tabulated-law';

const Q1 = '0.965925826,0,0,0.258819045'; // 30° about z, 9 decimals
const HEADER = 'time_utc,q_w,q_x,q_y,q_z';

/** Expects parseAttitudeCsv(text) to refuse with the row and column in message and details. */
function expectRowError(text: string, row: number, column: string, messagePart?: string): void {
  let caught: unknown;
  try {
    parseAttitudeCsv(text);
  } catch (error) {
    caught = error;
  }
  expect(caught).toMatchObject({
    name: 'SrpError',
    code: 'invalid_input',
    details: { row, column, field: `csv.${row}.${column}` },
  });
  const message = (caught as Error).message;
  expect(message).toContain(`row ${row}`);
  expect(message).toContain(column);
  if (messagePart !== undefined) expect(message).toContain(messagePart);
}

describe('parseAttitudeCsv', () => {
  it('time_utc rows become seconds from the first row, across a month end, a year end and 29 February', () => {
    const text = [
      HEADER,
      `2031-12-31T23:59:30Z,${Q1}`,
      `2032-01-01T00:00:30.5Z,${Q1}`, // 60.5 s later
      `2032-02-29T00:00:00Z,${Q1}`, // 2032 is a leap year
      `2032-03-01T00:00:00Z,${Q1}`,
    ].join('\n');
    const profile = parseAttitudeCsv(text);
    // source: by hand; 2031-12-31T23:59:30 to 2032-02-29T00:00:00 is 30 s + 31 + 28 days (no leap
    // second announced for these dates). Tolerance 1e-6 s: times are differences of TT seconds
    // from J2000 (~1e9 s) held in doubles, resolution ~1.2e-7 s.
    const expected = [0, 60.5, 30 + 59 * 86400, 30 + 60 * 86400];
    expected.forEach((t, i) => expect(Math.abs(profile.timesS[i]! - t)).toBeLessThan(1e-6));
    expect(profile.epochUtc).toBe('2031-12-31T23:59:30Z');
    expect(profile.timeColumn).toBe('time_utc');
  });

  it('a leap second inside the table counts: 23:59:59 to 00:00:00 across 2016-12-31 is 2 s, and 23:59:60 is a valid row', () => {
    // source: IERS Bulletin C 52 (leap second inserted at the end of 2016-12-31).
    const text = `${HEADER}\n2016-12-31T23:59:59Z,${Q1}\n2016-12-31T23:59:60Z,${Q1}\n2017-01-01T00:00:00Z,${Q1}`;
    const profile = parseAttitudeCsv(text);
    expect(profile.timesS[1]).toBeCloseTo(1, 6);
    expect(profile.timesS[2]).toBeCloseTo(2, 6);
  });

  it('with an epoch, time_utc rows become seconds from that epoch (negative before it)', () => {
    const text = `${HEADER}\n2031-03-20T11:59:59.75Z,${Q1}\n2031-03-20T12:10:00Z,${Q1}\n`;
    const profile = parseAttitudeCsv(text, { epochUtc: '2031-03-20T12:00:00Z' });
    // Tolerance 1e-6 s, as above (TT seconds from J2000 in doubles).
    expect(Math.abs(profile.timesS[0]! + 0.25)).toBeLessThan(1e-6);
    expect(Math.abs(profile.timesS[1]! - 600)).toBeLessThan(1e-6);
    expect(profile.epochUtc).toBe('2031-03-20T12:00:00Z');
  });

  it('a t_s file with columns in another order, CRLF, a byte-order mark and blank lines is read', () => {
    const text = '\uFEFFq_x, Q_W ,q_y,q_z,t_s\r\n0,1,0,0,0\r\n\r\n0,0.965925826,0,0.258819045,12.5\r\n';
    const profile = parseAttitudeCsv(text);
    expect(Array.from(profile.timesS)).toEqual([0, 12.5]);
    expect(profile.epochUtc).toBeUndefined();
    expect(profile.quaternions[4]).toBeCloseTo(0.965925826, 8);
    expect(profile.quaternions[7]).toBeCloseTo(0.258819045, 8);
  });

  it('a quaternion within 1e-4 of unit norm is normalised to 1e-15', () => {
    const profile = parseAttitudeCsv(`t_s,q_w,q_x,q_y,q_z\n0,1.00005,0,0,0\n1,0,0.6,0.8,0.00001`);
    const q = profile.quaternions;
    expect(Math.abs(Math.hypot(q[0]!, q[1]!, q[2]!, q[3]!) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(Math.hypot(q[4]!, q[5]!, q[6]!, q[7]!) - 1)).toBeLessThan(1e-15);
  });

  it('a non-numeric value is refused naming its row and column', () => {
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n2031-03-20T12:01:00Z,0.96,abc,0,0.26`, 3, 'q_x', 'must be a number');
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n2031-03-20T12:01:00Z,0.96,,0,0.26`, 3, 'q_x');
    expectRowError(`t_s,q_w,q_x,q_y,q_z\n0,1,0,0,0\n0x10,1,0,0,0`, 3, 't_s');
  });

  it('a quaternion beyond the unit-norm tolerance is refused naming its row and the q columns', () => {
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n\n2031-03-20T12:01:00Z,0.9,0,0,0.26`, 4, 'q_w,q_x,q_y,q_z', '|q|');
  });

  it('times not strictly increasing are refused naming the row and the time column', () => {
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n2031-03-20T12:00:00Z,${Q1}`, 3, 'time_utc', 'strictly increasing');
    expectRowError(`t_s,q_w,q_x,q_y,q_z\n0,1,0,0,0\n5,1,0,0,0\n4.9,1,0,0,0`, 4, 't_s', 'strictly increasing');
  });

  it('a wrong number of values is refused naming the row and the first missing column', () => {
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n2031-03-20T12:01:00Z,1,0,0`, 3, 'q_z', 'has 4 values, expected 5');
    expectRowError(`${HEADER}\n2031-03-20T12:00:00Z,${Q1},7`, 2, 'extra column 6', 'has 6 values');
  });

  it('a bad time is refused naming the row: not ISO, no Z, 30 February, second 60 where no leap second was inserted', () => {
    expectRowError(`${HEADER}\n2031/03/20 12:00,${Q1}`, 2, 'time_utc', 'ISO 8601');
    expectRowError(`${HEADER}\n2031-03-20T12:00:00+01:00,${Q1}`, 2, 'time_utc', 'ending in Z');
    expectRowError(`${HEADER}\n2031-02-30T12:00:00Z,${Q1}`, 2, 'time_utc', 'calendar');
    expectRowError(`${HEADER}\n2031-12-31T23:59:60Z,${Q1}`, 2, 'time_utc', 'leap second');
    expect(() => parseAttitudeCsv(`${HEADER}\n1969-07-20T20:17:40Z,${Q1}`)).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ row: 2, column: 'time_utc' }) }),
    );
  });

  it('a header with an unknown, missing or doubled column, or two time columns, is refused as row 1', () => {
    expectRowError(`time_utc,q_w,q_x,q_y,q_z,comment\n`, 1, 'comment', 'unknown column');
    expectRowError(`time_utc,q_w,q_x,q_y\n`, 1, 'q_z', 'missing');
    expectRowError(`time_utc,q_w,q_x,q_y,q_y,q_z\n`, 1, 'q_y', 'twice');
    expectRowError(`time_utc,t_s,q_w,q_x,q_y,q_z\n`, 1, 'time_utc', 'exactly one time column');
    expectRowError(``, 1, 'column 1', 'empty column name');
  });

  it('fewer than two data rows and a bad epoch are refused naming the field', () => {
    expect(() => parseAttitudeCsv(`${HEADER}\n2031-03-20T12:00:00Z,${Q1}\n`, { field: 'profile' })).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'profile', limit: '>= 2 rows' }) }),
    );
    expect(() => parseAttitudeCsv(`${HEADER}\n`, { epochUtc: '2031-03-20 12:00' })).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'epochUtc' }) }),
    );
  });

  it('the demo fixture slew-demo.csv parses into a 61-row, one-hour profile that ends 90° from where it starts', () => {
    // The fixture is data for this test and the demo (fixtures/attitude/README.md describes it).
    const text = readFileSync(new URL('../../../../fixtures/attitude/slew-demo.csv', import.meta.url), 'utf8');
    const profile = parseAttitudeCsv(text, { epochUtc: '2031-03-20T12:00:00Z' });
    expect(profile.timesS.length).toBe(61);
    expect(profile.timesS[60]).toBe(3600);
    const law = createTabulatedLaw({ profile });
    const start = tabulatedAttitude(createQuat(), law, 0);
    const end = tabulatedAttitude(createQuat(), law, 3600);
    const mid = tabulatedAttitude(createQuat(), law, 1800);
    const angle = (a: number[], b: number[]): number => {
      const d = Math.abs(a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]! + a[3]! * b[3]!);
      return 2 * Math.atan2(Math.sqrt(Math.max(0, 1 - d * d)), d);
    };
    // source: the README's construction (90° slew, half-way at 45°); 9-decimal data: 1e-7 rad.
    expect(Math.abs(angle(start, end) - Math.PI / 2)).toBeLessThan(1e-7);
    expect(Math.abs(angle(start, mid) - Math.PI / 4)).toBeLessThan(1e-7);
  });
});
