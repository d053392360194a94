/**
 * The Dormand–Prince 8(5,3) Runge–Kutta integrator (DOP853) with step-size control, FSAL and the
 * 7th-order dense output, stepping one accepted step per `step()` call.
 *
 * Source: Hairer, Nørsett & Wanner, Solving Ordinary Differential Equations I, 2nd ed. (1993):
 * the method and its dense output §II.5–II.6; the error norm (5th- and 3rd-order estimators
 * combined), the step-size controller and the initial step guess as in E. Hairer's dop853.f
 * (DP86CO and HINIT; "automatic step size control" §II.4), with its defaults: safety factor 0.9,
 * step ratio within [1/3, 6], no step growth right after a rejection, β = 0 (no Lund stabilisation).
 *
 * Allocation-free per step: every stage is a preallocated Float64Array and the derivative writes
 * into it. The 3 extra stages of the dense output are only evaluated when `denseAt` is first
 * called inside a step, so a caller that never samples pays 12 evaluations per step (FSAL).
 */
import { SrpError } from '../../errors';
import * as tableau from './dop853-coefficients';

// Module-local copies: V8 reads these faster than imported bindings in the stage loops
// (measured 1.3–1.5× on a whole step; bench/integrator.bench.ts).
const {
  A2_1, A3_1, A3_2, A4_1, A4_3, A5_1, A5_3, A5_4, A6_1, A6_4, A6_5, A7_1, A7_4, A7_5, A7_6, A8_1, A8_4, A8_5,
  A8_6, A8_7, A9_1, A9_4, A9_5, A9_6, A9_7, A9_8, A10_1, A10_4, A10_5, A10_6, A10_7, A10_8, A10_9, A11_1,
  A11_4, A11_5, A11_6, A11_7, A11_8, A11_9, A11_10, A12_1, A12_4, A12_5, A12_6, A12_7, A12_8, A12_9, A12_10,
  A12_11, A14_1, A14_7, A14_8, A14_9, A14_10, A14_11, A14_12, A14_13, A15_1, A15_6, A15_7, A15_8, A15_11,
  A15_12, A15_13, A15_14, A16_1, A16_6, A16_7, A16_8, A16_9, A16_13, A16_14, A16_15, C2, C3, C4, C5, C6, C7,
  C8, C9, C10, C11, C14, C15, C16, B1, B6, B7, B8, B9, B10, B11, B12, BHH1, BHH2, BHH3, ER1, ER6, ER7, ER8,
  ER9, ER10, ER11, ER12, D4_1, D4_6, D4_7, D4_8, D4_9, D4_10, D4_11, D4_12, D4_13, D4_14, D4_15, D4_16, D5_1,
  D5_6, D5_7, D5_8, D5_9, D5_10, D5_11, D5_12, D5_13, D5_14, D5_15, D5_16, D6_1, D6_6, D6_7, D6_8, D6_9, D6_10,
  D6_11, D6_12, D6_13, D6_14, D6_15, D6_16, D7_1, D7_6, D7_7, D7_8, D7_9, D7_10, D7_11, D7_12, D7_13, D7_14,
  D7_15, D7_16,
} = tableau;

/** dy/dt = f(t, y); writes into dydt, allocates nothing. t in s, y and dydt in the caller's SI units. */
export type Derivative = (dydt: Float64Array, t: number, y: Float64Array) => void;

/** Accuracy and step bounds of the integrator. */
export interface IntegratorOptions {
  /** Relative tolerance per component (-), > 10 machine epsilons (2.2e-15). */
  relTol: number;
  /** Absolute tolerance per component, in the component's unit (m for positions, m/s for velocities), > 0. */
  absTol: number;
  /** Largest step allowed (s), > 0; default: no limit but the distance to `tLimit`. */
  maxStepSeconds?: number;
  /** First step to try (s), > 0; default: Hairer's initial step guess (one extra evaluation). */
  initialStepSeconds?: number;
}

