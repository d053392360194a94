/**
 * Parser for attitude profiles as CSV text (a string in, arrays out: no file access here).
 *
 * Format:
 * - Row 1 is the header; row numbers in errors count every line of the text from 1 (header = row
 *   1), blank lines included, so they match a text editor's line numbers. Blank lines are skipped.
 * - Columns, in any order, names case-insensitive, no others: one time column, either
 *   `time_utc` (ISO 8601 UTC ending in `Z`, e.g. `2031-03-20T12:00:00Z` or with a fraction
 *   `12:00:00.250Z`) or `t_s` (seconds from the scenario epoch), and `q_w,q_x,q_y,q_z`: the
 *   attitude in the product's convention (scalar first, Hamilton, carrying the EQJ axes onto the
 *   body axes; see quaternion.ts).
 * - Values are plain decimal numbers (no quotes, no thousands separators); a UTF-8 byte-order
 *   mark and CRLF line ends are accepted.
 * - Times strictly increasing, at least 2 data rows; |q| = 1 ± QUATERNION_NORM_TOLERANCE (1e-4),
 *   normalised; beyond that the row is refused.
 * - `time_utc` times become seconds from `options.epochUtc`, or from the first row when no epoch
 *   is given: elapsed SI seconds as everywhere in srp-core (time/epoch.ts `parseUtcEpoch` and
 *   `secondsBetween`), so a leap second inside the table counts and `23:59:60` is accepted where
 *   one was inserted; dates before 1972 are refused. They are differences of TT seconds from
 *   J2000 held in doubles, good to about 1e-7 s.
 */
import { SrpError } from '../errors';
import type { SrpErrorDetails } from '../errors';
import { parseUtcEpoch, secondsBetween } from '../time/epoch';
import type { Epoch } from '../time/epoch';
import { QUATERNION_NORM_TOLERANCE } from './attitude-input';
import type { AttitudeProfileData } from './tabulated-law';

/** Options of `parseAttitudeCsv`. */
export interface AttitudeCsvOptions {
  /**
   * Scenario epoch, ISO 8601 UTC with `Z`: `time_utc` values become seconds from it. Omitted:
   * seconds from the first row. Not used with a `t_s` column (already seconds from the epoch).
   */
  epochUtc?: string | undefined;
  /** Name of the input in error fields, e.g. `profile`; default `csv`. */
  field?: string | undefined;
}

/** A parsed attitude table, ready for `createTabulatedLaw`. */
export interface AttitudeProfile extends AttitudeProfileData {
  /** Times from the epoch (s), strictly increasing. */
  timesS: Float64Array;
  /** Unit quaternions `[w, x, y, z]` packed 4 per row (signs as in the file). */
  quaternions: Float64Array;
  /** Which time column the file had. */
  timeColumn: 'time_utc' | 't_s';
  /**
   * The instant of t = 0 (ISO 8601 UTC): `options.epochUtc`, or the first row's `time_utc`;
   * undefined for a `t_s` file.
   */
  epochUtc: string | undefined;
}

/** Details of a CSV error: the usual field/value/limit plus the row and column. */
export interface AttitudeCsvErrorDetails extends SrpErrorDetails {
  /** 1-based line number in the text (header = 1); absent for an error about the whole table. */
  row?: number;
  /** Column name from the header (`q_x`, `time_utc`), or a description for an extra value. */
  column?: string;
}

const quatColumns = ['q_w', 'q_x', 'q_y', 'q_z'] as const;
const timeColumns = ['time_utc', 't_s'] as const;
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function fail(
  code: 'invalid_input' | 'out_of_range',
  field: string,
  row: number | undefined,
  column: string | undefined,
  problem: string,
  value: unknown,
  limit?: string,
): never {
  const where = row === undefined ? field : `${field} row ${row}${column === undefined ? '' : `, column ${column}`}`;
  const details: AttitudeCsvErrorDetails = {
    field: [field, row, column].filter((p) => p !== undefined).join('.'),
    value,
    ...(limit === undefined ? {} : { limit }),
    ...(row === undefined ? {} : { row }),
    ...(column === undefined ? {} : { column }),
  };
  throw new SrpError(code, `${where}: ${problem}`, details);
}

/**
 * Parses an attitude profile from CSV text (format in the file header of attitude-csv.ts).
 * Allocates; not for hot paths.
 * @param text the whole file as a string
 * @returns times (s from the epoch) and unit quaternions, for `createTabulatedLaw`
 * @throws SrpError `invalid_input` whose message names the row (1-based, header = 1) and the column,
 *   with `details` of type `AttitudeCsvErrorDetails` (`field` = `<field>.<row>.<column>`, `row`,
 *   `column`): missing/unknown/duplicate header column, wrong number of values, a value that is not
 *   a number or not an ISO UTC time, times not strictly increasing, |q| outside 1 ± 1e-4; fewer
 *   than 2 data rows (no row); a bad `options.epochUtc` (field `epochUtc`). `out_of_range` (with
 *   row and column) for a time before 1972.
 */
