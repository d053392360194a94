/**
 * Pieces shared by the OBJ and STL readers: the error they throw, a line reader that counts lines
 * as a text editor does, token and number scanning without regular expressions, and growable
 * packed arrays for the triangles read so far.
 */
import { SrpError } from '../errors';
import type { SrpErrorDetails } from '../errors';

/** Mesh file formats told apart by `readMesh`. */
export type MeshFileFormat = 'obj' | 'stl-ascii' | 'stl-binary';

/** Details of a refused mesh file: `field` is always `file`, plus where in the file. */
export interface MeshFileErrorDetails extends SrpErrorDetails {
  /** 1-based line number of a text file (the first line of a `\`-continued OBJ line). */
  line?: number;
  /** 1-based triangle number of a binary STL. */
  triangle?: number;
}

/** Throws the reader's error: `<file name>, line N: problem`, details with `field: 'file'`. */
export function failFile(
  code: 'invalid_input' | 'out_of_range',
  fileName: string,
  where: { line?: number; triangle?: number },
  problem: string,
  value: unknown,
  limit?: number | string,
): never {
  const name = fileName.trim() === '' ? 'mesh file' : `mesh file ${fileName}`;
  const place =
    where.line !== undefined ? `, line ${where.line}` : where.triangle !== undefined ? `, triangle ${where.triangle}` : '';
  const details: MeshFileErrorDetails = {
    field: 'file',
    value,
    ...(limit === undefined ? {} : { limit }),
    ...(where.line === undefined ? {} : { line: where.line }),
    ...(where.triangle === undefined ? {} : { triangle: where.triangle }),
  };
  throw new SrpError(code, `${name}${place}: ${problem}`, details);
}

/** Refuses a file with more than `maxTriangles` triangles (counted after polygons are fanned). */
export function failTooManyTriangles(fileName: string, count: number | string, maxTriangles: number, line?: number): never {
  return failFile(
    'out_of_range',
    fileName,
    line === undefined ? {} : { line },
    `has ${count} triangles; at most ${maxTriangles} are accepted (split or simplify the mesh)`,
    count,
    maxTriangles,
  );
}

/**
 * Reads text line by line; `\n`, `\r\n` and a lone `\r` end a line. `lineNumber` is the 1-based
 * number of the line last returned.
 */
export class LineReader {
  private position = 0;
  lineNumber = 0;

  constructor(private readonly text: string) {}

  /** @returns the next line without its line end, or undefined at the end of the text */
  next(): string | undefined {
    const text = this.text;
    const start = this.position;
    if (start >= text.length) return undefined;
    let end = start;
    while (end < text.length) {
      const c = text.charCodeAt(end);
      if (c === 10 || c === 13) break;
      end += 1;
    }
    // Step over "\r\n" as one line end.
    this.position = end + (text.charCodeAt(end) === 13 && text.charCodeAt(end + 1) === 10 ? 2 : 1);
    this.lineNumber += 1;
    return text.slice(start, end);
  }
}

/** Space, tab, vertical tab, form feed (line ends never reach the tokenizer). */
export function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 11 || c === 12;
}

/** @returns the index of the first non-space character at or after `from` */
export function skipSpaces(s: string, from: number): number {
  let i = from;
  while (i < s.length && isSpace(s.charCodeAt(i))) i += 1;
  return i;
}

/** @returns the index just after the token starting at `from` */
export function tokenEnd(s: string, from: number): number {
  let i = from;
  while (i < s.length && !isSpace(s.charCodeAt(i))) i += 1;
  return i;
}

/**
 * Parses a plain decimal number (`-1.5`, `.5`, `2.`, `3e-4`); NaN for anything else, including
 * hexadecimal and binary literals that `Number` would accept, and for overflow to ±Infinity.
 */
export function parseDecimal(token: string): number {
  for (let i = 0; i < token.length; i += 1) {
    const c = token.charCodeAt(i);
    // digits, '+', '-', '.', 'e', 'E'
    if (!((c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 || c === 101 || c === 69)) return NaN;
  }
  const value = token.length === 0 ? NaN : Number(token);
  return Number.isFinite(value) ? value : NaN;
}

/** A Float64Array that grows by doubling. */
export class GrowableFloat64 {
  data: Float64Array;
  length = 0;

  constructor(capacity = 1024) {
    this.data = new Float64Array(capacity);
  }

  push3(a: number, b: number, c: number): void {
    if (this.length + 3 > this.data.length) this.grow(this.length + 3);
    const data = this.data;
    data[this.length] = a;
    data[this.length + 1] = b;
    data[this.length + 2] = c;
    this.length += 3;
  }

  private grow(minimum: number): void {
    const next = new Float64Array(Math.max(minimum, this.data.length * 2));
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }

  /** @returns a copy trimmed to the length */
  toArray(): Float64Array {
    return this.data.slice(0, this.length);
  }
}

/** A Uint32Array that grows by doubling. */
export class GrowableUint32 {
  data: Uint32Array;
  length = 0;

  constructor(capacity = 1024) {
    this.data = new Uint32Array(capacity);
  }

  push(value: number): void {
    if (this.length + 1 > this.data.length) {
      const next = new Uint32Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.length] = value;
    this.length += 1;
  }

  /** @returns a copy trimmed to the length */
  toArray(): Uint32Array {
    return this.data.slice(0, this.length);
  }
}

/** Group names in first-seen order, with the index of each. */
export class GroupNameTable {
  readonly names: string[] = [];
  private readonly indexByName = new Map<string, number>();

  /** @returns the index of `name`, adding it when new */
  indexOf(name: string): number {
    let index = this.indexByName.get(name);
    if (index === undefined) {
      index = this.names.length;
      this.names.push(name);
      this.indexByName.set(name, index);
    }
    return index;
  }
}

/** Triangles as read from a file, before units and the body-frame transform. */
export interface RawTriangles {
  /** 9 numbers per triangle, v0 v1 v2, in the file's units. */
  positions: Float64Array;
  /** Index into `groupNames` for each triangle. */
  groupOfTriangle: Uint32Array;
  /** Every group name met while reading (some may end up without triangles). */
  groupNames: string[];
}

/** The default group name: faces before any name, an unnamed STL solid. */
export const DEFAULT_GROUP_NAME = 'default';
