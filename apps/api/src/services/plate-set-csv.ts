/**
 * The plate-set CSV: a vehicle's flat plates as a table, one plate per row (format in
 * fixtures/uploads/README.md). Each row is turned into a plate of the shared vehicle schema and
 * validated with it; problems come back with the file line number and the column, so that the
 * uploader can find them in a text editor or a spreadsheet.
 */
import { CsvError, parse } from 'csv-parse/sync';
import type { z } from 'zod';
import { materialPresetKeys, vehicleSpecSchema, type VehicleSpec } from '@photon-ledger/shared';

/** One plate as the shared vehicle schema holds it. */
export type PlateSpec = Extract<VehicleSpec, { kind: 'plates' }>['plates'][number];

/** Columns every plate-set CSV has. */
export const requiredPlateColumns = [
  'name',
  'area_m2',
  'normal_x',
  'normal_y',
  'normal_z',
  'centroid_x_m',
  'centroid_y_m',
  'centroid_z_m',
] as const;

const faces = ['front', 'back'] as const;
type Face = (typeof faces)[number];
const fractionKeys = ['absorbed', 'specular', 'diffuse'] as const;
const emissivityKeys = [
  ['emissivityFront', 'emissivity_front'],
  ['emissivityBack', 'emissivity_back'],
] as const;
const trackingAxisColumns = ['tracking_axis_x', 'tracking_axis_y', 'tracking_axis_z'] as const;
const trackingLimitColumns = ['tracking_min_deg', 'tracking_max_deg'] as const;

const faceColumns = (face: Face) => [
  `${face}_preset`,
  ...fractionKeys.map((k) => `${face}_${k}`),
  ...emissivityKeys.map(([, c]) => `${face}_${c}`),
];

/** Every column a plate-set CSV may have; the optional ones may be left out of the header. */
export const plateSetColumns: readonly string[] = [
  ...requiredPlateColumns,
  ...faceColumns('front'),
  ...faceColumns('back'),
  ...trackingAxisColumns,
  ...trackingLimitColumns,
];

/** Most problems reported for one file. */
export const MAX_REPORTED_PROBLEMS = 10;
/** Most plates in one file. */
export const MAX_PLATES = 5000;

/** One thing wrong with the file: where (1-based line, column name) and what. */
export interface PlateSetProblem {
  /** Line of the file (header = its line, comments and blank lines counted); undefined: the whole file. */
  row: number | undefined;
  /** Column name, or several joined by `+` or `/`; undefined: the whole row. */
  column: string | undefined;
  message: string;
}

/** The outcome of reading a plate-set CSV. */
export type PlateSetParse = { ok: true; plates: PlateSpec[] } | { ok: false; problems: PlateSetProblem[] };

