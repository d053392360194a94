/**
 * Delta-v spent against SRP: what the orbit-control system would have to pay back, at most.
 */
import type { SampleHistory } from './sample-history';

/** Integrals of the SRP acceleration over the span (m/s). */
export interface SrpDeltaV {
  /** ∫|a_srp| dt (m/s). */
  total: number;
  /** ∫ a_srp·v̂ dt, v̂ the inertial velocity direction (m/s); > 0 speeds the vehicle up. */
  alongTrack: number;
  /** ∫ |a_srp·v̂| dt (m/s). */
  alongTrackAbs: number;
}

/**
 * Trapezoid integrals of |a_srp|, a_srp·v̂ and |a_srp·v̂| over the samples. A sample at rest
 * (|v| = 0) has no along-track direction and contributes 0 along-track.
 */
export function srpDeltaV(history: SampleHistory): SrpDeltaV {
  const { layout, samples, sampleCount } = history;
  const a = layout.srpAccelInertial;
  const v = layout.v;
  let total = 0;
  let along = 0;
  let alongAbs = 0;
  let nPrev = 0;
  let pPrev = 0;
  let tPrev = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    const ax = samples[o + a] as number;
    const ay = samples[o + a + 1] as number;
    const az = samples[o + a + 2] as number;
    const vx = samples[o + v] as number;
    const vy = samples[o + v + 1] as number;
    const vz = samples[o + v + 2] as number;
    const speed = Math.hypot(vx, vy, vz);
    const n = Math.hypot(ax, ay, az);
    const p = speed > 0 ? (ax * vx + ay * vy + az * vz) / speed : 0;
    const t = samples[o + layout.t] as number;
    if (k > 0) {
      const half = 0.5 * (t - tPrev);
      total += half * (n + nPrev);
      along += half * (p + pPrev);
      // |p| is integrated piecewise linearly, so a sign change inside a step counts both sides.
      alongAbs += p * pPrev >= 0 ? half * (Math.abs(p) + Math.abs(pPrev)) : (half * (p * p + pPrev * pPrev)) / (Math.abs(p) + Math.abs(pPrev));
    }
    nPrev = n;
    pPrev = p;
    tPrev = t;
  }
  return { total, alongTrack: along, alongTrackAbs: alongAbs };
}
