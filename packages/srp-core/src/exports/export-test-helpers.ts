/** A small realistic history for the export tests: a LEO with SRP columns filled. */
import { circularOrbitFiller, syntheticHistory } from '../budgets/budget-test-helpers';
import type { SampleHistory } from '../propagation/sample-layout';

/** `count` samples every `stepS` s of a 7000 km circular orbit with made-up SRP columns. */
export function leoHistory(count: number, stepS: number): SampleHistory {
  const orbit = circularOrbitFiller(7_000_000);
  return syntheticHistory(
    count,
    stepS,
    (row, l, k, t) => {
      orbit(row, l, k, t);
      row[l.r + 2] = 1234.56789;
      row[l.srpAccelInertial] = -4.56789012345e-8 * Math.cos(t / 1000);
      row[l.srpAccelInertial + 1] = 1.2e-9;
      row[l.srpAccelBody + 2] = -4.6e-8;
      row[l.srpTorqueBody] = 3.3e-6 * Math.sin(t / 777);
      row[l.illuminatedFraction] = k % 7 === 0 ? 0.25 : 1;
      row[l.sunDistanceM] = 1.496e11 + 1000.25 * k;
    },
    ['central-body', 'srp'],
  );
}
