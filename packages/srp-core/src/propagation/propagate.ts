import { SrpError } from '../errors';
import type { Epoch } from '../time/epoch';
import type { Vec3 } from '../math/vec3';
import { createDop853, type IntegratorOptions } from './integrator/dop853';
import { createEventLocator, type StepEvent } from './integrator/event-locator';
import { createDynamics } from './forces/dynamics';
import type { ForceModel } from './forces/force-model';
import { createSrpDetail, type SrpForce } from './forces/srp-force';
import { createSampleLayout, type SampleLayout } from './sample-layout';

/** Everything one propagation needs, in SI, built by the caller (see io/scenario-adapter.ts). */
export interface PropagationRequest {
  /** The scenario epoch; times count from it (s). */
  epoch: Epoch;
  /** Centre of the inertial frame (EQJ axes). */
  centralBody: 'earth' | 'sun';
  /** Gravitational parameter of the central body (m³/s²), for the element histories of budgets. */
  mu: number;
  /** Initial state [x, y, z, vx, vy, vz] (m, m/s), EQJ, at the epoch. */
  state0: Float64Array;
  /** Length of the run (s), > 0. */
  spanSeconds: number;
  /** Sample spacing (s), > 0; samples at k·outputStepSeconds and at the span's end. */
  outputStepSeconds: number;
  /** The forces, summed; their names label the sample columns. */
  forces: readonly ForceModel[];
  /** The SRP force among `forces` (for the SRP columns), or null when SRP is off. */
  srp: SrpForce | null;
  /** Events located on the dense output (eclipse edges with restart: true, node crossings...). */
  events?: readonly StepEvent[];
  /** Integrator tolerances and step bounds. */
  integrator: IntegratorOptions;
  /** Called with the fraction done (0..1), at most once per percent. */
  onProgress?: (fractionDone: number) => void;
  /** Polled between steps; true stops the run (the result says `cancelled`). */
  isCancelled?: () => boolean;
}

/** The samples, the events met and the cost of a run. */
export interface PropagationResult {
  layout: SampleLayout;
  /** Packed rows, `layout.stride` numbers each. */
  samples: Float64Array;
  /** Rows filled (fewer than allocated when cancelled). */
  sampleCount: number;
  /** Located events in time order. */
  events: { name: string; tSeconds: number }[];
  stats: { steps: number; rejected: number; evaluations: number; wallMs: number; cancelled: boolean };
}

/**
 * Cowell's method: integrates the sum of the forces with DOP853 (adaptive, with dense output), locating
 * events on the dense output and stepping onto the `restart` ones (eclipse edges), and fills a
 * sample row at every output time from the dense output, so the output step never changes the
 * trajectory. Sample rows also record the SRP detail (evaluated at the row) and each force's
 * acceleration magnitude: SRP's exact; the others evaluated at the integrator's step points and
 * interpolated linearly in time between them (they are smooth within a step: eclipse edges, where
 * SRP has its kinks, are step points), which keeps a 60 s output of a long run cheap.
 * @throws SrpError `out_of_range` for a bad span or step, and as the integrator and forces do
 */