/** The `fields` key of a problem in an error answer: `row 5, column area_m2`, `row 5`, or `file`. */
export function plateSetProblemKey(problem: PlateSetProblem): string {
  if (problem.row === undefined) return 'file';
  return problem.column === undefined ? `row ${problem.row}` : `row ${problem.row}, column ${problem.column}`;
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

const unitOf = (column: string): string => {
  if (column === 'area_m2') return 'm²';
  if (column.startsWith('centroid_')) return 'm';
  if (column.endsWith('_deg')) return '°';
  if (column.startsWith('normal_') || column.startsWith('tracking_axis_')) return 'a direction component, unit-less';
  return 'a fraction in [0, 1]';
};

/** Collects problems and stops listening after MAX_REPORTED_PROBLEMS. */
class Problems {
  readonly list: PlateSetProblem[] = [];
  add(row: number | undefined, column: string | undefined, message: string): void {
    if (this.list.length < MAX_REPORTED_PROBLEMS) this.list.push({ row, column, message });
  }
  get full(): boolean {
    return this.list.length >= MAX_REPORTED_PROBLEMS;
  }
}

/**
 * Reads a plate-set CSV (UTF-8 text; a byte-order mark, CRLF line ends, quoted values and comment
 * lines starting with `#` are accepted) into plates of the shared vehicle schema. Nothing is
 * thrown for a bad file: the first problems (up to 10) come back with their line and column.
 */
export function parsePlateSetCsv(text: string): PlateSetParse {
  const problems = new Problems();
  let records: { record: string[]; info: { lines: number } }[];
  try {
    // With `info: true` each record comes as { record, info } (the typings do not follow the option).
    records = parse(text, {
      bom: true,
      comment: '#',
      comment_no_infix: true,
      skip_empty_lines: true,
      relax_column_count: true,
      trim: true,
      info: true,
    }) as unknown as typeof records;
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    const line = (error as CsvError & { lines?: number }).lines;
    return { ok: false, problems: [{ row: typeof line === 'number' ? line : undefined, column: undefined, message: `not readable as CSV: ${error.message}` }] };
  }
  records = records.filter((r) => r.record.some((cell) => cell !== ''));
  const [headerRecord, ...rows] = records;
  if (!headerRecord) {
    return {
      ok: false,
      problems: [{ row: undefined, column: undefined, message: `the file is empty: expected a header row naming at least ${requiredPlateColumns.join(', ')} and front_preset (or front_absorbed, front_specular, front_diffuse), then one plate per row` }],
    };
  }
  const headerLine = headerRecord.info.lines;
  const header = headerRecord.record.map((name) => name.toLowerCase());
  const index = readHeader(header, headerLine, problems);
  if (problems.list.length > 0) return { ok: false, problems: problems.list };
  if (rows.length === 0) {
    return { ok: false, problems: [{ row: undefined, column: undefined, message: 'the file has a header but no plate rows' }] };
  }
  if (rows.length > MAX_PLATES) {
    return { ok: false, problems: [{ row: undefined, column: undefined, message: `the file has ${rows.length} plates; at most ${MAX_PLATES} are accepted` }] };
  }

  const plates: PlateSpec[] = [];
  const lineOfPlate: number[] = [];
  for (const { record, info } of rows) {
    if (problems.full) break;
    const line = info.lines;
    if (record.length !== header.length) {
      problems.add(line, undefined, `has ${record.length} values, expected ${header.length} (${header.join(',')})`);
      continue;
    }
    const built = buildPlate((column) => record[index.get(column) ?? -1] ?? '', line, problems);
    if (built === undefined) continue;
    const checked = checkPlate(built.plate, built.usesPreset, line, problems);
    if (checked !== undefined) {
      plates.push(checked);
      lineOfPlate.push(line);
    }
  }
  if (problems.list.length > 0) return { ok: false, problems: problems.list };

  // Rules across rows (unique names) are checked on the whole vehicle.
  const whole = vehicleSpecSchema.safeParse({ kind: 'plates', name: 'plate set', massKg: 1, centreOfMassM: [0, 0, 0], plates });
  if (!whole.success) {
    for (const issue of whole.error.issues) {
      const [, plateIndex] = issue.path;
      const line = typeof plateIndex === 'number' ? lineOfPlate[plateIndex] : undefined;
      const mapped = columnOfIssue(issue.path.slice(2), false);
      problems.add(line, mapped.column, renameKey(issue.message.replace(/plates\.(\d+)/g, (_, i: string) => `line ${lineOfPlate[Number(i)] ?? '?'}`), mapped));
    }
    return { ok: false, problems: problems.list };
  }
  return { ok: true, plates };
}

/** Checks the header; returns the column positions. */
function readHeader(header: string[], line: number, problems: Problems): Map<string, number> {
  const index = new Map<string, number>();
  header.forEach((name, i) => {
    if (name === '') problems.add(line, `column ${i + 1}`, 'empty column name');
    else if (!plateSetColumns.includes(name)) problems.add(line, name, `unknown column ${name}; allowed: ${plateSetColumns.join(', ')}`);
    else if (index.has(name)) problems.add(line, name, `column ${name} appears twice`);
    else index.set(name, i);
  });
  for (const name of requiredPlateColumns) {
    if (!index.has(name)) problems.add(line, name, `column ${name} is missing; a plate-set CSV needs ${requiredPlateColumns.join(', ')}`);
  }
  for (const face of faces) {
    const fractions = fractionKeys.map((k) => `${face}_${k}`);
    const present = fractions.filter((c) => index.has(c));
    if (present.length > 0 && present.length < fractions.length) {
      for (const c of fractions) if (!index.has(c)) problems.add(line, c, `column ${c} is missing: ${fractions.join(', ')} go together`);
    }
  }
  if (!index.has('front_preset') && !index.has('front_absorbed')) {
    problems.add(line, 'front_preset', 'front optics are missing: add column front_preset (a material preset) or front_absorbed, front_specular, front_diffuse');
  }
  for (const group of [trackingAxisColumns, trackingLimitColumns]) {
    const present = group.filter((c) => index.has(c));
    if (present.length > 0 && present.length < group.length) {
      for (const c of group) if (!index.has(c)) problems.add(line, c, `column ${c} is missing: ${group.join(', ')} go together`);
    }
  }
  if (index.has('tracking_min_deg') && !index.has('tracking_axis_x')) {
    problems.add(line, 'tracking_axis_x', 'tracking limits need the tracking axis columns tracking_axis_x, tracking_axis_y, tracking_axis_z');
  }
  return index;
}

/** Reads the cells of one row into a plate object (not yet validated); undefined when a cell is unusable. */
function buildPlate(
  cell: (column: string) => string,
  line: number,
  problems: Problems,
): { plate: Record<string, unknown>; usesPreset: Record<Face, boolean> } | undefined {
  const before = problems.list.length;
  const number = (column: string, required: boolean): number | undefined => {
    const text = cell(column);
    if (text === '') {
      if (required) problems.add(line, column, `${column} is required (${unitOf(column)})`);
      return undefined;
    }
    if (!NUMBER.test(text)) {
      problems.add(line, column, `${column} must be a number (${unitOf(column)}); got "${text}"`);
      return undefined;
    }
    return Number(text);
  };
  const vector = (columns: readonly string[], required: boolean): number[] | undefined => {
    const filled = columns.filter((c) => cell(c) !== '');
    if (!required && filled.length === 0) return undefined;
    const values = columns.map((c) => number(c, true));
    return values.every((v) => v !== undefined) ? (values as number[]) : undefined;
  };

  const plate: Record<string, unknown> = {};
  const name = cell('name');
  if (name === '') problems.add(line, 'name', 'name is required: each plate needs a unique name');
  plate.name = name;
  plate.areaM2 = number('area_m2', true);
  plate.normal = vector(['normal_x', 'normal_y', 'normal_z'], true);
  plate.centroidM = vector(['centroid_x_m', 'centroid_y_m', 'centroid_z_m'], true);

  const usesPreset: Record<Face, boolean> = { front: false, back: false };
  for (const face of faces) {
    const preset = cell(`${face}_preset`);
    const filled = [...fractionKeys.map((k) => `${face}_${k}`), ...emissivityKeys.map(([, c]) => `${face}_${c}`)].filter((c) => cell(c) !== '');
    if (preset !== '') {
      usesPreset[face] = true;
      if (filled.length > 0) {
        problems.add(line, filled[0], `give ${face}_preset or the ${face} fractions, not both (a preset carries its own optics)`);
      }
      plate[face] = preset;
    } else if (filled.length > 0) {
      const optics: Record<string, number | undefined> = {};
      for (const k of fractionKeys) optics[k] = number(`${face}_${k}`, true);
      for (const [key, column] of emissivityKeys) {
        const v = number(`${face}_${column}`, false);
        if (v !== undefined) optics[key] = v;
      }
      plate[face] = optics;
    } else if (face === 'front') {
      problems.add(line, 'front_preset', 'front optics are required: a front_preset, or front_absorbed, front_specular and front_diffuse');
    }
  }

  const axis = vector(trackingAxisColumns, false);
  if (axis !== undefined) plate.trackingAxis = axis;
  const limits = vector(trackingLimitColumns, false);
  if (limits !== undefined) plate.trackingLimitsDeg = limits;

  return problems.list.length > before ? undefined : { plate, usesPreset };
}

/** Validates one plate with the shared schema; maps its issues onto the row's columns. */
function checkPlate(plate: Record<string, unknown>, usesPreset: Record<Face, boolean>, line: number, problems: Problems): PlateSpec | undefined {
  const result = vehicleSpecSchema.safeParse({ kind: 'plates', name: 'plate set', massKg: 1, centreOfMassM: [0, 0, 0], plates: [plate] });
  if (result.success) {
    const spec = result.data;
    return spec.kind === 'plates' ? spec.plates[0] : undefined;
  }
  for (const issue of result.error.issues) {
    const path = issue.path.slice(2);
    const face = path[0] === 'front' || path[0] === 'back' ? path[0] : undefined;
    // A face's optics are a union (preset or fractions): show the branch the row used.
    const inner = issue.code === 'invalid_union' && face !== undefined && !usesPreset[face] ? fractionBranchIssues(issue) : undefined;
    if (inner !== undefined && inner.length > 0) {
      for (const sub of inner) {
        const mapped = columnOfIssue([face!, ...sub.path], false);
        problems.add(line, mapped.column, renameKey(sub.message, mapped));
      }
      continue;
    }
    if (issue.code === 'invalid_union' && face !== undefined && usesPreset[face]) {
      problems.add(line, `${face}_preset`, `${face}_preset must be a material preset: ${materialPresetKeys.join(', ')}; got "${String(plate[face])}"`);
      continue;
    }
    const mapped = columnOfIssue(path, face !== undefined && usesPreset[face]);
    problems.add(line, mapped.column, renameKey(issue.message, mapped));
  }
  return undefined;
}

/** The issues of the object branch of a failed optics union. */
function fractionBranchIssues(issue: z.core.$ZodIssue): z.core.$ZodIssue[] | undefined {
  if (issue.code !== 'invalid_union') return undefined;
  return issue.errors.find((branch) => !(branch.length === 1 && branch[0]!.code === 'invalid_value' && branch[0]!.path.length === 0));
}

interface MappedColumn {
  column: string | undefined;
  /** The schema key the message starts with, to be replaced by the column name. */
  schemaKey: string | undefined;
}

/** The column (or columns) of a path inside one plate. */
function columnOfIssue(path: readonly PropertyKey[], facePreset: boolean): MappedColumn {
  const [key, sub] = path;
  const xyz = ['x', 'y', 'z'];
  switch (key) {
    case 'name':
      return { column: 'name', schemaKey: 'name' };
    case 'areaM2':
      return { column: 'area_m2', schemaKey: 'areaM2' };
    case 'normal':
      return typeof sub === 'number'
        ? { column: `normal_${xyz[sub]}`, schemaKey: 'normal components' }
        : { column: 'normal_x/normal_y/normal_z', schemaKey: 'normal' };
    case 'centroidM':
      return typeof sub === 'number'
        ? { column: `centroid_${xyz[sub]}_m`, schemaKey: 'centroidM components' }
        : { column: 'centroid_x_m/centroid_y_m/centroid_z_m', schemaKey: 'centroidM' };
    case 'trackingAxis':
      return typeof sub === 'number'
        ? { column: `tracking_axis_${xyz[sub]}`, schemaKey: 'trackingAxis components' }
        : { column: trackingAxisColumns.join('/'), schemaKey: 'trackingAxis' };
    case 'trackingLimitsDeg':
      return typeof sub === 'number'
        ? { column: trackingLimitColumns[sub] ?? trackingLimitColumns.join('/'), schemaKey: 'trackingLimitsDeg' }
        : { column: trackingLimitColumns.join('/'), schemaKey: 'trackingLimitsDeg' };
    case 'front':
    case 'back': {
      if (facePreset) return { column: `${key}_preset`, schemaKey: key };
      if (typeof sub === 'string') {
        const emissivity = emissivityKeys.find(([k]) => k === sub);
        return { column: `${key}_${emissivity ? emissivity[1] : sub}`, schemaKey: sub };
      }
      // A rule on the whole face: the three fractions must add up to 1.
      return { column: fractionKeys.map((k) => `${key}_${k}`).join('+'), schemaKey: undefined };
    }
    default:
      return { column: undefined, schemaKey: undefined };
  }
}

/** Says the column's name where the schema's message starts with its own key. */
function renameKey(message: string, mapped: MappedColumn): string {
  const { schemaKey, column } = mapped;
  if (schemaKey === undefined || column === undefined || !message.startsWith(`${schemaKey} `)) return message;
  return `${column}${message.slice(schemaKey.length)}`;
}
