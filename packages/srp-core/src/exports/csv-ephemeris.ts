/**
 * The ephemeris as CSV: comment lines stating product, caution, frame, central body, time scale,
 * epoch and every column's unit, then one row per sample. Written by a generator of chunks so a
 * caller can stream a million rows without building one string; no I/O here.
 */
import { checkHistory } from '../budgets/sample-history';
import { SrpError } from '../errors';
import { INERTIAL_FRAME_LABEL } from '../frames/inertial';
import type { SampleHistory, SampleLayout } from '../propagation/sample-layout';
import type { Epoch } from '../time/epoch';
import { formatUtc } from '../time/epoch';
import { EXPORT_CAUTION } from './caution';
import { formatFixed } from './number-format';

/** What the CSV header states besides the samples. */
export interface EphemerisCsvOptions {
  /** Scenario epoch (t_s = 0). */
  epoch: Epoch;
  /** Origin of the inertial frame. */
  centralBody: 'earth' | 'sun';
  /** Product line, default 'Photon Ledger SRP ephemeris'. */
  product?: string;
  /** Rows per yielded chunk, default 1000. */
  rowsPerChunk?: number;
}

interface CsvColumn {
  name: string;
  unit: string;
  /** Offset in the sample row. */
  offset: (layout: SampleLayout) => number;
  /** Printed precision: digits after the point ('fixed') or significant digits − 1 ('exp'). */
  format: 'fixed' | 'exp';
  digits: number;
}

const vector = (prefix: string, suffix: string, unit: string, offset: (l: SampleLayout) => number, format: 'fixed' | 'exp', digits: number): CsvColumn[] =>
  ['x', 'y', 'z'].map((axis, j) => ({ name: `${prefix}${axis}${suffix}`, unit, offset: (l: SampleLayout) => offset(l) + j, format, digits }));

/**
 * The numeric columns after time_utc, with units and printed precision: t to the microsecond,
 * positions to the millimetre, velocities to the µm/s, accelerations and torques to 10
 * significant digits, the illuminated fraction to 1e-6 and the Sun distance to 0.1 m.
 */
const NUMERIC_COLUMNS: readonly CsvColumn[] = [
  { name: 't_s', unit: 's', offset: (l) => l.t, format: 'fixed', digits: 6 },
  ...vector('', '_m', 'm', (l) => l.r, 'fixed', 3),
  ...vector('v', '_m_s', 'm/s', (l) => l.v, 'fixed', 6),
  ...vector('srp_a', '_eqj_m_s2', 'm/s^2', (l) => l.srpAccelInertial, 'exp', 9),
  ...vector('srp_a', '_body_m_s2', 'm/s^2', (l) => l.srpAccelBody, 'exp', 9),
  ...vector('srp_t', '_body_n_m', 'N*m', (l) => l.srpTorqueBody, 'exp', 9),
  { name: 'illuminated_fraction', unit: '- (0 umbra to 1 full Sun)', offset: (l) => l.illuminatedFraction, format: 'fixed', digits: 6 },
  { name: 'sun_distance_m', unit: 'm', offset: (l) => l.sunDistanceM, format: 'fixed', digits: 1 },
];

/** Column names in order, time_utc first. */
export const EPHEMERIS_CSV_COLUMNS: readonly string[] = ['time_utc', ...NUMERIC_COLUMNS.map((c) => c.name)];

/** The comment lines ('# key: value') and the column line, each ending in '\n'. */
export function ephemerisCsvHeader(options: EphemerisCsvOptions): string {
  const origin = options.centralBody === 'earth' ? "the Earth's centre" : "the Sun's centre";
  const units = [
    'time_utc ISO 8601 UTC',
    ...NUMERIC_COLUMNS.map((c) => `${c.name} ${c.unit}`),
  ].join('; ');
  const lines = [
    `# product: ${options.product ?? 'Photon Ledger SRP ephemeris'}`,
    `# caution: ${EXPORT_CAUTION}`,
    `# frame: ${INERTIAL_FRAME_LABEL}, origin at ${origin}; body-frame columns in the vehicle's body axes`,
    `# central_body: ${options.centralBody}`,
    '# time_scale: UTC (time_utc to the millisecond, 23:59:60 inside a leap second); t_s elapsed SI seconds from the epoch, leap seconds counted',
    `# epoch: ${options.epoch.utcIso}`,
    `# units: ${units}`,
    EPHEMERIS_CSV_COLUMNS.join(','),
  ];
  return `${lines.join('\n')}\n`;
}

/**
 * Yields the header, then the rows in chunks of `rowsPerChunk` lines (each line ends in '\n').
 * Concatenated, the chunks are the whole file.
 * @throws SrpError naming `samples.k.<column>` for a value that is not finite, or the history's fields
 */