/** One DOP853 integration in progress; created by `createDop853`. */
export interface Dop853 {
  /** Current time (s) after the last accepted step. */
  readonly t: number;
  /** Current state after the last accepted step: always the same array, overwritten by each step; do not write to it. */
  readonly y: Float64Array;
  /** Start of the last accepted step (s); equals `t` right after `reset`. */
  readonly tPrev: number;
  /**
   * Dense output inside [tPrev, t]: the 7th-order interpolant of the last step.
   * @param out receives the state at `t`, length n
   * @param t time (s) in [tPrev, t]
   * @throws SrpError `out_of_range` (field `t`) outside the last step
   */
  denseAt(out: Float64Array, t: number): Float64Array;
  /**
   * Takes one adaptive step toward `tLimit` (either direction), never past it: the step that
   * would end within 1 % of a step from `tLimit` ends exactly on it. No-op when `t === tLimit`.
   * @throws SrpError `not_converged` (field `step`) when the step size underflows
   */
  step(tLimit: number): void;
  /** Restarts from (t, y) (after a discontinuity): drops FSAL, keeps the step size guess. */
  reset(t: number, y: Float64Array): void;
  /** Counters since creation: accepted steps, rejected steps, derivative evaluations. */
  readonly stats: { steps: number; rejected: number; evaluations: number };
}

/** A Dop853 that can also cut its last step short (used by the event locator). */
export interface Dop853Stepper extends Dop853 {
  /**
   * Ends the last accepted step at `t` in [tPrev, t]: the state becomes the dense output there,
   * the dense output stays valid on the shortened step, and the next step starts afresh (no FSAL),
   * as after `reset`.
   * @throws SrpError `out_of_range` (field `t`) outside the last step
   */
  endStepAt(t: number): void;
}

const EPS = Number.EPSILON;
/** Safety factor on the optimal step (dop853.f: SAFE). */
const SAFETY = 0.9;
/** Smallest ratio new step / old step (dop853.f: FAC1). */
const MIN_STEP_RATIO = 1 / 3;
/** Largest ratio new step / old step (dop853.f: FAC2). */
const MAX_STEP_RATIO = 6;
/** Exponent of the error in the step-size update: the combined estimate behaves like h⁸ (dop853.f: EXPO1, β = 0). */
const ERROR_EXPONENT = 1 / 8;
/** Order used by the initial step guess (dop853.f: IORD). */
const ORDER = 8;

/** Where the derivative at the start of the next step is: not known (evaluate it), in k1, or in k13 (FSAL). */
const START_MISSING = 0;
const START_IN_K1 = 1;
const START_IN_K13 = 2;

function requirePositiveOption(value: number, field: string, unit: string, min = 0): void {
  if (!Number.isFinite(value)) {
    throw new SrpError('invalid_input', `${field} must be a finite number (${unit}); got ${String(value)}`, {
      field,
      value,
      limit: `> ${min}`,
    });
  }
  if (!(value > min)) {
    throw new SrpError('out_of_range', `${field} must be greater than ${min} (${unit}); got ${value}`, {
      field,
      value,
      limit: `> ${min}`,
    });
  }
}

class Dop853Integrator implements Dop853Stepper {
  readonly y: Float64Array;
  readonly stats = { steps: 0, rejected: 0, evaluations: 0 };
  private tNow = 0;
  private tStart = 0;
  private readonly n: number;
  private readonly f: Derivative;
  private readonly relTol: number;
  private readonly absTol: number;
  private readonly maxStep: number;
  /** Signed step size to try next (s); 0 until the first step is chosen. */
  private h: number;
  /** Signed size of the last accepted step (s); 0 after a reset. */
  private hDone = 0;
  private rejectedLast = false;
  private start: number = START_MISSING;
  private denseReady = false;
  private readonly yOld: Float64Array;
  private readonly y1: Float64Array;
  private readonly yt: Float64Array;
  private readonly k1: Float64Array;
  private readonly k2: Float64Array;
  private readonly k3: Float64Array;
  private readonly k4: Float64Array;
  private readonly k5: Float64Array;
  private readonly k6: Float64Array;
  private readonly k7: Float64Array;
  private readonly k8: Float64Array;
  private readonly k9: Float64Array;
  private readonly k10: Float64Array;
  private readonly k11: Float64Array;
  private readonly k12: Float64Array;
  private readonly k13: Float64Array;
  private readonly k14: Float64Array;
  private readonly k15: Float64Array;
  private readonly k16: Float64Array;
  /** Dense output coefficients (dop853.f: CONT, 8 blocks of n). */
  private readonly cont: Float64Array;