export function propagate(req: PropagationRequest): PropagationResult {
  const started = performance.now();
  const span = req.spanSeconds;
  const dt = req.outputStepSeconds;
  if (!(span > 0) || !Number.isFinite(span)) {
    throw new SrpError('out_of_range', `spanSeconds must be a finite number > 0 (s); got ${span}`, { field: 'spanSeconds', value: span, limit: '> 0' });
  }
  if (!(dt > 0) || !Number.isFinite(dt)) {
    throw new SrpError('out_of_range', `outputStepSeconds must be a finite number > 0 (s); got ${dt}`, { field: 'outputStepSeconds', value: dt, limit: '> 0' });
  }
  const layout = createSampleLayout(req.forces.map((f) => f.name));
  const stride = layout.stride;
  // k·dt for k = 0..whole, plus the span's end when it is not on the grid (within 1 µs).
  const whole = Math.floor(span / dt + 1e-9);
  const onGrid = Math.abs(whole * dt - span) < 1e-6;
  const rows = whole + 1 + (onGrid ? 0 : 1);
  const samples = new Float64Array(rows * stride);

  const integrator = createDop853(6, createDynamics(req.forces), req.integrator);
  integrator.reset(0, req.state0);
  const locator = createEventLocator(integrator, req.events ?? []);
  locator.start();

  // The row loop below is written out in full, without helper closures: it runs once per output
  // row (43 201 times for 30 days at 60 s), and calls V8 does not inline box their double arguments.
  const y = new Float64Array(6);
  const accel: Vec3 = [0, 0, 0];
  const detail = createSrpDetail();
  const srp = req.srp;
  const forces = req.forces;
  const nForces = forces.length;
  const srpIndex = srp ? forces.indexOf(srp) : -1;
  const oForces = layout.forceAccel;
  const oSrpI = layout.srpAccelInertial;
  const oSrpB = layout.srpAccelBody;
  const oSrpT = layout.srpTorqueBody;
  const oNu = layout.illuminatedFraction;
  const oSun = layout.sunDistanceM;
  // Force magnitudes (m/s²) at the start (first half) and end (second half) of the current step;
  // the rows inside the step interpolate linearly between them.
  const mags = new Float64Array(2 * nForces);
  let stepStart = 0;
  let stepSpan = 0;
  for (let i = 0; i < nForces; i += 1) {
    if (i === srpIndex) continue;
    forces[i]!.acceleration(accel, 0, req.state0);
    mags[i] = mags[nForces + i] = Math.sqrt(accel[0] * accel[0] + accel[1] * accel[1] + accel[2] * accel[2]);
  }

  let next = 0;
  let lastPercent = 0;
  let cancelled = false;
  const events: PropagationResult['events'] = [];
  for (;;) {
    // Rows up to the integrator's current time, from the dense output of the last step.
    const tNow = integrator.t;
    while (next < rows) {
      const t = next <= whole ? Math.min(next * dt, span) : span;
      if (t > tNow) break;
      if (next === 0) y.set(req.state0);
      else integrator.denseAt(y, t);
      const o = next * stride;
      samples[o] = t;
      samples[o + 1] = y[0]!;
      samples[o + 2] = y[1]!;
      samples[o + 3] = y[2]!;
      samples[o + 4] = y[3]!;
      samples[o + 5] = y[4]!;
      samples[o + 6] = y[5]!;
      if (srp) {
        srp.detail(detail, t, y);
        const ai = detail.accelInertial;
        const ab = detail.accelBody;
        const tb = detail.torqueBody;
        samples[o + oSrpI] = ai[0];
        samples[o + oSrpI + 1] = ai[1];
        samples[o + oSrpI + 2] = ai[2];
        samples[o + oSrpB] = ab[0];
        samples[o + oSrpB + 1] = ab[1];
        samples[o + oSrpB + 2] = ab[2];
        samples[o + oSrpT] = tb[0];
        samples[o + oSrpT + 1] = tb[1];
        samples[o + oSrpT + 2] = tb[2];
        samples[o + oNu] = detail.illuminatedFraction;
        samples[o + oSun] = detail.sunDistanceM;
      } else {
        samples[o + oNu] = 1;
      }
      // Force magnitudes: SRP's from the detail just computed; the others interpolated.
      const w = stepSpan > 0 ? (t - stepStart) / stepSpan : 1;
      for (let i = 0; i < nForces; i += 1) {
        if (i === srpIndex) {
          const a = detail.accelInertial;
          samples[o + oForces + i] = Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
        } else {
          samples[o + oForces + i] = mags[i]! + w * (mags[nForces + i]! - mags[i]!);
        }
      }
      next += 1;
    }
    if (tNow >= span) break;
    if (req.isCancelled?.()) {
      cancelled = true;
      break;
    }
    // The end of the last step becomes the start of the next.
    for (let i = 0; i < nForces; i += 1) mags[i] = mags[nForces + i]!;
    integrator.step(span);
    for (const e of locator.afterStep()) events.push({ name: e.name, tSeconds: e.t });
    stepStart = integrator.tPrev;
    stepSpan = integrator.t - integrator.tPrev;
    for (let i = 0; i < nForces; i += 1) {
      if (i === srpIndex) continue;
      forces[i]!.acceleration(accel, integrator.t, integrator.y);
      mags[nForces + i] = Math.sqrt(accel[0] * accel[0] + accel[1] * accel[1] + accel[2] * accel[2]);
    }
    if (req.onProgress) {
      const percent = Math.floor((100 * integrator.t) / span);
      if (percent > lastPercent) {
        lastPercent = percent;
        req.onProgress(integrator.t / span);
      }
    }
  }
  const { steps, rejected, evaluations } = integrator.stats;
  return {
    layout,
    samples,
    sampleCount: next,
    events,
    stats: { steps, rejected, evaluations, wallMs: performance.now() - started, cancelled },
  };
}
