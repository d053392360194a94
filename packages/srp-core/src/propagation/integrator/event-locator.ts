/**
 * Event location on the dense output of a DOP853 step: each event is a continuous function g(t, y)
 * whose sign change over an accepted step is bracketed by the step and found by Brent's method on
 * the 7th-order interpolant (no extra integration). An event with `restart: true` cuts the step at
 * the event, so a force with a kink there (eclipse entry or exit) is never integrated across it:
 * the next step starts afresh on the other side.
 *
 * Only sign changes between step ends are seen: two crossings inside one step (g dipping and
 * coming back) are missed, so bound the step (`maxStepSeconds`) below the shortest interval
 * between two roots of any g that matters.
 */
import { SrpError } from '../../errors';
import { brentRoot, createRootBracket } from './brent-root';
import type { Dop853Stepper } from './dop853';

/** An event function checked for sign changes over every step. */
export interface StepEvent {
  /** Name reported with each occurrence (`earth-umbra-entry`). */
  name: string;
  /** Continuous function of time (s) and state; its zeros are the events. Must not keep `y`. */
  g: (t: number, y: Float64Array) => number;
  /** 1: only rising crossings (g from − to +), −1: only falling, 0 (default): both. */
  direction?: 1 | -1 | 0;
  /** true: end the step exactly at the event and restart the integrator there (a discontinuity). */
  restart?: boolean;
}

/** One located event. */
export interface LocatedEvent {
  /** The event's name. */
  name: string;
  /** Index of the event in the list given to the locator. */
  index: number;
  /** Time of the event (s): within the time tolerance of the root, on the side where g has its new sign. */
  t: number;
  /** State at `t` from the dense output (a new array). */
  y: Float64Array;
  /** 1 if g went from − to +, −1 from + to −. */
  direction: 1 | -1;
}

/** Options of the event locator. */
export interface EventLocatorOptions {
  /** Absolute tolerance on event times (s), > 0; default 1e-9 s (plus 4 rounding units of t). */
  timeToleranceSeconds?: number;
}

/** Finds events over the steps of one integrator; see `createEventLocator`. */
export interface EventLocator {
  /** Records the sign of every g at the integrator's current (t, y): call after `reset`, before stepping. */
  start(): void;
  /**
   * Call after every `step()`: locates the sign changes over [tPrev, t], in time order, and cuts the
   * step at the first `restart` event (`endStepAt`), dropping any later event of that step (it is
   * found again by the next steps). Dense output stays valid on the (shortened) step.
   * @returns the events of this step in time order (a shared empty array when none)
   */
  afterStep(): readonly LocatedEvent[];
}

const NONE: readonly LocatedEvent[] = Object.freeze([]);

/**
 * Creates an event locator for `integrator`. Allocates its buffers here; a step without events
 * allocates nothing (each located event allocates its record).
 * @throws SrpError `out_of_range` for a non-positive time tolerance
 */