  constructor(n: number, f: Derivative, options: IntegratorOptions) {
    this.n = n;
    this.f = f;
    this.relTol = options.relTol;
    this.absTol = options.absTol;
    this.maxStep = options.maxStepSeconds ?? Infinity;
    this.h = options.initialStepSeconds ?? 0;
    const buffer = () => new Float64Array(n);
    this.y = buffer();
    this.yOld = buffer();
    this.y1 = buffer();
    this.yt = buffer();
    this.k1 = buffer();
    this.k2 = buffer();
    this.k3 = buffer();
    this.k4 = buffer();
    this.k5 = buffer();
    this.k6 = buffer();
    this.k7 = buffer();
    this.k8 = buffer();
    this.k9 = buffer();
    this.k10 = buffer();
    this.k11 = buffer();
    this.k12 = buffer();
    this.k13 = buffer();
    this.k14 = buffer();
    this.k15 = buffer();
    this.k16 = buffer();
    this.cont = new Float64Array(8 * n);
  }

  get t(): number {
    return this.tNow;
  }

  get tPrev(): number {
    return this.tStart;
  }

  reset(t: number, y: Float64Array): void {
    if (!Number.isFinite(t)) {
      throw new SrpError('invalid_input', `t must be a finite number (s); got ${String(t)}`, { field: 't', value: t });
    }
    if (y.length !== this.n) {
      throw new SrpError('invalid_input', `y must have ${this.n} components; got ${y.length}`, {
        field: 'y',
        value: y.length,
        limit: this.n,
      });
    }
    for (let i = 0; i < this.n; i += 1) {
      if (!Number.isFinite(y[i])) {
        throw new SrpError('invalid_input', `y.${i} must be a finite number; got ${String(y[i])}`, {
          field: `y.${i}`,
          value: y[i],
        });
      }
      this.y[i] = y[i]!;
    }
    this.tNow = t;
    this.tStart = t;
    this.hDone = 0;
    this.start = START_MISSING;
    this.rejectedLast = false;
    this.denseReady = false;
  }