export function parseAttitudeCsv(text: string, options: AttitudeCsvOptions = {}): AttitudeProfile {
  const field = options.field ?? 'csv';
  let epoch: Epoch | undefined = options.epochUtc === undefined ? undefined : parseUtcEpoch(options.epochUtc, 'epochUtc');

  const lines = (text.charCodeAt(0) === 0xfeff ? text.slice(1) : text).split(/\r\n|\n|\r/);
  const header = (lines[0] ?? '').split(',').map((name) => name.trim().toLowerCase());
  const expected = 'one of time_utc or t_s, and q_w, q_x, q_y, q_z';
  const index = new Map<string, number>();
  header.forEach((name, i) => {
    if (name === '') fail('invalid_input', field, 1, `column ${i + 1}`, `empty column name; the header must name ${expected}`, name);
    if (!(timeColumns as readonly string[]).includes(name) && !(quatColumns as readonly string[]).includes(name)) {
      fail('invalid_input', field, 1, name, `unknown column ${name}; the header must name ${expected}`, name);
    }
    if (index.has(name)) fail('invalid_input', field, 1, name, `column ${name} appears twice`, name);
    index.set(name, i);
  });
  const presentTimes = timeColumns.filter((name) => index.has(name));
  if (presentTimes.length !== 1) {
    fail('invalid_input', field, 1, 'time_utc', `the header must have exactly one time column, time_utc or t_s; found ${presentTimes.length}`, header.join(','));
  }
  const timeColumn = presentTimes[0]!;
  for (const name of quatColumns) {
    if (!index.has(name)) fail('invalid_input', field, 1, name, `column ${name} is missing; the header must name ${expected}`, header.join(','));
  }
  const timeIndex = index.get(timeColumn)!;
  const quatIndex = quatColumns.map((name) => index.get(name)!);

  const times: number[] = [];
  const quats: number[] = [];
  let firstUtc: string | undefined;
  for (let li = 1; li < lines.length; li += 1) {
    const line = lines[li]!;
    if (line.trim() === '') continue;
    const row = li + 1;
    const values = line.split(',').map((v) => v.trim());
    if (values.length < header.length) {
      fail('invalid_input', field, row, header[values.length]!, `has ${values.length} values, expected ${header.length} (${header.join(',')}): ${header[values.length]} is missing`, line);
    }
    if (values.length > header.length) {
      fail('invalid_input', field, row, `extra column ${header.length + 1}`, `has ${values.length} values, expected ${header.length} (${header.join(',')})`, line);
    }

    const timeText = values[timeIndex]!;
    let t: number;
    if (timeColumn === 't_s') {
      if (!NUMBER.test(timeText)) fail('invalid_input', field, row, 't_s', `t_s must be a number of seconds; got "${timeText}"`, timeText);
      t = Number(timeText);
      if (!Number.isFinite(t)) fail('invalid_input', field, row, 't_s', `t_s must be finite; got "${timeText}"`, timeText);
    } else {
      let parsed: Epoch;
      try {
        parsed = parseUtcEpoch(timeText, 'time_utc');
      } catch (error) {
        if (!(error instanceof SrpError)) throw error;
        fail(error.code === 'out_of_range' ? 'out_of_range' : 'invalid_input', field, row, 'time_utc', error.message, timeText, error.details.limit === undefined ? undefined : String(error.details.limit));
      }
      if (epoch === undefined) {
        epoch = parsed;
        firstUtc = timeText;
      }
      t = secondsBetween(epoch, parsed);
    }
    const previous = times[times.length - 1];
    if (previous !== undefined && !(t > previous)) {
      fail('invalid_input', field, row, timeColumn, `times must be strictly increasing; ${timeText} is not after the previous row`, timeText, `> previous row`);
    }

    const q = [0, 0, 0, 0];
    for (let k = 0; k < 4; k += 1) {
      const name = quatColumns[k]!;
      const v = values[quatIndex[k]!]!;
      if (!NUMBER.test(v)) fail('invalid_input', field, row, name, `${name} must be a number; got "${v}"`, v);
      q[k] = Number(v);
    }
    const norm = Math.hypot(q[0]!, q[1]!, q[2]!, q[3]!);
    if (!(Math.abs(norm - 1) <= QUATERNION_NORM_TOLERANCE)) {
      fail('invalid_input', field, row, 'q_w,q_x,q_y,q_z', `the quaternion must have unit norm (|q| = 1 ± ${QUATERNION_NORM_TOLERANCE}); got |q| = ${norm}`, q, `|q| = 1 ± ${QUATERNION_NORM_TOLERANCE}`);
    }
    times.push(t);
    quats.push(q[0]! / norm, q[1]! / norm, q[2]! / norm, q[3]! / norm);
  }
  if (times.length < 2) {
    fail('invalid_input', field, undefined, undefined, `an attitude table needs at least 2 data rows; found ${times.length}`, times.length, '>= 2 rows');
  }
  return {
    timesS: Float64Array.from(times),
    quaternions: Float64Array.from(quats),
    timeColumn,
    epochUtc: timeColumn === 't_s' ? undefined : (options.epochUtc ?? firstUtc),
  };
}
