import { describe, expect, it } from 'vitest';
import { parseUtcEpoch } from '../time/epoch';
import { circularOrbitFiller, syntheticHistory, TEST_EARTH_MU } from './budget-test-helpers';
import { computeBudget } from './compute-budget';

const epoch = parseUtcEpoch('2026-03-20T12:00:00Z');

function history() {
  const orbit = circularOrbitFiller(7e6);
  return syntheticHistory(1441, 60, (row, l, k, t) => {
    orbit(row, l, k, t);
    row[l.srpAccelInertial + 2] = 5e-8;
    row[l.srpTorqueBody + 2] = 1e-5;
    row[l.forceAccel] = 8.13;
    row[l.forceAccel + 1] = 5e-8;
  }, ['central-body', 'srp']);
}

describe('computeBudget', () => {
  it('lists the lines in key order, holds them against the requirements and flags lines it cannot compute', () => {
    const budget = computeBudget(
      history(),
      { epoch, mu: TEST_EARTH_MU, centralBody: 'earth', massKg: 500, momentum: { wheelCapacityNms: 4, dumpThresholdFraction: 0.5 } },
      [
        { line: 'srp.deltaV.total', comparator: '<=', value: 0.01, minMarginPercent: 50 },
        { line: 'momentum.dumpsPerDay', comparator: '<=', value: 2 },
        { line: 'sail.lightnessNumber', comparator: '>=', value: 0.01 },
      ],
    );
    const byKey = Object.fromEntries(budget.lines.map((l) => [l.key, l]));
    // 5e-8 m/s² × 86 400 s = 4.32e-3 m/s against 1e-2: 56.8 % margin ≥ 50 %.
    expect(byKey['srp.deltaV.total']).toMatchObject({ status: 'pass', pass: true });
    expect(byKey['srp.deltaV.total']?.marginPercent).toBeCloseTo(56.8, 9);
    // 1e-5 N·m fills 2 N·m·s in 200 000 s: no dump in a day.
    expect(byKey['momentum.dumpsPerDay']).toMatchObject({ value: 0, status: 'pass' });
    expect(byKey['momentum.timeBetweenDumps']).toMatchObject({ value: null, status: 'no-requirement' });
    expect(byKey['momentum.timeBetweenDumps']?.note).toMatch(/no dump within the span/);
    expect(byKey['sail.lightnessNumber']).toMatchObject({ value: null, status: 'no-value', pass: false });
    expect(byKey['drift.raan']?.note).toMatch(/equatorial/);
    const order = budget.lines.map((l) => l.key);
    expect(order.indexOf('sail.lightnessNumber')).toBe(order.length - 1);
    expect(budget.perturbations[0]?.srpToMeanRatio).toBeCloseTo(5e-8 / 8.13, 20);
    expect(budget.epochUtc).toBe('2026-03-20T12:00:00.000Z');
    expect(() => JSON.stringify(budget)).not.toThrow();
  });
});
