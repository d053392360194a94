/**
 * DOP853 throughput on the two-body problem (one core): 100 revolutions of a LEO-like and an
 * eccentric (e = 0.7) orbit at relTol 1e-10 and 1e-13 (absTol 1e-12, so relTol governs), printed as
 * accepted steps per second and derivative evaluations per second, beside the cost of the bare
 * derivative, so the integrator's own overhead shows. Also: the same run sampling the dense output
 * every 60 s, and with a restart event at each x = 0 crossing. Best of 15 runs after a warm-up.
 * Figures only; nothing is asserted.
 */
import { EARTH_GM } from '../src/bodies/body-constants';
import { orbitalPeriod } from '../src/propagation/kepler';
import { createDop853, type IntegratorOptions } from '../src/propagation/integrator/dop853';
import { createEventLocator } from '../src/propagation/integrator/event-locator';
import { periapsisState, twoBody } from '../src/propagation/integrator/test-helpers';
import { measure } from './measure';

const MU = EARTH_GM;
const f = twoBody(MU);
const orbits = [
  { label: 'LEO e=0.001', a: 6_778_000, e: 0.001 },
  { label: 'HEO e=0.7', a: 26_600_000, e: 0.7 },
];

// The derivative alone, for scale.
const dydt = new Float64Array(6);
const yProbe = periapsisState(MU, 6_778_000, 0.001, 0.9);
const derivativeRate = measure('two-body derivative alone', 1, () => f(dydt, 0, yProbe));

interface Run {
  wallMs: number;
  steps: number;
  rejected: number;
  evaluations: number;
}

function run(a: number, e: number, options: IntegratorOptions, sampleEvery: number, withEvent: boolean): Run {
  const dop = createDop853(6, f, options);
  const tEnd = 100 * orbitalPeriod(a, MU);
  dop.reset(0, periapsisState(MU, a, e, 0.9));
  const locator = createEventLocator(dop, withEvent ? [{ name: 'x-zero', g: (_t, y) => y[0]!, restart: true }] : []);
  locator.start();
  const out = new Float64Array(6);
  let nextSample = 0;
  const start = performance.now();
  while (dop.t < tEnd) {
    dop.step(tEnd);
    locator.afterStep();
    if (sampleEvery > 0) {
      for (; nextSample <= dop.t; nextSample += sampleEvery) dop.denseAt(out, nextSample);
    }
  }
  return { wallMs: performance.now() - start, ...dop.stats };
}

function best(a: number, e: number, options: IntegratorOptions, sampleEvery: number, withEvent: boolean): Run {
  run(a, e, options, sampleEvery, withEvent); // warm-up
  let fastest = run(a, e, options, sampleEvery, withEvent);
  for (let k = 0; k < 14; k += 1) {
    const r = run(a, e, options, sampleEvery, withEvent);
    if (r.wallMs < fastest.wallMs) fastest = r;
  }
  return fastest;
}

for (const orbit of orbits) {
  for (const relTol of [1e-10, 1e-13]) {
    const options = { relTol, absTol: 1e-12 };
    for (const [variant, sampleEvery, withEvent] of [
      ['plain', 0, false],
      ['dense every 60 s', 60, false],
      ['x=0 restart event', 0, true],
    ] as const) {
      const r = best(orbit.a, orbit.e, options, sampleEvery, withEvent);
      const stepsPerS = r.steps / (r.wallMs / 1000);
      const evalsPerS = r.evaluations / (r.wallMs / 1000);
      const derivativeShare = (r.evaluations / derivativeRate / (r.wallMs / 1000)) * 100;
      console.log(
        `${orbit.label}, relTol ${relTol}, ${variant}: 100 revs in ${r.wallMs.toFixed(1)} ms, ` +
          `${r.steps} steps (${r.rejected} rejected), ${r.evaluations} evaluations; ` +
          `${(stepsPerS / 1e3).toFixed(1)} k steps/s, ${(evalsPerS / 1e6).toFixed(2)} M evaluations/s ` +
          `(derivative ${derivativeShare.toFixed(0)} % of the time, best of 15)`,
      );
    }
  }
}
