/**
 * CCSDS Orbit Ephemeris Message, KVN form, version 3.0: Orbit Data Messages, CCSDS 502.0-B-3
 * (Blue Book, April 2023), section 5 (OEM) and section 7 (KVN); keyword names and order from
 * memory of that standard. One segment: header, metadata (EME2000 axes, UTC), then one data line
 * per sample, "epoch x y z vx vy vz" in km and km/s. Written by a generator; no I/O here.
 *
 * EQJ here is the mean equator and equinox of J2000, the axes EME2000 names (frames/inertial.ts).
 */
import { checkHistory } from '../budgets/sample-history';
import { SrpError } from '../errors';
import { INERTIAL_FRAME_LABEL } from '../frames/inertial';
import type { SampleHistory } from '../propagation/sample-layout';
import type { Epoch } from '../time/epoch';
import { formatUtc, parseUtcEpoch } from '../time/epoch';
import { EXPORT_CAUTION } from './caution';
import { createUtcLabeller } from './csv-ephemeris';
import { formatFixed } from './number-format';

/** Header and metadata values of the message. */
export interface OemOptions {
  /** Scenario epoch (the samples' t = 0). */
  epoch: Epoch;
  /** Origin: CENTER_NAME EARTH or SUN. */
  centralBody: 'earth' | 'sun';
  /** OBJECT_NAME, e.g. the vehicle's name. */
  objectName: string;
  /** OBJECT_ID: international designator (YYYY-NNNP{PP}) where one exists, else a local identifier. */
  objectId: string;
  /** ORIGINATOR, the creating organisation. */
  originator: string;
  /** CREATION_DATE as ISO 8601 UTC with Z; default: now. */
  creationDateUtc?: string;
  /** MESSAGE_ID (optional in version 3.0). */
  messageId?: string;
  /** USEABLE_START_TIME and USEABLE_STOP_TIME (s from the epoch), both or neither. */
  useableSeconds?: [start: number, stop: number];
  /** Data lines per yielded chunk, default 1000. */
  rowsPerChunk?: number;
}

/** Keywords 502.0-B-3 makes obligatory in the header and in each metadata block. */
export const OEM_MANDATORY_HEADER_KEYWORDS = ['CCSDS_OEM_VERS', 'CREATION_DATE', 'ORIGINATOR'] as const;
export const OEM_MANDATORY_METADATA_KEYWORDS = [
  'OBJECT_NAME',
  'OBJECT_ID',
  'CENTER_NAME',
  'REF_FRAME',
  'TIME_SYSTEM',
  'START_TIME',
  'STOP_TIME',
] as const;

/** Digits after the point: km to the millimetre, km/s to the µm/s. */
const POSITION_DECIMALS = 6;
const VELOCITY_DECIMALS = 9;

/** CCSDS ASCII time code A, "YYYY-MM-DDThh:mm:ss.fff" (the trailing Z dropped; the time system is in TIME_SYSTEM). */
function ccsdsTime(epoch: Epoch, tSeconds: number): string {
  return formatUtc(epoch, tSeconds).slice(0, -1);
}

