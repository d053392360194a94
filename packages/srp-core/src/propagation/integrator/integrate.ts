/**
 * The simple driver: DOP853 from t0 to tEnd with event location. A caller that needs its own loop
 * (progress, cancellation, sampling) does the same with `createDop853` and `createEventLocator`:
 * `reset`, `start`, then `step(tEnd)` and `afterStep()` until `t === tEnd`.
 */
import { createDop853, type Derivative, type Dop853, type IntegratorOptions } from './dop853';
import { createEventLocator, type EventLocatorOptions, type StepEvent } from './event-locator';

/** Hooks and events of one `integrate` run. */
export interface IntegrateHooks extends EventLocatorOptions {
  /** Event functions located over every step; `restart` ones end the step and restart there. */
  events?: readonly StepEvent[];
  /**
   * Called after every accepted step (after any cut at a restart event), while `integrator.denseAt`
   * covers [integrator.tPrev, integrator.t]; return false to stop there.
   */
  onStep?: (integrator: Dop853) => boolean | void;
}

/** Where an `integrate` run ended and what it met. */
export interface IntegrateResult {
  /** Final time (s): tEnd, unless `onStep` stopped earlier. */
  t: number;
  /** Final state (a new array). */
  y: Float64Array;
  /** Events in time order: name, time (s), state (new arrays). */
  events: { name: string; t: number; y: Float64Array }[];
  /** Accepted and rejected steps, derivative evaluations. */
  stats: { steps: number; rejected: number; evaluations: number };
}

/**
 * Integrates dy/dt = f(t, y) from (t0, y0) to tEnd (either direction) with DOP853, locating events
 * on the dense output and stepping onto `restart` events.
 * @param f the derivative; writes into its first argument
 * @param t0 start time (s)
 * @param y0 initial state (not modified)
 * @param tEnd end time (s)
 * @throws SrpError as `createDop853` and `Dop853.step` (`not_converged`, field `step`), or an
 *   event function returning a non-finite value
 */
export function integrate(
  f: Derivative,
  t0: number,
  y0: Float64Array,
  tEnd: number,
  options: IntegratorOptions,
  hooks: IntegrateHooks = {},
): IntegrateResult {
  const integrator = createDop853(y0.length, f, options);
  integrator.reset(t0, y0);
  const locatorOptions: EventLocatorOptions = {};
  if (hooks.timeToleranceSeconds !== undefined) locatorOptions.timeToleranceSeconds = hooks.timeToleranceSeconds;
  const locator = createEventLocator(integrator, hooks.events ?? [], locatorOptions);
  locator.start();
  const events: IntegrateResult['events'] = [];
  while (integrator.t !== tEnd) {
    integrator.step(tEnd);
    for (const e of locator.afterStep()) events.push({ name: e.name, t: e.t, y: e.y });
    if (hooks.onStep?.(integrator) === false) break;
  }
  return { t: integrator.t, y: Float64Array.from(integrator.y), events, stats: { ...integrator.stats } };
}
