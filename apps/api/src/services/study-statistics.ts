/**
 * Statistics over a study's cases, pure: mean, sample standard deviation, percentiles (linear
 * interpolation between closest ranks, Hyndman–Fan type 7), the non-dominated cases of two lines
 * and the best case of one.
 */
import { budgetLineUnits, type BudgetLineKey } from '@photon-ledger/shared';

/** The statistics of one line. */
export interface LineStatistics {
  line: BudgetLineKey;
  unit: string;
  count: number;
  mean: number | null;
  sd: number | null;
  standardError: number | null;
  min: number | null;
  max: number | null;
  p95: number | null;
  p99: number | null;
}

/** Percentile p (0..1) of ascending `sorted`: value at rank 1 + p(n − 1), interpolated linearly. */
export function percentile(sorted: readonly number[], p: number): number {
  const n = sorted.length;
  if (n === 0) throw new Error('percentile of no values');
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!);
}

/** Statistics of one line over `values` (nulls and non-finite values are left out). */
export function lineStatistics(line: BudgetLineKey, values: readonly (number | null | undefined)[]): LineStatistics {
  const xs = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v)).sort((a, b) => a - b);
  const n = xs.length;
  const unit = budgetLineUnits[line];
  if (n === 0) return { line, unit, count: 0, mean: null, sd: null, standardError: null, min: null, max: null, p95: null, p99: null };
  const mean = xs.reduce((s, x) => s + x, 0) / n;
  // Two-pass variance: no cancellation for values far from zero.
  const sd = n > 1 ? Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1)) : null;
  return {
    line,
    unit,
    count: n,
    mean,
    sd,
    standardError: sd === null ? null : sd / Math.sqrt(n),
    min: xs[0]!,
    max: xs[n - 1]!,
    p95: percentile(xs, 0.95),
    p99: percentile(xs, 0.99),
  };
}

/** A point of two lines, oriented so that smaller is better on both. */
interface Oriented<T> {
  item: T;
  a: number;
  b: number;
}

/**
 * The non-dominated items for two objectives: no other item is at least as good on both and
 * strictly better on one. O(n log n): sort by the first objective, sweep the second.
 */
export function paretoFront<T>(items: readonly T[], x: (item: T) => number | null, xDir: 'min' | 'max', y: (item: T) => number | null, yDir: 'min' | 'max'): T[] {
  const points: Oriented<T>[] = [];
  for (const item of items) {
    const vx = x(item);
    const vy = y(item);
    if (vx === null || vy === null || !Number.isFinite(vx) || !Number.isFinite(vy)) continue;
    points.push({ item, a: xDir === 'min' ? vx : -vx, b: yDir === 'min' ? vy : -vy });
  }
  points.sort((p, q) => p.a - q.a || p.b - q.b);
  const front: T[] = [];
  let bestB = Infinity;
  let lastKept: Oriented<T> | null = null;
  for (const p of points) {
    if (p.b < bestB) {
      front.push(p.item);
      bestB = p.b;
      lastKept = p;
    } else if (lastKept && p.a === lastKept.a && p.b === lastKept.b) {
      // An exact tie with a front point is not dominated either.
      front.push(p.item);
    }
  }
  return front;
}