/** A KVN value: one line, not empty. */
function kvnValue(value: string, field: string): string {
  if (value.trim() === '' || /[\r\n]/.test(value)) {
    throw new SrpError('invalid_input', `${field} must be a non-empty single line of text; got ${JSON.stringify(value)}`, {
      field,
      value,
    });
  }
  return value.trim();
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

/**
 * The header and metadata of a one-segment message whose data lines run from `firstSeconds` to
 * `lastSeconds` (s from the epoch), ending in '\n': what `oemChunks` yields first, for a caller
 * that streams the data lines piece by piece with `oemDataLines`.
 * @throws SrpError naming the option (`objectName`, `creationDateUtc`, `useableSeconds`, ...)
 */
export function oemHeader(options: OemOptions, firstSeconds: number, lastSeconds: number): string {
  const creation = parseUtcEpoch(options.creationDateUtc ?? new Date().toISOString(), 'creationDateUtc');
  const tFirst = firstSeconds;
  const tLast = lastSeconds;
  const header = [
    'CCSDS_OEM_VERS = 3.0',
    `COMMENT ${EXPORT_CAUTION}`,
    `CREATION_DATE = ${ccsdsTime(creation, 0)}`,
    `ORIGINATOR = ${kvnValue(options.originator, 'originator')}`,
  ];
  if (options.messageId !== undefined) header.push(`MESSAGE_ID = ${kvnValue(options.messageId, 'messageId')}`);
  const meta = [
    '',
    'META_START',
    `COMMENT Photon Ledger numerical propagation with SRP; axes ${INERTIAL_FRAME_LABEL} = EME2000`,
    `OBJECT_NAME = ${kvnValue(options.objectName, 'objectName')}`,
    `OBJECT_ID = ${kvnValue(options.objectId, 'objectId')}`,
    `CENTER_NAME = ${options.centralBody === 'earth' ? 'EARTH' : 'SUN'}`,
    'REF_FRAME = EME2000',
    'TIME_SYSTEM = UTC',
    `START_TIME = ${ccsdsTime(options.epoch, tFirst)}`,
  ];
  if (options.useableSeconds !== undefined) {
    const [start, stop] = options.useableSeconds;
    if (!(start >= tFirst && start <= stop && stop <= tLast)) {
      throw new SrpError(
        'out_of_range',
        `useableSeconds must be [start, stop] with ${tFirst} <= start <= stop <= ${tLast} (s from the epoch); got [${start}, ${stop}]`,
        { field: 'useableSeconds', value: options.useableSeconds, limit: `[${tFirst}, ${tLast}]` },
      );
    }
    meta.push(`USEABLE_START_TIME = ${ccsdsTime(options.epoch, start)}`, `USEABLE_STOP_TIME = ${ccsdsTime(options.epoch, stop)}`);
  }
  meta.push(`STOP_TIME = ${ccsdsTime(options.epoch, tLast)}`, 'META_STOP', '', `COMMENT ${EXPORT_CAUTION}`);
  return `${[...header, ...meta].join('\n')}\n`;
}

/** The data lines of `history`, unchecked, in chunks of `rowsPerChunk` lines. */
function* dataLines(history: SampleHistory, epoch: Epoch, rowsPerChunk: number, firstRowIndex: number): Generator<string, void, undefined> {
  const { layout, samples, sampleCount } = history;
  const label = createUtcLabeller(epoch);
  let chunk = '';
  let inChunk = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    // CCSDS ASCII time code A: the UTC label without its Z (TIME_SYSTEM says UTC).
    let line = label(samples[o + layout.t] as number).slice(0, -1);
    for (let j = 0; j < 6; j += 1) {
      const x = samples[o + (j < 3 ? layout.r + j : layout.v + j - 3)] as number;
      if (!Number.isFinite(x)) {
        const field = `samples.${firstRowIndex + k}.${j < 3 ? 'r' : 'v'}.${j % 3}`;
        throw new SrpError('invalid_input', `${field} must be a finite number; got ${x}`, { field, value: x });
      }
      line += ` ${formatFixed(x / 1000, j < 3 ? POSITION_DECIMALS : VELOCITY_DECIMALS)}`;
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
 * Yields the message: header and metadata as the first chunk, then data lines in chunks.
 * @throws SrpError naming the option (`objectName`, `creationDateUtc`, `useableSeconds`, ...) or `samples.k`
 */
export function* oemChunks(history: SampleHistory, options: OemOptions): Generator<string, void, undefined> {
  checkHistory(history);
  const { layout, samples, sampleCount } = history;
  const rowsPerChunk = options.rowsPerChunk ?? 1000;
  checkRowsPerChunk(rowsPerChunk);
  const tFirst = samples[layout.t] as number;
  const tLast = samples[(sampleCount - 1) * layout.stride + layout.t] as number;
  yield oemHeader(options, tFirst, tLast);
  yield* dataLines(history, options.epoch, rowsPerChunk, 0);
}

/** What the data-line generator needs. */
export interface OemDataLineOptions {
  /** Scenario epoch (the samples' t = 0). */
  epoch: Epoch;
  /** Data lines per yielded chunk, default 1000. */
  rowsPerChunk?: number;
  /** Index of the history's first row in the whole run, for error messages (default 0). */
  firstRowIndex?: number;
}

/**
 * Only the data lines ("epoch x y z vx vy vz", km and km/s), in chunks: `oemHeader` followed by
 * the data lines of consecutive pieces of a run is byte for byte `oemText` of the whole.
 * @throws SrpError naming `samples.k.r.j` or `samples.k.v.j` (k counted from `firstRowIndex`), or the history's fields
 */
export function* oemDataLines(history: SampleHistory, options: OemDataLineOptions): Generator<string, void, undefined> {
  checkHistory(history);
  const rowsPerChunk = options.rowsPerChunk ?? 1000;
  checkRowsPerChunk(rowsPerChunk);
  yield* dataLines(history, options.epoch, rowsPerChunk, options.firstRowIndex ?? 0);
}

/** The message as one string (for small runs; stream `oemChunks` for large ones). */
export function oemText(history: SampleHistory, options: OemOptions): string {
  let out = '';
  for (const chunk of oemChunks(history, options)) out += chunk;
  return out;
}

/** One metadata block and the data lines that follow it. */
export interface OemSegment {
  /** Metadata keyword → value. */
  metadata: Record<string, string>;
  /** COMMENT lines of the metadata and data sections. */
  comments: string[];
  /** Epoch of each data line, as written. */
  epochs: string[];
  /** Seconds of each data line from the first data line of the message, leap seconds counted (s). */
  tSeconds: Float64Array;
  /** Per data line: x, y, z (km), vx, vy, vz (km/s). */
  statesKm: Float64Array;
}

/** A parsed OEM. */
export interface ParsedOem {
  /** Header keyword → value (CCSDS_OEM_VERS, CREATION_DATE, ORIGINATOR, ...). */
  header: Record<string, string>;
  /** Header COMMENT lines. */
  comments: string[];
  segments: OemSegment[];
}

function oemError(lineNo: number, message: string, value: unknown): SrpError {
  return new SrpError('invalid_input', `line ${lineNo}: ${message}`, { field: `line ${lineNo}`, value });
}

/** Parses a CCSDS time "YYYY-MM-DDThh:mm:ss[.f]" (Z optional) as UTC. */
function parseCcsdsUtc(text: string, lineNo: number): Epoch {
  try {
    return parseUtcEpoch(text.endsWith('Z') ? text : `${text}Z`, `line ${lineNo}`);
  } catch {
    throw oemError(lineNo, `expected a UTC time YYYY-MM-DDThh:mm:ss[.fff]; got '${text}'`, text);
  }
}

/**
 * Reads an OEM in KVN form: the header, each segment's metadata and its state lines (7 fields,
 * or 10 with accelerations, which are dropped); covariance blocks are skipped. Checks that every
 * obligatory keyword is present, that TIME_SYSTEM is UTC (the only one read here) and that data
 * epochs are in order.
 * @throws SrpError `invalid_input` naming the missing keyword, or `line N` for a malformed line
 */
export function parseOem(text: string): ParsedOem {
  const header: Record<string, string> = {};
  const comments: string[] = [];
  const segments: OemSegment[] = [];
  type Building = { metadata: Record<string, string>; comments: string[]; epochs: string[]; t: number[]; states: number[] };
  let current: Building | null = null;
  let state: 'header' | 'meta' | 'data' | 'covariance' = 'header';
  let first: Epoch | null = null;
  let tPrev = -Infinity;
  const finish = (): void => {
    if (current === null) return;
    segments.push({
      metadata: current.metadata,
      comments: current.comments,
      epochs: current.epochs,
      tSeconds: Float64Array.from(current.t),
      statesKm: Float64Array.from(current.states),
    });
    current = null;
  };
  const lines = text.split(/\r?\n/);
  lines.forEach((raw, i) => {
    const lineNo = i + 1;
    const line = raw.trim();
    if (line === '') return;
    if (line === 'COMMENT' || line.startsWith('COMMENT ')) {
      const body = line.slice('COMMENT'.length).trim();
      if (state === 'header') comments.push(body);
      else current?.comments.push(body);
      return;
    }
    if (line === 'META_START') {
      finish();
      current = { metadata: {}, comments: [], epochs: [], t: [], states: [] };
      state = 'meta';
      return;
    }
    if (line === 'META_STOP') {
      if (state !== 'meta' || current === null) throw oemError(lineNo, 'META_STOP without META_START', line);
      const metadata = (current as Building).metadata;
      for (const key of OEM_MANDATORY_METADATA_KEYWORDS) {
        if (!(key in metadata)) {
          throw new SrpError('invalid_input', `the metadata block ending on line ${lineNo} lacks the obligatory keyword ${key}`, {
            field: key,
            value: undefined,
          });
        }
      }
      if (metadata.TIME_SYSTEM !== 'UTC') {
        throw new SrpError('invalid_input', `TIME_SYSTEM must be UTC to be read here; got ${metadata.TIME_SYSTEM}`, {
          field: 'TIME_SYSTEM',
          value: metadata.TIME_SYSTEM,
          limit: 'UTC',
        });
      }
      state = 'data';
      return;
    }
    if (line === 'COVARIANCE_START') {
      state = 'covariance';
      return;
    }
    if (line === 'COVARIANCE_STOP') {
      state = 'data';
      return;
    }
    if (state === 'covariance') return;
    const kv = /^([A-Z0-9_]+)\s*=\s*(.*)$/.exec(line);
    if (state === 'header' || state === 'meta') {
      if (!kv) throw oemError(lineNo, `expected KEYWORD = value; got '${line}'`, line);
      const target = state === 'header' ? header : (current as Building).metadata;
      target[kv[1] as string] = (kv[2] as string).trim();
      return;
    }
    const fields = line.split(/\s+/);
    if (fields.length !== 7 && fields.length !== 10) {
      throw oemError(lineNo, `a data line has 7 fields (epoch x y z vx vy vz) or 10 (with accelerations); got ${fields.length}`, line);
    }
    const epoch = parseCcsdsUtc(fields[0] as string, lineNo);
    first ??= epoch;
    const t = epoch.ttSecondsJ2000 - first.ttSecondsJ2000;
    if (t < tPrev) throw oemError(lineNo, `data epochs must not go back in time; ${fields[0]} comes after a later one`, fields[0]);
    tPrev = t;
    const b = current as Building;
    b.epochs.push(fields[0] as string);
    b.t.push(t);
    for (let j = 1; j <= 6; j += 1) {
      const x = Number(fields[j]);
      if (!Number.isFinite(x)) throw oemError(lineNo, `field ${j + 1} must be a finite number; got '${fields[j]}'`, fields[j]);
      b.states.push(x);
    }
  });
  if ((state as string) === 'meta') throw new SrpError('invalid_input', 'the message ends inside a metadata block (no META_STOP)', { field: 'META_STOP', value: undefined });
  finish();
  for (const key of OEM_MANDATORY_HEADER_KEYWORDS) {
    if (!(key in header)) {
      throw new SrpError('invalid_input', `the header lacks the obligatory keyword ${key}`, { field: key, value: undefined });
    }
  }
  if (segments.length === 0) throw new SrpError('invalid_input', 'the message has no META_START block', { field: 'META_START', value: undefined });
  return { header, comments, segments };
}