  step(tLimit: number): void {
    if (!Number.isFinite(tLimit)) {
      throw new SrpError('invalid_input', `tLimit must be a finite number (s); got ${String(tLimit)}`, {
        field: 'tLimit',
        value: tLimit,
      });
    }
    const t = this.tNow;
    const span = tLimit - t;
    if (span === 0) return;
    const dir = span > 0 ? 1 : -1;
    const n = this.n;
    const f = this.f;
    const y = this.y;
    const yt = this.yt;
    const y1 = this.y1;
    const { k1, k2, k3, k4, k5, k6, k7, k8, k9, k10, k11, k12, k13 } = this;
    const relTol = this.relTol;
    const absTol = this.absTol;
    const hMax = Math.min(this.maxStep, Math.abs(span));

    if (this.start === START_IN_K13) {
      k1.set(k13);
    } else if (this.start === START_MISSING) {
      f(k1, t, y);
      this.stats.evaluations += 1;
    }
    this.start = START_IN_K1;
    if (this.h === 0) this.h = this.initialStep(t, dir, hMax);
    let h = dir * Math.min(Math.abs(this.h), hMax);

    for (;;) {
      if (0.1 * Math.abs(h) <= Math.abs(t) * EPS || !(Math.abs(h) > 0)) {
        throw new SrpError(
          'not_converged',
          `step size underflow at t = ${t} s: step ${h} s is below the time resolution ` +
            `(relTol ${relTol}, absTol ${absTol}); the derivative may be singular or not finite there`,
          { field: 'step', value: h, limit: `> ${10 * Math.abs(t) * EPS}` },
        );
      }
      const hUnlimited = h;
      let last = false;
      if ((t + 1.01 * h - tLimit) * dir > 0) {
        h = tLimit - t;
        last = true;
      }

      for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * (A2_1 * k1[i]!);
      f(k2, t + C2 * h, yt);
      for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * (A3_1 * k1[i]! + A3_2 * k2[i]!);
      f(k3, t + C3 * h, yt);
      for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * (A4_1 * k1[i]! + A4_3 * k3[i]!);
      f(k4, t + C4 * h, yt);
      for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * (A5_1 * k1[i]! + A5_3 * k3[i]! + A5_4 * k4[i]!);
      f(k5, t + C5 * h, yt);
      for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * (A6_1 * k1[i]! + A6_4 * k4[i]! + A6_5 * k5[i]!);
      f(k6, t + C6 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A7_1 * k1[i]! + A7_4 * k4[i]! + A7_5 * k5[i]! + A7_6 * k6[i]!);
      }
      f(k7, t + C7 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A8_1 * k1[i]! + A8_4 * k4[i]! + A8_5 * k5[i]! + A8_6 * k6[i]! + A8_7 * k7[i]!);
      }
      f(k8, t + C8 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A9_1 * k1[i]! + A9_4 * k4[i]! + A9_5 * k5[i]! + A9_6 * k6[i]! + A9_7 * k7[i]! + A9_8 * k8[i]!);
      }
      f(k9, t + C9 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A10_1 * k1[i]! + A10_4 * k4[i]! + A10_5 * k5[i]! + A10_6 * k6[i]! + A10_7 * k7[i]! + A10_8 * k8[i]! +
              A10_9 * k9[i]!);
      }
      f(k10, t + C10 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A11_1 * k1[i]! + A11_4 * k4[i]! + A11_5 * k5[i]! + A11_6 * k6[i]! + A11_7 * k7[i]! + A11_8 * k8[i]! +
              A11_9 * k9[i]! + A11_10 * k10[i]!);
      }
      f(k11, t + C11 * h, yt);
      for (let i = 0; i < n; i += 1) {
        yt[i] =
          y[i]! +
          h *
            (A12_1 * k1[i]! + A12_4 * k4[i]! + A12_5 * k5[i]! + A12_6 * k6[i]! + A12_7 * k7[i]! + A12_8 * k8[i]! +
              A12_9 * k9[i]! + A12_10 * k10[i]! + A12_11 * k11[i]!);
      }
      f(k12, t + h, yt);
      this.stats.evaluations += 11;

      // 8th-order solution, and the error norm of dop853.f: both estimators, scaled per component.
      let err5 = 0;
      let err3 = 0;
      for (let i = 0; i < n; i += 1) {
        const slope =
          B1 * k1[i]! + B6 * k6[i]! + B7 * k7[i]! + B8 * k8[i]! + B9 * k9[i]! + B10 * k10[i]! + B11 * k11[i]! +
          B12 * k12[i]!;
        const yi = y[i]!;
        const y1i = yi + h * slope;
        y1[i] = y1i;
        const sk = absTol + relTol * Math.max(Math.abs(yi), Math.abs(y1i));
        const e3 = (slope - BHH1 * k1[i]! - BHH2 * k9[i]! - BHH3 * k12[i]!) / sk;
        const e5 =
          (ER1 * k1[i]! + ER6 * k6[i]! + ER7 * k7[i]! + ER8 * k8[i]! + ER9 * k9[i]! + ER10 * k10[i]! +
            ER11 * k11[i]! + ER12 * k12[i]!) /
          sk;
        err3 += e3 * e3;
        err5 += e5 * e5;
      }
      let deno = err5 + 0.01 * err3;
      if (deno <= 0) deno = 1;
      const err = (Math.abs(h) * err5) / Math.sqrt(n * deno);

      if (!Number.isFinite(err)) {
        // A non-finite derivative somewhere in the step: shrink until it is avoided or underflows.
        h *= 0.1;
        this.rejectedLast = true;
        this.stats.rejected += 1;
        continue;
      }
      const errPower = err ** ERROR_EXPONENT;
      if (err <= 1) {
        const tNew = last ? tLimit : t + h;
        for (let i = 0; i < n; i += 1) {
          this.yOld[i] = y[i]!;
          y[i] = y1[i]!;
        }
        f(k13, tNew, y);
        this.stats.evaluations += 1;
        this.stats.steps += 1;
        this.start = START_IN_K13;
        this.tStart = t;
        this.tNow = tNew;
        this.hDone = h;
        this.denseReady = false;
        const ratio = Math.min(MAX_STEP_RATIO, Math.max(MIN_STEP_RATIO, SAFETY / errPower));
        let hNew = Math.abs(h) * (this.rejectedLast ? Math.min(ratio, 1) : ratio);
        // A step cut short to land on tLimit says little about the next one: keep the longer guess.
        if (last) hNew = Math.max(hNew, Math.abs(hUnlimited));
        this.h = dir * Math.min(hNew, this.maxStep);
        this.rejectedLast = false;
        return;
      }
      h *= Math.max(MIN_STEP_RATIO, SAFETY / errPower);
      this.rejectedLast = true;
      this.stats.rejected += 1;
    }
  }

  /**
   * Hairer's initial step guess: h such that h^8 · max(‖f0‖, ‖f′‖) ≈ 0.01 in the error norm,
   * with f′ from an explicit Euler step of size h0 = 0.01 ‖y‖/‖f0‖. Source: Hairer, Nørsett &
   * Wanner (1993), §II.4 "Starting step size" and dop853.f HINIT. Uses k1 = f(t, y).
   * @returns the signed step (s)
   */
  private initialStep(t: number, dir: number, hMax: number): number {
    const { n, y, yt, k1, k2, relTol, absTol } = this;
    let dnf = 0;
    let dny = 0;
    for (let i = 0; i < n; i += 1) {
      const sk = absTol + relTol * Math.abs(y[i]!);
      dnf += (k1[i]! / sk) ** 2;
      dny += (y[i]! / sk) ** 2;
    }
    let h = dnf <= 1e-10 || dny <= 1e-10 ? 1e-6 : Math.sqrt(dny / dnf) * 0.01;
    h = dir * Math.min(h, hMax);
    for (let i = 0; i < n; i += 1) yt[i] = y[i]! + h * k1[i]!;
    this.f(k2, t + h, yt);
    this.stats.evaluations += 1;
    let der2 = 0;
    for (let i = 0; i < n; i += 1) {
      const sk = absTol + relTol * Math.abs(y[i]!);
      der2 += ((k2[i]! - k1[i]!) / sk) ** 2;
    }
    der2 = Math.sqrt(der2) / Math.abs(h);
    const der12 = Math.max(der2, Math.sqrt(dnf));
    const h1 = der12 <= 1e-15 ? Math.max(1e-6, Math.abs(h) * 1e-3) : (0.01 / der12) ** (1 / ORDER);
    return dir * Math.min(100 * Math.abs(h), h1, hMax);
  }

  /** The 3 extra stages and the coefficients of the 7th-order interpolant (dop853.f, after label 'dense output'). */
  private prepareDense(): void {
    const { n, f, yt, k1, k6, k7, k8, k9, k10, k11, k12, k13, k14, k15, k16, cont } = this;
    const y = this.yOld;
    const t = this.tStart;
    const h = this.hDone;
    for (let i = 0; i < n; i += 1) {
      yt[i] =
        y[i]! +
        h *
          (A14_1 * k1[i]! + A14_7 * k7[i]! + A14_8 * k8[i]! + A14_9 * k9[i]! + A14_10 * k10[i]! + A14_11 * k11[i]! +
            A14_12 * k12[i]! + A14_13 * k13[i]!);
    }
    f(k14, t + C14 * h, yt);
    for (let i = 0; i < n; i += 1) {
      yt[i] =
        y[i]! +
        h *
          (A15_1 * k1[i]! + A15_6 * k6[i]! + A15_7 * k7[i]! + A15_8 * k8[i]! + A15_11 * k11[i]! + A15_12 * k12[i]! +
            A15_13 * k13[i]! + A15_14 * k14[i]!);
    }
    f(k15, t + C15 * h, yt);
    for (let i = 0; i < n; i += 1) {
      yt[i] =
        y[i]! +
        h *
          (A16_1 * k1[i]! + A16_6 * k6[i]! + A16_7 * k7[i]! + A16_8 * k8[i]! + A16_9 * k9[i]! + A16_13 * k13[i]! +
            A16_14 * k14[i]! + A16_15 * k15[i]!);
    }
    f(k16, t + C16 * h, yt);
    this.stats.evaluations += 3;
    const y1 = this.y1;
    for (let i = 0; i < n; i += 1) {
      const diff = y1[i]! - y[i]!;
      const bspl = h * k1[i]! - diff;
      cont[i] = y[i]!;
      cont[n + i] = diff;
      cont[2 * n + i] = bspl;
      cont[3 * n + i] = diff - h * k13[i]! - bspl;
      cont[4 * n + i] =
        h *
        (D4_1 * k1[i]! + D4_6 * k6[i]! + D4_7 * k7[i]! + D4_8 * k8[i]! + D4_9 * k9[i]! + D4_10 * k10[i]! + D4_11 * k11[i]! +
          D4_12 * k12[i]! + D4_13 * k13[i]! + D4_14 * k14[i]! + D4_15 * k15[i]! + D4_16 * k16[i]!);
      cont[5 * n + i] =
        h *
        (D5_1 * k1[i]! + D5_6 * k6[i]! + D5_7 * k7[i]! + D5_8 * k8[i]! + D5_9 * k9[i]! + D5_10 * k10[i]! + D5_11 * k11[i]! +
          D5_12 * k12[i]! + D5_13 * k13[i]! + D5_14 * k14[i]! + D5_15 * k15[i]! + D5_16 * k16[i]!);
      cont[6 * n + i] =
        h *
        (D6_1 * k1[i]! + D6_6 * k6[i]! + D6_7 * k7[i]! + D6_8 * k8[i]! + D6_9 * k9[i]! + D6_10 * k10[i]! + D6_11 * k11[i]! +
          D6_12 * k12[i]! + D6_13 * k13[i]! + D6_14 * k14[i]! + D6_15 * k15[i]! + D6_16 * k16[i]!);
      cont[7 * n + i] =
        h *
        (D7_1 * k1[i]! + D7_6 * k6[i]! + D7_7 * k7[i]! + D7_8 * k8[i]! + D7_9 * k9[i]! + D7_10 * k10[i]! + D7_11 * k11[i]! +
          D7_12 * k12[i]! + D7_13 * k13[i]! + D7_14 * k14[i]! + D7_15 * k15[i]! + D7_16 * k16[i]!);
    }
    this.denseReady = true;
  }

  denseAt(out: Float64Array, t: number): Float64Array {
    const n = this.n;
    if (t === this.tNow) {
      for (let i = 0; i < n; i += 1) out[i] = this.y[i]!;
      return out;
    }
    this.requireInStep(t);
    if (!this.denseReady) this.prepareDense();
    const cont = this.cont;
    // dop853.f CONTD8: nested form in s and 1 − s.
    const s = (t - this.tStart) / this.hDone;
    const s1 = 1 - s;
    for (let i = 0; i < n; i += 1) {
      const par = cont[4 * n + i]! + s * (cont[5 * n + i]! + s1 * (cont[6 * n + i]! + s * cont[7 * n + i]!));
      out[i] = cont[i]! + s * (cont[n + i]! + s1 * (cont[2 * n + i]! + s * (cont[3 * n + i]! + s1 * par)));
    }
    return out;
  }

  endStepAt(t: number): void {
    if (t !== this.tNow) {
      this.requireInStep(t);
      this.denseAt(this.yt, t);
      this.y.set(this.yt);
      this.tNow = t;
    }
    this.start = START_MISSING;
    this.rejectedLast = false;
  }

  /** Throws unless t lies in the last step (a few rounding units of slack at either end). */
  private requireInStep(t: number): void {
    const lo = Math.min(this.tStart, this.tNow);
    const hi = Math.max(this.tStart, this.tNow);
    const slack = 4 * EPS * Math.max(Math.abs(lo), Math.abs(hi));
    if (!(t >= lo - slack && t <= hi + slack) || this.hDone === 0) {
      throw new SrpError(
        'out_of_range',
        `t must lie in the last step [${lo}, ${hi}] s for dense output; got ${String(t)}`,
        { field: 't', value: t, limit: `[${lo}, ${hi}]` },
      );
    }
  }
}

