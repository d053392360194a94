import { describe, expect, it } from 'vitest';
import { circularOrbitFiller, syntheticHistory } from './budget-test-helpers';
import { perturbationTable, srpAccelerationStatistics } from './srp-acceleration';
import { srpDeltaV } from './srp-delta-v';

const R = 7_000_000; // m
const A_SRP = 1e-7; // m/s²
const STEP = 30; // s
const COUNT = 2881; // one day at 30 s

/** A circular orbit with a constant SRP acceleration along +v (or −v after `flipAt` s). */
function alongTrackHistory(flipAtS = Infinity) {
  const orbit = circularOrbitFiller(R);
  return syntheticHistory(
    COUNT,
    STEP,
    (row, l, k, t) => {
      orbit(row, l, k, t);
      const speed = Math.hypot(row[l.v] as number, row[l.v + 1] as number);
      const s = t < flipAtS ? 1 : -1;
      row[l.srpAccelInertial] = (s * A_SRP * (row[l.v] as number)) / speed;
      row[l.srpAccelInertial + 1] = (s * A_SRP * (row[l.v + 1] as number)) / speed;
      row[l.forceAccel] = 8.1; // central body, about μ/R²
      row[l.forceAccel + 1] = A_SRP;
      row[l.forceAccel + 2] = 0; // a force switched on but zero
    },
    ['central-body', 'srp', 'drag'],
  );
}

describe('delta-v spent against SRP', () => {
  it('a constant along-track SRP acceleration spends a·T, all of it along-track', () => {
    const dv = srpDeltaV(alongTrackHistory());
    const expected = A_SRP * (COUNT - 1) * STEP;
    // Tolerance 1e-12 relative: the trapezoid is exact for a constant; only rounding remains.
    expect(dv.total).toBeCloseTo(expected, 15);
    expect(Math.abs(dv.total / expected - 1)).toBeLessThan(1e-12);
    expect(Math.abs(dv.alongTrack / expected - 1)).toBeLessThan(1e-12);
    expect(Math.abs(dv.alongTrackAbs / expected - 1)).toBeLessThan(1e-12);
  });

  it('reversing the push 15 s after mid-span leaves a·30 s along-track, signed, and a·T absolute less the flip step', () => {
    // True values: signed a·(2·43 215 − 86 400) = a·30 s; absolute a·86 400 s. The flip falls
    // mid-step (between 43 200 and 43 230 s): the trapezoid sees a linear change from +a to −a,
    // which still integrates to a·30 s signed, and |a·v̂| as two triangles, losing a·15 s.
    const dv = srpDeltaV(alongTrackHistory(43_215));
    const T = (COUNT - 1) * STEP;
    expect(Math.abs(dv.alongTrack / (A_SRP * 30) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(dv.alongTrackAbs / (A_SRP * (T - 15)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(dv.total / (A_SRP * T) - 1)).toBeLessThan(1e-12);
  });
});

describe('SRP acceleration statistics and the perturbation table', () => {
  it('a constant |a_srp| has mean = max = RMS = a', () => {
    const s = srpAccelerationStatistics(alongTrackHistory());
    for (const v of [s.mean, s.max, s.rms]) expect(Math.abs(v / A_SRP - 1)).toBeLessThan(1e-12);
  });

  it('a ramp 0..A has mean A/2 and RMS A/√3', () => {
    const A = 2e-6;
    const n = 10_001;
    const h = syntheticHistory(n, 1, (row, l, k) => {
      row[l.srpAccelInertial + 2] = (A * k) / (n - 1);
    });
    const s = srpAccelerationStatistics(h);
    expect(s.max).toBe(A);
    expect(Math.abs(s.mean / (A / 2) - 1)).toBeLessThan(1e-12);
    // Trapezoid of x² on a linear x overestimates ∫x² by (Δt²/6)·A²/T² relative: 1e-8/6 × 3 here.
    expect(Math.abs(s.rms / (A / Math.sqrt(3)) - 1)).toBeLessThan(1e-8);
  });

  it('lists every force with SRP ratio to it; a zero force gets a null ratio', () => {
    const h = alongTrackHistory();
    const rows = perturbationTable(h, srpAccelerationStatistics(h));
    expect(rows.map((r) => r.force)).toEqual(['central-body', 'srp', 'drag']);
    expect(rows[0]?.srpToMeanRatio).toBeCloseTo(A_SRP / 8.1, 20);
    expect(rows[1]?.srpToMaxRatio).toBeCloseTo(1, 12);
    expect(rows[2]).toMatchObject({ meanAccel: 0, maxAccel: 0, srpToMeanRatio: null, srpToMaxRatio: null });
  });
});