export function createEventLocator(
  integrator: Dop853Stepper,
  events: readonly StepEvent[],
  options: EventLocatorOptions = {},
): EventLocator {
  const tol = options.timeToleranceSeconds ?? 1e-9;
  if (!(tol > 0) || !Number.isFinite(tol)) {
    throw new SrpError('out_of_range', `timeToleranceSeconds must be a finite number > 0 (s); got ${String(tol)}`, {
      field: 'timeToleranceSeconds',
      value: tol,
      limit: '> 0',
    });
  }
  const count = events.length;
  const n = integrator.y.length;
  /** Last non-zero sign of each g (0 while g has been exactly 0 since the start). */
  const signs = new Int8Array(count);
  /** g of each event at the start of the current step (s). */
  const gStart = new Float64Array(count);
  /** Per event found in this step: its root (new-sign side) and whether it crossed. */
  const roots = new Float64Array(count);
  const crossed = new Uint8Array(count);
  const order = new Int32Array(count);
  const yScratch = new Float64Array(n);
  const bracket = createRootBracket();
  let active = 0;
  const gOnDense = (t: number): number => events[active]!.g(t, integrator.denseAt(yScratch, t));

  function evaluate(index: number, t: number, y: Float64Array): number {
    const value = events[index]!.g(t, y);
    if (!Number.isFinite(value)) {
      const name = events[index]!.name;
      throw new SrpError('invalid_input', `event ${name} returned ${String(value)} at t = ${t} s; g must be finite`, {
        field: `events.${index}.g`,
        value,
      });
    }
    return value;
  }

  function start(): void {
    for (let i = 0; i < count; i += 1) {
      const g = evaluate(i, integrator.t, integrator.y);
      gStart[i] = g;
      signs[i] = Math.sign(g);
    }
  }

  function afterStep(): readonly LocatedEvent[] {
    const t0 = integrator.tPrev;
    const t1 = integrator.t;
    if (count === 0 || t0 === t1) return NONE;
    const forward = t1 > t0;
    let found = 0;
    for (let i = 0; i < count; i += 1) {
      crossed[i] = 0;
      const g1 = evaluate(i, t1, integrator.y);
      const s0 = signs[i]!;
      const s1 = Math.sign(g1);
      if (s0 !== 0 && s1 !== 0 && s1 !== s0) {
        const wanted = events[i]!.direction ?? 0;
        if (wanted === 0 || wanted === s1) {
          active = i;
          brentRoot(bracket, gOnDense, t0, t1, gStart[i]!, g1, tol);
          // The side where g already has its new sign: a restart there is past the kink.
          roots[i] = Math.sign(bracket.gRoot) === -s0 || bracket.gRoot === 0 ? bracket.root : bracket.other;
          crossed[i] = 1;
          order[found] = i;
          found += 1;
        }
      }
      gStart[i] = g1;
      if (s1 !== 0) signs[i] = s1;
    }
    if (found === 0) return NONE;

    // Insertion sort of the crossings by time along the direction of integration (few of them).
    for (let a = 1; a < found; a += 1) {
      const idx = order[a]!;
      let b = a - 1;
      while (b >= 0 && (forward ? roots[order[b]!]! > roots[idx]! : roots[order[b]!]! < roots[idx]!)) {
        order[b + 1] = order[b]!;
        b -= 1;
      }
      order[b + 1] = idx;
    }
    let reported = found;
    for (let a = 0; a < found; a += 1) {
      const idx = order[a]!;
      if (events[idx]!.restart === true) {
        const tCut = roots[idx]!;
        reported = a + 1;
        while (reported < found && roots[order[reported]!] === tCut) reported += 1;
        integrator.endStepAt(tCut);
        break;
      }
    }
    const result: LocatedEvent[] = [];
    for (let a = 0; a < reported; a += 1) {
      const idx = order[a]!;
      const t = roots[idx]!;
      const y = integrator.denseAt(new Float64Array(n), t);
      const oldSign = crossed[idx] === 1 ? -signs[idx]! : signs[idx]!;
      result.push({ name: events[idx]!.name, index: idx, t, y, direction: oldSign < 0 ? 1 : -1 });
    }
    if (reported < found || integrator.t !== t1) {
      // The step was cut: restart every sign from the state at the cut, where the reported events
      // have their new sign and the later ones still their old sign.
      for (let i = 0; i < count; i += 1) {
        const g = evaluate(i, integrator.t, integrator.y);
        gStart[i] = g;
        if (g !== 0) signs[i] = Math.sign(g);
        else if (crossed[i] === 1) signs[i] = isReported(i, reported) ? signs[i]! : -signs[i]!;
      }
    }
    return result;
  }

  function isReported(index: number, reported: number): boolean {
    for (let a = 0; a < reported; a += 1) if (order[a] === index) return true;
    return false;
  }

  return { start, afterStep };
}