/**
 * Creates a DOP853 integrator for an n-component system dy/dt = f(t, y). It starts at t = 0 with
 * y = 0: call `reset(t0, y0)` before the first step. Allocates all its buffers here, nothing per step.
 * @param n number of components, integer ≥ 1
 * @param f the derivative; writes into its first argument
 * @throws SrpError `invalid_input` / `out_of_range` naming the offending option
 */
export function createDop853(n: number, f: Derivative, options: IntegratorOptions): Dop853Stepper {
  if (!Number.isInteger(n) || n < 1) {
    throw new SrpError('out_of_range', `n must be an integer ≥ 1; got ${String(n)}`, { field: 'n', value: n, limit: '>= 1' });
  }
  // dop853.f refuses rtol ≤ 10 · unit roundoff: the error estimate would be all rounding.
  requirePositiveOption(options.relTol, 'relTol', '-', 10 * EPS);
  requirePositiveOption(options.absTol, 'absTol', 'unit of y');
  if (options.maxStepSeconds !== undefined) requirePositiveOption(options.maxStepSeconds, 'maxStepSeconds', 's');
  if (options.initialStepSeconds !== undefined) {
    requirePositiveOption(options.initialStepSeconds, 'initialStepSeconds', 's');
  }
  return new Dop853Integrator(n, f, options);
}
