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
  const sampleTime = (k: number) => (k <= whole ? Math.min(k * dt, span) : span);

  const integrator = createDop853(6, createDynamics(req.forces), req.integrator);
  integrator.reset(0, req.state0);
  const locator = createEventLocator(integrator, req.events ?? []);
  locator.start();

  const y = new Float64Array(6);
  const accel: Vec3 = [0, 0, 0];
  const detail = createSrpDetail();
  const nForces = req.forces.length;
  const srpIndex = req.srp ? req.forces.indexOf(req.srp) : -1;
  // Force magnitudes at the start and end of the current step (interpolated for the rows inside it).
  let magStart = new Float64Array(nForces);
  let magEnd = new Float64Array(nForces);
  let stepStart = 0;
  let stepSpan = 0;
  const fill = (k: number, t: number, state: Float64Array) => {
    const o = k * stride;
    samples[o] = t;
    for (let i = 0; i < 6; i += 1) samples[o + 1 + i] = state[i]!;
    if (req.srp) {
      req.srp.detail(detail, t, state);
      const ai = detail.accelInertial;
      const ab = detail.accelBody;
      const tb = detail.torqueBody;
      const oa = o + layout.srpAccelInertial;
      const ob = o + layout.srpAccelBody;
      const ot = o + layout.srpTorqueBody;
      samples[oa] = ai[0];
      samples[oa + 1] = ai[1];
      samples[oa + 2] = ai[2];
      samples[ob] = ab[0];
      samples[ob + 1] = ab[1];
      samples[ob + 2] = ab[2];
      samples[ot] = tb[0];
      samples[ot + 1] = tb[1];
      samples[ot + 2] = tb[2];
      samples[o + layout.illuminatedFraction] = detail.illuminatedFraction;
      samples[o + layout.sunDistanceM] = detail.sunDistanceM;
    } else {
      samples[o + layout.illuminatedFraction] = 1;
    }
    // Force magnitudes: SRP exactly (from the detail above); the others interpolated linearly in
    // time between the integrator's step points (see `stepMagnitudes`), which costs nothing per row.
    const w = stepSpan > 0 ? (t - stepStart) / stepSpan : 1;
    for (let i = 0; i < nForces; i += 1) {
      if (i === srpIndex) {
        const a = detail.accelInertial;
        samples[o + layout.forceAccel + i] = Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
      } else {
        samples[o + layout.forceAccel + i] = magStart[i]! + w * (magEnd[i]! - magStart[i]!);
      }
    }
  };

  /** Each force's acceleration magnitude (m/s²) at a step point, into `into`. */
  const stepMagnitudes = (into: Float64Array, t: number, state: Float64Array) => {
    for (let i = 0; i < nForces; i += 1) {
      if (i === srpIndex) continue;
      req.forces[i]!.acceleration(accel, t, state);
      into[i] = Math.sqrt(accel[0] * accel[0] + accel[1] * accel[1] + accel[2] * accel[2]);
    }
  };

  stepMagnitudes(magStart, 0, req.state0);
  magEnd.set(magStart);
  fill(0, 0, req.state0);
  let next = 1;
  let lastPercent = 0;
  let cancelled = false;
  const events: PropagationResult['events'] = [];
  while (integrator.t < span) {
    if (req.isCancelled?.()) {
      cancelled = true;
      break;
    }
    integrator.step(span);
    for (const e of locator.afterStep()) events.push({ name: e.name, tSeconds: e.t });
    stepStart = integrator.tPrev;
    stepSpan = integrator.t - integrator.tPrev;
    stepMagnitudes(magEnd, integrator.t, integrator.y);
    while (next < rows && sampleTime(next) <= integrator.t) {
      const t = sampleTime(next);
      integrator.denseAt(y, t);
      fill(next, t, y);
      next += 1;
    }
    const swap = magStart;
    magStart = magEnd;
    magEnd = swap;
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
