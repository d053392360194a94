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

/** What the row generator needs: the epoch that labels the rows, and how to cut them. */
export interface EphemerisCsvRowOptions {
  /** Scenario epoch (t_s = 0). */
  epoch: Epoch;
  /** Rows per yielded chunk, default 1000. */
  rowsPerChunk?: number;
  /** Index of the history's first row in the whole run, for error messages (default 0). */
  firstRowIndex?: number;
}

function checkRowsPerChunk(rowsPerChunk: number): void {
  if (!Number.isInteger(rowsPerChunk) || rowsPerChunk < 1) {
    throw new SrpError('out_of_range', `rowsPerChunk must be a whole number of rows, at least 1; got ${rowsPerChunk}`, {
      field: 'rowsPerChunk',
      value: rowsPerChunk,
      limit: '>= 1',
    });
  }
}

const TWO_DIGITS = Array.from({ length: 61 }, (_, i) => String(i).padStart(2, '0'));
const THREE_DIGITS = Array.from({ length: 1000 }, (_, i) => String(i).padStart(3, '0'));

/**
 * The UTC minute of the last label formatUtc wrote: inside it a label is that minute's prefix
 * ("YYYY-MM-DDThh:mm:") and the seconds. A UTC minute holds no offset change (a leap second,
 * 23:59:60, follows the minute 23:59 and is never cached), so inside it the label advances
 * millisecond for millisecond with TT.
 */
class UtcMinuteCache {
  private startKey = Number.NaN;
  prefix = '';
  constructor(private readonly epoch: Epoch) {}
  /** The millisecond key formatUtc rounds `tSeconds` to (TT ms from J2000: a constant away from its own). */
  key(tSeconds: number): number {
    return Math.round((this.epoch.ttSecondsJ2000 + tSeconds) * 1000);
  }
  /** Milliseconds of `key` into the cached minute, or -1 outside it. */
  offset(key: number): number {
    const ms = key - this.startKey;
    return ms >= 0 && ms < 60_000 ? ms : -1;
  }
  /** formatUtc's label for `tSeconds` (whose key is `key`), remembering its minute. */
  miss(tSeconds: number, key: number): string {
    const label = formatUtc(this.epoch, tSeconds);
    const seconds = Number(label.slice(17, 19));
    if (seconds < 60 && label.length === 24) {
      this.startKey = key - (seconds * 1000 + Number(label.slice(20, 23)));
      this.prefix = label.slice(0, 17);
    } else {
      this.startKey = Number.NaN;
    }
    return label;
  }
}

/**
 * A labeller of sample times: `formatUtc(epoch, t)` to the byte, several times faster on rows
 * that move forward in time (measured about 7×), since inside a cached minute only the seconds
 * are written.
 */
export function createUtcLabeller(epoch: Epoch): (tSeconds: number) => string {
  const cache = new UtcMinuteCache(epoch);
  return (tSeconds: number): string => {
    const key = cache.key(tSeconds);
    const ms = cache.offset(key);
    if (ms < 0) return cache.miss(tSeconds, key);
    const s = Math.floor(ms / 1000);
    return `${cache.prefix}${TWO_DIGITS[s] as string}.${THREE_DIGITS[ms - s * 1000] as string}Z`;
  };
}

