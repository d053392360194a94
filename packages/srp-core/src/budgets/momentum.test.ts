import { describe, expect, it } from 'vitest';
import { SrpError } from '../errors';
import { syntheticHistory } from './budget-test-helpers';
import { momentumBudget, torqueStatistics } from './momentum';

/** One day at 60 s with a constant body torque (N·m). */
function constantTorque(tau: [number, number, number], stepS = 60) {
  return syntheticHistory(Math.round(86_400 / stepS) + 1, stepS, (row, l) => {
    row.set(tau, l.srpTorqueBody);
  });
}

describe('momentum accumulated from the SRP torque', () => {
  it('a constant torque dumps every threshold·capacity/|τ| seconds, and H grows linearly between dumps', () => {
    // 0.5 × 1 N·m·s / 2e-5 N·m = 25 000 s: dumps at 25 000, 50 000, 75 000 s in one day.
    const m = momentumBudget(constantTorque([0, 0, 2e-5]), { wheelCapacityNms: 1, dumpThresholdFraction: 0.5 });
    expect(m.dumpCriterion).toBe('norm');
    expect(m.dumpTimesSeconds).toHaveLength(3);
    // Tolerance 1e-9 s: the dump instant is solved on the line H(t), exact for a constant torque.
    m.dumpTimesSeconds.forEach((t, i) => expect(Math.abs(t - 25_000 * (i + 1))).toBeLessThan(1e-9));
    expect(m.dumpsPerDay).toBeCloseTo(3, 12);
    expect(m.meanTimeBetweenDumpsSeconds).toBeCloseTo(25_000, 9);
    expect(m.peakMomentumNms).toBeCloseTo(0.5, 12);
    expect(m.finalMomentumBody[2]).toBeCloseTo(2e-5 * (86_400 - 75_000), 12);
  });

  it('dumps at the same instants with a step that does not divide the interval (several dumps per step)', () => {
    const m = momentumBudget(constantTorque([0, 0, 2e-5], 43_200), { wheelCapacityNms: 1, dumpThresholdFraction: 0.5 });
    expect(m.dumpTimesSeconds.map((t) => Math.round(t * 1e6) / 1e6)).toEqual([25_000, 50_000, 75_000]);
  });

  it("dumps on |H| by default but on the first body axis to fill with the 'axis' criterion", () => {
    // τ = (3, 4, 0)e-5: |τ| = 5e-5 reaches 0.5 N·m·s after 10 000 s; the y axis alone after 12 500 s.
    const history = constantTorque([3e-5, 4e-5, 0]);
    const byNorm = momentumBudget(history, { wheelCapacityNms: 1, dumpThresholdFraction: 0.5 });
    const byAxis = momentumBudget(history, { wheelCapacityNms: 1, dumpThresholdFraction: 0.5, dumpCriterion: 'axis' });
    expect(byNorm.meanTimeBetweenDumpsSeconds).toBeCloseTo(10_000, 6);
    expect(byAxis.meanTimeBetweenDumpsSeconds).toBeCloseTo(12_500, 6);
    expect(byAxis.dumpCriterion).toBe('axis');
    expect(byAxis.peakAxisMomentumNms[1]).toBeCloseTo(0.5, 12);
  });

  it('reports no dump and a null interval when the wheels never fill', () => {
    const m = momentumBudget(constantTorque([1e-9, 0, 0]), { wheelCapacityNms: 10, dumpThresholdFraction: 0.8 });
    expect(m).toMatchObject({ dumpsPerDay: 0, meanTimeBetweenDumpsSeconds: null, dumpTimesSeconds: [] });
  });

  it('refuses a threshold above 1 naming dumpThresholdFraction', () => {
    try {
      momentumBudget(constantTorque([0, 0, 1e-5]), { wheelCapacityNms: 1, dumpThresholdFraction: 1.2 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SrpError);
      expect((e as SrpError).details.field).toBe('dumpThresholdFraction');
    }
  });
});

describe('torque statistics', () => {
  it('a torque alternating ±τ on x each sample has a zero mean on x but |τ| everywhere', () => {
    const h = syntheticHistory(101, 10, (row, l, k) => {
      row[l.srpTorqueBody] = k % 2 === 0 ? 1e-5 : -1e-5;
      row[l.srpTorqueBody + 2] = 2e-5;
    });
    const s = torqueStatistics(h);
    expect(s.axes[0].mean).toBeCloseTo(0, 20);
    expect(s.axes[0].max).toBe(1e-5);
    expect(s.axes[2].rms).toBeCloseTo(2e-5, 18);
    expect(s.magnitude.max).toBeCloseTo(Math.hypot(1e-5, 2e-5), 18);
  });
});
