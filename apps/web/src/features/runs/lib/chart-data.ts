import type { SeriesColumn } from '@photon-ledger/shared';
import { formatUnit, superscript } from './format-number';

/** Columns aligned on one time axis, as uPlot wants them: `[t, col1, col2, ...]`, null where a column has no point. */
export type AlignedColumns = [number[], ...Array<Array<number | null>>];

/**
 * Puts columns with their own (non-decreasing) time arrays on the union of their times. At a
 * time listed twice in one column, the later value wins. `scale` multiplies every value and `xScale` every time.
 */
export function alignColumns(columns: readonly Pick<SeriesColumn, 't' | 'values'>[], { scale = 1, xScale = 1 }: { scale?: number; xScale?: number } = {}): AlignedColumns {
  const times = new Set<number>();
  for (const column of columns) for (const t of column.t) times.add(t);
  const xs = [...times].sort((a, b) => a - b);
  const index = new Map<number, number>();
  xs.forEach((t, i) => index.set(t, i));
  const ys = columns.map((column) => {
    const out: Array<number | null> = new Array<number | null>(xs.length).fill(null);
    column.t.forEach((t, i) => {
      const at = index.get(t);
      const value = column.values[i];
      if (at !== undefined && value !== undefined && Number.isFinite(value)) out[at] = value * scale;
    });
    return out;
  });
  return [xs.map((t) => t * xScale), ...ys];
}

/** How values are shown on a chart axis: multiplied by `factor`, labelled with `unit`. */
export interface DisplayUnit {
  factor: number;
  /** Typographic unit for the axis label, e.g. `nm/s²`, `km`, `×10⁻⁴`, or '' for none. */
  label: string;
}

const prefixes: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
];

/**
 * A display unit so the axis ticks read as plain numbers: an SI prefix for SI units (`m/s^2` with
 * values near 1e-7 → `nm/s²`, factor 1e9), km for metres, a power of ten for dimensionless values.
 */
export function chooseDisplayUnit(unit: string, maxAbs: number): DisplayUnit {
  if (unit === 'm') return { factor: 1e-3, label: 'km' };
  if (unit === 'deg' || unit === 's') return { factor: 1, label: unit === 'deg' ? '°' : 's' };
  if (!(maxAbs > 0) || !Number.isFinite(maxAbs)) return { factor: 1, label: formatUnit(unit) };
  if (unit === '-' || unit === '') {
    if (maxAbs >= 0.01 && maxAbs < 1e4) return { factor: 1, label: '' };
    const exponent = Math.floor(Math.log10(maxAbs));
    return { factor: 10 ** -exponent, label: `×10${superscript(exponent)}` };
  }
  const [scale, prefix] = prefixes.find(([s]) => maxAbs >= s) ?? [1e-12, 'p'];
  // 10 ** 9 is exact where 1 / 1e-9 is not.
  return { factor: 10 ** -Math.round(Math.log10(scale)), label: `${prefix}${formatUnit(unit)}` };
}

/** Largest |value| over some columns (0 when empty). */
export function maxAbsOf(columns: readonly Pick<SeriesColumn, 'values'>[]): number {
  let max = 0;
  for (const column of columns) for (const v of column.values) if (Number.isFinite(v) && Math.abs(v) > max) max = Math.abs(v);
  return max;
}

/** Angles without the 360° jumps (each step taken the short way round), so a node near 0° reads as a line. */
export function unwrapDegrees(values: readonly number[]): number[] {
  const out: number[] = [];
  let offset = 0;
  let previous: number | undefined;
  for (const v of values) {
    if (previous !== undefined) {
      const step = v - previous;
      if (step > 180) offset -= 360;
      else if (step < -180) offset += 360;
    }
    previous = v;
    out.push(v + offset);
  }
  return out;
}
