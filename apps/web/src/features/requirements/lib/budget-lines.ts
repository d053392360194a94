import { budgetLineKeys, budgetLineUnits, type BudgetLineKey } from '@photon-ledger/shared';

/** How each budget line is named to people. */
export const budgetLineLabels: Readonly<Record<BudgetLineKey, string>> = {
  'srp.accel.mean': 'SRP acceleration, mean',
  'srp.accel.max': 'SRP acceleration, maximum',
  'srp.accel.rms': 'SRP acceleration, RMS',
  'srp.deltaV.total': 'SRP Δv, total',
  'srp.deltaV.alongTrack': 'SRP Δv along track (signed)',
  'srp.deltaV.alongTrackAbs': 'SRP Δv along track (absolute)',
  'drift.a': 'Semi-major axis drift',
  'drift.e': 'Eccentricity drift',
  'drift.i': 'Inclination drift',
  'drift.raan': 'RAAN drift',
  'torque.mean': 'SRP torque, mean',
  'torque.max': 'SRP torque, maximum',
  'torque.rms': 'SRP torque, RMS',
  'momentum.peak': 'Peak wheel momentum',
  'momentum.dumpsPerDay': 'Momentum dumps per day',
  'momentum.timeBetweenDumps': 'Time between dumps',
  'sail.characteristicAccel': 'Sail characteristic acceleration',
  'sail.lightnessNumber': 'Sail lightness number',
  'sail.loading': 'Sail loading',
  'sail.timeToTarget': 'Time to target radius',
};

/** The budget lines in report order, in groups. */
export const budgetLineGroups: ReadonlyArray<{ title: string; lines: readonly BudgetLineKey[] }> = [
  { title: 'SRP acceleration and Δv', lines: budgetLineKeys.filter((k) => k.startsWith('srp.')) },
  { title: 'Secular drift', lines: budgetLineKeys.filter((k) => k.startsWith('drift.')) },
  { title: 'Torque and wheel momentum', lines: budgetLineKeys.filter((k) => k.startsWith('torque.') || k.startsWith('momentum.')) },
  { title: 'Solar sail', lines: budgetLineKeys.filter((k) => k.startsWith('sail.')) },
];

/** A line's unit as printed: `m/s^2` → `m/s²`, `N*m*s` → `N·m·s`, `-` → `–`. */
export function displayUnit(unit: string): string {
  if (unit === '-') return '–';
  return unit.replace(/\^2/g, '²').replace(/\*/g, '·');
}

/** The unit of a line as printed. */
export function lineUnit(line: BudgetLineKey): string {
  return displayUnit(budgetLineUnits[line]);
}

/** The comparator as a sign. */
export function comparatorSign(comparator: '<=' | '>='): string {
  return comparator === '<=' ? '≤' : '≥';
}

/** A requirement value with 4 significant figures, scientific when very small or large. */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e6) return String(Number(value.toPrecision(4)));
  const [mantissa, exponent] = value.toExponential(3).split('e');
  return `${Number(mantissa)}×10${superscript(Number(exponent))}`;
}

const superscripts: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };
function superscript(n: number): string {
  return String(n)
    .split('')
    .map((c) => superscripts[c] ?? c)
    .join('');
}