/** The rows of `history`, unchecked, in chunks of `rowsPerChunk` lines. */
function* csvRows(history: SampleHistory, rowsPerChunk: number, label: (t: number) => string, firstRowIndex: number): Generator<string, void, undefined> {
  const { layout, samples, sampleCount } = history;
  const offsets = NUMERIC_COLUMNS.map((c) => c.offset(layout));
  const columnCount = NUMERIC_COLUMNS.length;
  let chunk = '';
  let inChunk = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    let line = label(samples[o + layout.t] as number);
    for (let c = 0; c < columnCount; c += 1) {
      const x = samples[o + (offsets[c] as number)] as number;
      const column = NUMERIC_COLUMNS[c] as CsvColumn;
      if (!Number.isFinite(x)) {
        const row = firstRowIndex + k;
        throw new SrpError('invalid_input', `samples.${row}.${column.name} must be a finite number (${column.unit}); got ${x}`, {
          field: `samples.${row}.${column.name}`,
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

/**
 * Yields the header, then the rows in chunks of `rowsPerChunk` lines (each line ends in '\n').
 * Concatenated, the chunks are the whole file.
 * @throws SrpError naming `samples.k.<column>` for a value that is not finite, or the history's fields
 */
export function* ephemerisCsvChunks(history: SampleHistory, options: EphemerisCsvOptions): Generator<string, void, undefined> {
  checkHistory(history);
  const rowsPerChunk = options.rowsPerChunk ?? 1000;
  checkRowsPerChunk(rowsPerChunk);
  yield ephemerisCsvHeader(options);
  yield* csvRows(history, rowsPerChunk, createUtcLabeller(options.epoch), 0);
}

/**
 * Only the rows (no header), in chunks of `rowsPerChunk` lines: for a caller that streams a run
 * piece by piece (the header once from `ephemerisCsvHeader`, then this for each piece). The
 * header followed by the rows of consecutive pieces is byte for byte `ephemerisCsv` of the whole.
 * @throws SrpError naming `samples.k.<column>` (k counted from `firstRowIndex`), or the history's fields
 */
export function* ephemerisCsvRows(history: SampleHistory, options: EphemerisCsvRowOptions): Generator<string, void, undefined> {
  checkHistory(history);
  const rowsPerChunk = options.rowsPerChunk ?? 1000;
  checkRowsPerChunk(rowsPerChunk);
  yield* csvRows(history, rowsPerChunk, createUtcLabeller(options.epoch), options.firstRowIndex ?? 0);
}

/** ASCII codes used by the byte writer. */
const CH_0 = 48;
const CH_MINUS = 45;
const CH_DOT = 46;
const CH_COMMA = 44;
const CH_NEWLINE = 10;
const CH_E = 101;
const CH_PLUS = 43;
const CH_Z = 90;

/** 10^0 ... 10^22: every one exact in binary64, so scaling by one of them is a single rounding. */
const EXACT_POW10 = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));

/** A growable ASCII byte buffer. */
class AsciiWriter {
  bytes: Uint8Array;
  length = 0;
  constructor(capacity: number) {
    this.bytes = new Uint8Array(Math.max(1024, capacity));
  }
  /** Makes room for `n` more bytes. */
  reserve(n: number): void {
    if (this.length + n <= this.bytes.length) return;
    const grown = new Uint8Array(Math.max(this.bytes.length * 2, this.length + n));
    grown.set(this.bytes.subarray(0, this.length));
    this.bytes = grown;
  }
  /** Appends an ASCII string (the rare paths: a label after a minute change, a fallback number). */
  text(s: string): void {
    this.reserve(s.length);
    for (let i = 0; i < s.length; i += 1) this.bytes[this.length + i] = s.charCodeAt(i);
    this.length += s.length;
  }
  /** Appends the decimal digits of the integer 0 ≤ n < 9·10¹⁵, left-padded with zeros to `width`. */
  digits(n: number, width: number): void {
    let count = 1;
    for (let p = 10; p <= n && count < 16; p *= 10) count += 1;
    if (count < width) count = width;
    const b = this.bytes;
    const start = this.length;
    let i = start + count - 1;
    // Two parts below 10⁸, so that the digit arithmetic stays in 32-bit integers (a double % is a slow call).
    const high = Math.floor(n / 1e8);
    let part = (n - high * 1e8) | 0;
    for (let k = 0; k < 8 && i >= start; k += 1) {
      const q = (part / 10) | 0;
      b[i] = CH_0 + part - q * 10;
      part = q;
      i -= 1;
    }
    part = high | 0;
    while (i >= start) {
      const q = (part / 10) | 0;
      b[i] = CH_0 + part - q * 10;
      part = q;
      i -= 1;
    }
    this.length += count;
  }
  /** `formatFixed(x, digits)` as bytes (the same arithmetic; toFixed beyond 9e15 units). */
  fixed(x: number, digits: number): void {
    const scale = EXACT_POW10[digits] as number;
    const n = Math.round(x * scale);
    if (!(n < 9e15 && n > -9e15)) {
      this.text(x.toFixed(digits));
      return;
    }
    if (n < 0) this.bytes[this.length++] = CH_MINUS;
    const a = n < 0 ? -n : n;
    const whole = Math.floor(a / scale);
    this.digits(whole, 1);
    if (digits > 0) {
      this.bytes[this.length++] = CH_DOT;
      this.digits(a - whole * scale, digits);
    }
  }
  /**
   * `x.toExponential(digits)` as bytes. The mantissa is |x| scaled by an exact power of ten (one
   * rounding, relative error ≤ 2⁻⁵³) and rounded to an integer; when the scaled value lies so near
   * a rounding tie or a decade edge that the one rounding could have changed the result, or
   * outside the range where the powers are exact, toExponential itself writes it.
   * @param guess decimal exponent to try first (a column's values change slowly: the previous one)
   * @returns the decimal exponent written, or `guess` when toExponential wrote it
   */
  exponential(x: number, digits: number, guess: number): number {
    const a = x < 0 ? -x : x;
    const low = EXACT_POW10[digits] as number;
    const high = EXACT_POW10[digits + 1] as number;
    if (a >= 1e-280 && a < 1e280 && digits <= 14) {
      let e = guess;
      for (let attempt = 0; attempt < 4; attempt += 1) {
        // Two steps from the guess without a hit: ask the logarithm instead.
        if (attempt === 2) e = Math.floor(Math.log10(a));
        const k = digits - e;
        if (k > 22 || k < -22) {
          if (attempt < 2) continue;
          break;
        }
        const m = k >= 0 ? a * (EXACT_POW10[k] as number) : a / (EXACT_POW10[-k] as number);
        if (m < low) {
          e -= 1;
          continue;
        }
        if (m >= high) {
          e += 1;
          continue;
        }
        const floor = Math.floor(m);
        const fraction = m - floor;
        // 1e-15·m spans a few units in the last place of m: farther from the tie, the exact product rounds alike.
        const guard = 1e-15 * m;
        if (Math.abs(fraction - 0.5) <= guard || m - low <= guard || high - m <= 1) break;
        const n = fraction > 0.5 ? floor + 1 : floor;
        const b = this.bytes;
        if (x < 0) b[this.length++] = CH_MINUS;
        const lead = Math.floor(n / low);
        b[this.length++] = CH_0 + lead;
        if (digits > 0) {
          b[this.length++] = CH_DOT;
          this.digits(n - lead * low, digits);
        }
        b[this.length++] = CH_E;
        b[this.length++] = e < 0 ? CH_MINUS : CH_PLUS;
        this.digits(e < 0 ? -e : e, 1);
        return e;
      }
    }
    this.text(x.toExponential(digits));
    return guess;
  }
}

/**
 * The rows of `history` as ASCII bytes, exactly the text `ephemerisCsvRows` yields, written
 * without building strings: for a server streaming millions of rows (two to three times as fast
 * on a GEO run, measured, and little garbage). The caller passes a piece of the run at a time,
 * e.g. one stored chunk.
 * @throws SrpError naming `samples.k.<column>` (k counted from `firstRowIndex`), or the history's fields
 */
export function ephemerisCsvRowBytes(history: SampleHistory, options: { epoch: Epoch; firstRowIndex?: number }): Uint8Array {
  checkHistory(history);
  const { layout, samples, sampleCount } = history;
  const offsets = NUMERIC_COLUMNS.map((c) => c.offset(layout));
  const fixed = NUMERIC_COLUMNS.map((c) => c.format === 'fixed');
  const digits = NUMERIC_COLUMNS.map((c) => c.digits);
  const columnCount = NUMERIC_COLUMNS.length;
  const exponents = new Int32Array(columnCount);
  // Every write below stays within what was reserved for it: a typed array drops writes past its end silently.
  const out = new AsciiWriter(sampleCount * 300);
  // createUtcLabeller's minute cache, with the prefix also kept as bytes.
  const minute = new UtcMinuteCache(options.epoch);
  const prefix = new Uint8Array(17);
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    // Room for the label; each field below reserves its own (a toFixed fallback is longer than usual).
    out.reserve(32);
    const t = samples[o + layout.t] as number;
    const key = minute.key(t);
    const ms = minute.offset(key);
    if (ms >= 0) {
      out.bytes.set(prefix, out.length);
      out.length += 17;
      const sec = Math.floor(ms / 1000);
      out.digits(sec, 2);
      out.bytes[out.length++] = CH_DOT;
      out.digits(ms - sec * 1000, 3);
      out.bytes[out.length++] = CH_Z;
    } else {
      out.text(minute.miss(t, key));
      for (let i = 0; i < 17; i += 1) prefix[i] = minute.prefix.charCodeAt(i);
    }
    for (let c = 0; c < columnCount; c += 1) {
      const x = samples[o + (offsets[c] as number)] as number;
      if (!Number.isFinite(x)) {
        const column = NUMERIC_COLUMNS[c] as CsvColumn;
        const row = (options.firstRowIndex ?? 0) + k;
        throw new SrpError('invalid_input', `samples.${row}.${column.name} must be a finite number (${column.unit}); got ${x}`, {
          field: `samples.${row}.${column.name}`,
          value: x,
        });
      }
      out.reserve(48);
      out.bytes[out.length++] = CH_COMMA;
      if (fixed[c]) out.fixed(x, digits[c] as number);
      else exponents[c] = out.exponential(x, digits[c] as number, exponents[c] as number);
    }
    out.reserve(1);
    out.bytes[out.length++] = CH_NEWLINE;
  }
  return out.bytes.subarray(0, out.length);
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
