/**
 * Budget lines: one figure each (key, label, value, unit), optionally held against a requirement
 * with a margin policy. The key set is closed and mirrored, with the same units, by
 * `budgetLineKeys` in packages/shared/src/budget.ts (a test keeps the two equal).
 */
import { SrpError } from '../errors';

/** The closed set of budget line keys, in report order. */
export const budgetLineKeys = [
  'srp.accel.mean',
  'srp.accel.max',
  'srp.accel.rms',
  'srp.deltaV.total',
  'srp.deltaV.alongTrack',
  'srp.deltaV.alongTrackAbs',
  'drift.a',
  'drift.e',
  'drift.i',
  'drift.raan',
  'torque.mean',
  'torque.max',
  'torque.rms',
  'momentum.peak',
  'momentum.dumpsPerDay',
  'momentum.timeBetweenDumps',
  'sail.characteristicAccel',
  'sail.lightnessNumber',
  'sail.loading',
  'sail.timeToTarget',
] as const;
/** One budget line key. */
export type BudgetLineKey = (typeof budgetLineKeys)[number];

/** Label and unit of each line; requirements are stated in this unit. */
export const budgetLineDefinitions: Readonly<Record<BudgetLineKey, { label: string; unit: string }>> = {
  'srp.accel.mean': { label: 'SRP acceleration, time mean of |a|', unit: 'm/s^2' },
  'srp.accel.max': { label: 'SRP acceleration, maximum |a|', unit: 'm/s^2' },
  'srp.accel.rms': { label: 'SRP acceleration, RMS of |a|', unit: 'm/s^2' },
  'srp.deltaV.total': { label: 'Delta-v from SRP, integral of |a|', unit: 'm/s' },
  'srp.deltaV.alongTrack': { label: 'Delta-v from SRP along the velocity (signed)', unit: 'm/s' },
  'srp.deltaV.alongTrackAbs': { label: 'Delta-v from SRP along the velocity (absolute)', unit: 'm/s' },
  'drift.a': { label: 'Secular drift of the semi-major axis', unit: 'm/day' },
  'drift.e': { label: 'Secular drift of the eccentricity', unit: '1/day' },
  'drift.i': { label: 'Secular drift of the inclination', unit: 'deg/day' },
  'drift.raan': { label: 'Secular drift of the right ascension of the ascending node', unit: 'deg/day' },
  'torque.mean': { label: 'SRP torque, time mean of |tau|', unit: 'N*m' },
  'torque.max': { label: 'SRP torque, maximum |tau|', unit: 'N*m' },
  'torque.rms': { label: 'SRP torque, RMS of |tau|', unit: 'N*m' },
  'momentum.peak': { label: 'Peak stored momentum |H| between dumps', unit: 'N*m*s' },
  'momentum.dumpsPerDay': { label: 'Momentum dumps per day', unit: '1/day' },
  'momentum.timeBetweenDumps': { label: 'Mean time between momentum dumps', unit: 's' },
  'sail.characteristicAccel': { label: 'Characteristic acceleration at 1 au', unit: 'm/s^2' },
  'sail.lightnessNumber': { label: 'Lightness number', unit: '-' },
  'sail.loading': { label: 'Sail loading', unit: 'kg/m^2' },
  'sail.timeToTarget': { label: 'Time to reach the target heliocentric radius', unit: 's' },
};

/** How a value must compare with a requirement. */
export type BudgetComparator = '<=' | '>=';

/** A requirement on one line, in the line's unit. */
export interface BudgetRequirement {
  /** The line it applies to. */
  line: BudgetLineKey;
  /** '<=' a ceiling, '>=' a floor. */
  comparator: BudgetComparator;
  /** The limit, in the line's unit; not 0 (the margin is a percentage of it). */
  value: number;
  /** Margin the value must keep (%), default 0. */
  minMarginPercent?: number;
}

/** Where a line stands: against its requirement, without one, or without a value to hold against it. */
export type BudgetLineStatus = 'pass' | 'fail' | 'no-requirement' | 'no-value';

/** One line of a budget. */
export interface BudgetLine {
  key: BudgetLineKey;
  label: string;
  /** The figure, in `unit`; null when there is none (target not reached, no dump in the span). */
  value: number | null;
  unit: string;
  /** Why the value is null, or what it assumes. */
  note?: string;
  /** The requirement it is held against, with the margin policy applied. */
  requirement?: { comparator: BudgetComparator; value: number; minMarginPercent: number };
  /** Margin (%): '<=' (req − value)/|req|·100, '>=' (value − req)/|req|·100; absent without both. */
  marginPercent?: number;
  /** marginPercent ≥ minMarginPercent; false when a requirement has no value to meet it. */
  pass?: boolean;
  status: BudgetLineStatus;
}