export function* ephemerisCsvChunks(history: SampleHistory, options: EphemerisCsvOptions): Generator<string, void, undefined> {
  checkHistory(history);
  const rowsPerChunk = options.rowsPerChunk ?? 1000;
  if (!Number.isInteger(rowsPerChunk) || rowsPerChunk < 1) {
    throw new SrpError('out_of_range', `rowsPerChunk must be a whole number of rows, at least 1; got ${rowsPerChunk}`, {
      field: 'rowsPerChunk',
      value: rowsPerChunk,
      limit: '>= 1',
    });
  }
  yield ephemerisCsvHeader(options);
  const { layout, samples, sampleCount } = history;
  const offsets = NUMERIC_COLUMNS.map((c) => c.offset(layout));
  const columnCount = NUMERIC_COLUMNS.length;
  let chunk = '';
  let inChunk = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    let line = formatUtc(options.epoch, samples[o + layout.t] as number);
    for (let c = 0; c < columnCount; c += 1) {
      const x = samples[o + (offsets[c] as number)] as number;
      const column = NUMERIC_COLUMNS[c] as CsvColumn;
      if (!Number.isFinite(x)) {
        throw new SrpError('invalid_input', `samples.${k}.${column.name} must be a finite number (${column.unit}); got ${x}`, {
          field: `samples.${k}.${column.name}`,
          value: x,
        });
      }
      line += `,${column.format === 'fixed' ? formatFixed(x, column.digits) : x.toExponential(column.digits)}`;
    }
    chunk += `${line}\n`;
    inChunk += 1;
    if (inChunk === rowsPerChunk) {
      yield chunk;
      chunk = '';
      inChunk = 0;
    }
  }
  if (inChunk > 0) yield chunk;
}

/** The CSV as one string (for small runs; stream `ephemerisCsvChunks` for large ones). */
export function ephemerisCsv(history: SampleHistory, options: EphemerisCsvOptions): string {
  let out = '';
  for (const chunk of ephemerisCsvChunks(history, options)) out += chunk;
  return out;
}

/** A parsed ephemeris CSV. */
export interface ParsedEphemerisCsv {
  /** The '# key: value' comment lines, by key. */
  meta: Record<string, string>;
  /** Column names, in file order. */
  columns: string[];
  /** The time_utc column. */
  timeUtc: string[];
  /** Every other column by name (units as in `meta.units`). */
  data: Record<string, Float64Array>;
}

/**
 * Reads back a CSV written by `ephemerisCsvChunks` (or any CSV with '#' comment lines, a header
 * line with a time_utc column and numeric other columns).
 * @throws SrpError `invalid_input` naming `line N` (1-based): a missing header, a wrong number of
 *   fields or a field that is not a number
 */
export function parseEphemerisCsv(text: string): ParsedEphemerisCsv {
  const meta: Record<string, string> = {};
  const lines = text.split(/\r?\n/);
  let columns: string[] | null = null;
  let timeIndex = -1;
  const timeUtc: string[] = [];
  const values: number[][] = [];
  lines.forEach((raw, i) => {
    const line = raw.trim();
    if (line === '') return;
    if (line.startsWith('#')) {
      const m = /^#\s*([^:]+?)\s*:\s*(.*)$/.exec(line);
      if (m) meta[m[1] as string] = m[2] as string;
      return;
    }
    const fields = line.split(',').map((f) => f.trim());
    if (columns === null) {
      columns = fields;
      timeIndex = fields.indexOf('time_utc');
      if (timeIndex < 0) {
        throw new SrpError('invalid_input', `line ${i + 1}: the header must name a time_utc column; got ${line}`, {
          field: `line ${i + 1}`,
          value: line,
        });
      }
      values.push(...fields.map(() => [] as number[]));
      return;
    }
    if (fields.length !== columns.length) {
      throw new SrpError('invalid_input', `line ${i + 1}: expected ${columns.length} fields, got ${fields.length}`, {
        field: `line ${i + 1}`,
        value: line,
        limit: columns.length,
      });
    }
    fields.forEach((f, j) => {
      if (j === timeIndex) {
        timeUtc.push(f);
        return;
      }
      const x = f === '' ? Number.NaN : Number(f);
      if (!Number.isFinite(x)) {
        throw new SrpError('invalid_input', `line ${i + 1}: ${(columns as string[])[j]} must be a finite number; got '${f}'`, {
          field: `line ${i + 1}`,
          value: f,
        });
      }
      (values[j] as number[]).push(x);
    });
  });
  if (columns === null) {
    throw new SrpError('invalid_input', 'the CSV has no header line (expected time_utc,t_s,...)', { field: 'line 1', value: text.slice(0, 80) });
  }
  const cols: string[] = columns;
  const data: Record<string, Float64Array> = {};
  cols.forEach((name, j) => {
    if (j !== timeIndex) data[name] = Float64Array.from(values[j] as number[]);
  });
  return { meta, columns: cols, timeUtc, data };
}