/** Relative tolerance of the pass test, so a margin exactly at the policy is not lost to rounding. */
export const MARGIN_RELATIVE_TOLERANCE = 1e-12;

/**
 * Margin (%) of a value against a requirement: '<=' (req − value)/|req|·100, '>=' (value − req)/|req|·100.
 * |req| (not req) keeps the sign meaningful for negative limits (a drift ≥ −5 m/day). Common practice.
 * @throws SrpError `invalid_input` for a non-finite value or a requirement of 0 or not finite
 */
export function marginPercent(value: number, comparator: BudgetComparator, requirement: number): number {
  if (!Number.isFinite(requirement) || requirement === 0) {
    throw new SrpError(
      'invalid_input',
      `requirement value must be a finite number other than 0 (the margin is a percentage of it); got ${requirement}`,
      { field: 'value', value: requirement, limit: '!= 0' },
    );
  }
  if (!Number.isFinite(value)) {
    throw new SrpError('invalid_input', `value must be a finite number; got ${value}`, { field: 'value', value });
  }
  const diff = comparator === '<=' ? requirement - value : value - requirement;
  return (diff * 100) / Math.abs(requirement);
}

/** A line without a requirement. */
export function budgetLine(key: BudgetLineKey, value: number | null, note?: string): BudgetLine {
  const { label, unit } = budgetLineDefinitions[key];
  const line: BudgetLine = { key, label, value, unit, status: 'no-requirement' };
  if (note !== undefined) line.note = note;
  return line;
}

/**
 * The line held against a requirement (or returned as it is when `requirement` is undefined).
 * Passes when marginPercent ≥ minMarginPercent within MARGIN_RELATIVE_TOLERANCE; a null value
 * fails (status 'no-value'), since nothing shows the requirement met.
 * @throws SrpError naming `line`, `value` or `minMarginPercent`
 */
export function applyRequirement(line: BudgetLine, requirement: BudgetRequirement | undefined): BudgetLine {
  if (requirement === undefined) return line;
  if (requirement.line !== line.key) {
    throw new SrpError('invalid_input', `requirement for '${requirement.line}' applied to line '${line.key}'`, {
      field: 'line',
      value: requirement.line,
      limit: line.key,
    });
  }
  const minMarginPercent = requirement.minMarginPercent ?? 0;
  if (!Number.isFinite(minMarginPercent)) {
    throw new SrpError('invalid_input', `minMarginPercent must be a finite number (%); got ${minMarginPercent}`, {
      field: 'minMarginPercent',
      value: minMarginPercent,
    });
  }
  const out: BudgetLine = {
    ...line,
    requirement: { comparator: requirement.comparator, value: requirement.value, minMarginPercent },
  };
  if (line.value === null) {
    // Still validate the requirement itself.
    marginPercent(0, requirement.comparator, requirement.value);
    out.pass = false;
    out.status = 'no-value';
    return out;
  }
  const margin = marginPercent(line.value, requirement.comparator, requirement.value);
  const slack = MARGIN_RELATIVE_TOLERANCE * Math.max(1, Math.abs(minMarginPercent), Math.abs(margin));
  out.marginPercent = margin;
  out.pass = margin >= minMarginPercent - slack;
  out.status = out.pass ? 'pass' : 'fail';
  return out;
}

/**
 * Holds each line against the requirement for its key (at most one per key).
 * @throws SrpError `invalid_input` naming `requirements.i.line` when a key repeats
 */
export function applyRequirements(lines: readonly BudgetLine[], requirements: readonly BudgetRequirement[] = []): BudgetLine[] {
  const byKey = new Map<BudgetLineKey, BudgetRequirement>();
  requirements.forEach((r, i) => {
    if (byKey.has(r.line)) {
      throw new SrpError('invalid_input', `requirements.${i}.line repeats '${r.line}': give one requirement per line`, {
        field: `requirements.${i}.line`,
        value: r.line,
      });
    }
    byKey.set(r.line, r);
  });
  return lines.map((line) => applyRequirement(line, byKey.get(line.key)));
}
