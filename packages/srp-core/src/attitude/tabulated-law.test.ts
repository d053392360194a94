import { describe, expect, it } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import { attitudeAt, createAttitudeLaw } from './attitude-law';
import { createQuat } from './quaternion';
import type { ReadonlyQuat } from './quaternion';
import { createTabulatedLaw, tabulatedAttitude } from './tabulated-law';
import { bodyToInertial } from './attitude-test-helpers';

/** Rodrigues' formula: v rotated by angle θ about unit axis k (source: textbook formula, from memory). */
function rodrigues(v: ReadonlyVec3, k: ReadonlyVec3, theta: number): [number, number, number] {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  const kv = k[0] * v[0] + k[1] * v[1] + k[2] * v[2];
  const kxv = [k[1] * v[2] - k[2] * v[1], k[2] * v[0] - k[0] * v[2], k[0] * v[1] - k[1] * v[0]];
  return [0, 1, 2].map((i) => v[i]! * c + kxv[i]! * s + k[i]! * kv * (1 - c)) as [number, number, number];
}

/** Rotation angle (rad) between two attitudes, sign-independent: 2 acos|a · b|, via atan2 for accuracy. */
function angleBetween(a: ReadonlyQuat, b: ReadonlyQuat): number {
  const d = Math.abs(a[0] * b[0] + a[1] * b[1] + a[2] * b[2] + a[3] * b[3]);
  return 2 * Math.atan2(Math.sqrt(Math.max(0, 1 - d * d)), d);
}

const AXIS: ReadonlyVec3 = [2 / 7, -3 / 7, 6 / 7]; // a unit axis with exact rational components
const THETA = (100 * Math.PI) / 180;
const END: ReadonlyQuat = [Math.cos(THETA / 2), AXIS[0] * Math.sin(THETA / 2), AXIS[1] * Math.sin(THETA / 2), AXIS[2] * Math.sin(THETA / 2)];

function twoRowLaw(outside?: 'refuse' | 'clamp') {
  return createTabulatedLaw({ profile: { timesS: [0, 600], quaternions: [1, 0, 0, 0, ...END] }, outside });
}

// Slerp and the rotation formulas are a few dozen double-precision operations on unit values:
// 1e-12 leaves margin, yet any wrong half-angle or axis shows at ~1e-2.
const TOL = 1e-12;

describe('tabulated attitude law', () => {
  it('the slerp midpoint of identity → 100° turn is the analytic 50° turn about the same axis', () => {
    const q = tabulatedAttitude(createQuat(), twoRowLaw(), 300);
    // source: half-angle form of a rotation quaternion: (cos(θ/4), sin(θ/4) k) for angle θ/2.
    const expected = [Math.cos(THETA / 4), ...AXIS.map((c) => c * Math.sin(THETA / 4))];
    q.forEach((c, i) => expect(Math.abs(c - expected[i]!)).toBeLessThan(TOL));
    // And the body axes match Rodrigues' rotation by θ/2.
    for (const e of [[1, 0, 0], [0, 1, 0], [0, 0, 1]] as ReadonlyVec3[]) {
      const got = bodyToInertial(q, e);
      const want = rodrigues(e, AXIS, THETA / 2);
      got.forEach((c, i) => expect(Math.abs(c - want[i]!)).toBeLessThan(TOL));
    }
  });

  it('between two rows the rotation angle grows linearly with time (constant rate)', () => {
    const law = twoRowLaw();
    const q0 = createQuat();
    for (const fraction of [0.1, 0.25, 0.7, 0.99]) {
      const q = tabulatedAttitude(createQuat(), law, 600 * fraction);
      expect(Math.abs(angleBetween(q, q0) - fraction * THETA)).toBeLessThan(TOL);
      expect(Math.abs(angleBetween(q, END) - (1 - fraction) * THETA)).toBeLessThan(TOL);
    }
  });

  it('at a row time the law returns that row', () => {
    const law = createTabulatedLaw({
      profile: { timesS: [0, 10, 25], quaternions: [1, 0, 0, 0, ...END, 0, 1, 0, 0] },
    });
    const q = attitudeAt(createQuat(), law, 10, [0, 0, 0], [0, 0, 0], [0, 0, 0]);
    q.forEach((c, i) => expect(Math.abs(c - END[i]!)).toBeLessThan(1e-15));
  });

  it('a table whose rows flip sign (q and -q) gives a unit, continuous quaternion with no jump', () => {
    // A 3° per row turn about AXIS, every other row stored with the opposite sign.
    const n = 40;
    const timesS: number[] = [];
    const quaternions: number[] = [];
    for (let i = 0; i < n; i += 1) {
      const half = ((3 * Math.PI) / 180) * i * 0.5;
      const sign = i % 2 === 0 ? 1 : -1;
      timesS.push(60 * i);
      quaternions.push(sign * Math.cos(half), ...AXIS.map((c) => sign * c * Math.sin(half)));
    }
    const law = createTabulatedLaw({ profile: { timesS, quaternions } });
    let previous = tabulatedAttitude(createQuat(), law, 0);
    let worstJump = 0;
    let worstNorm = 0;
    for (let t = 0.5; t <= 60 * (n - 1); t += 0.5) {
      const q = tabulatedAttitude(createQuat(), law, t);
      worstNorm = Math.max(worstNorm, Math.abs(Math.hypot(...q) - 1));
      // Continuity in the components themselves (not just the attitude): no q → -q switch.
      worstJump = Math.max(worstJump, Math.hypot(q[0] - previous[0], q[1] - previous[1], q[2] - previous[2], q[3] - previous[3]));
      previous = q;
    }
    // 0.5 s at 3°/60 s is 0.025° of rotation, i.e. |Δq| = 2 sin(0.0125°) ≈ 4.4e-4 at most.
    expect(worstJump).toBeLessThan(5e-4);
    expect(worstNorm).toBeLessThan(TOL);
  });

  it('the cursor (monotone time) and binary search (random order) give the same attitudes', () => {
    const timesS = Array.from({ length: 200 }, (_, i) => i * 30 + (i % 3));
    const quaternions = timesS.flatMap((_, i) => {
      const half = 0.01 * i;
      return [Math.cos(half), ...AXIS.map((c) => c * Math.sin(half))];
    });
    const monotone = createTabulatedLaw({ profile: { timesS, quaternions } });
    const random = createTabulatedLaw({ profile: { timesS, quaternions } });
    const samples = Array.from({ length: 500 }, (_, i) => (i * 5971) / 500);
    const shuffled = [...samples].sort((a, b) => Math.sin(a * 12.9898) - Math.sin(b * 12.9898));
    const byTime = new Map<number, number[]>();
    for (const t of samples) byTime.set(t, Array.from(tabulatedAttitude(createQuat(), monotone, t)));
    for (const t of shuffled) {
      const q = tabulatedAttitude(createQuat(), random, t);
      // At a row time the two searches may pick adjacent intervals (u = 1 vs u = 0): equal to rounding.
      q.forEach((c, i) => expect(Math.abs(c - byTime.get(t)![i]!)).toBeLessThan(1e-15));
    }
  });

  it('outside the table the default refuses naming tSeconds, and clamp holds the first or last row', () => {
    expect(() => tabulatedAttitude(createQuat(), twoRowLaw(), 600.001)).toThrow(
      expect.objectContaining({ code: 'out_of_range', details: expect.objectContaining({ field: 'tSeconds', limit: '[0, 600]' }) }),
    );
    expect(() => tabulatedAttitude(createQuat(), twoRowLaw(), Number.NaN)).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'tSeconds' }) }),
    );
    const clamped = twoRowLaw('clamp');
    expect(Array.from(tabulatedAttitude(createQuat(), clamped, -50))).toEqual([1, 0, 0, 0]);
    tabulatedAttitude(createQuat(), clamped, 1e6).forEach((c, i) => expect(Math.abs(c - END[i]!)).toBeLessThan(1e-15));
  });

  it('times not strictly increasing, a non-unit quaternion, too few rows and a short quaternion array are refused naming the field', () => {
    const fieldError = (field: string): unknown =>
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field }) });
    const q4 = [1, 0, 0, 0];
    expect(() => createTabulatedLaw({ profile: { timesS: [0, 5, 5], quaternions: [...q4, ...q4, ...q4] } })).toThrow(
      fieldError('attitude.profile.timesS.2'),
    );
    expect(() => createTabulatedLaw({ profile: { timesS: [0, 5], quaternions: [...q4, 0.9, 0, 0, 0] } })).toThrow(
      fieldError('attitude.profile.quaternions.1'),
    );
    expect(() => createTabulatedLaw({ profile: { timesS: [0], quaternions: q4 } })).toThrow(fieldError('attitude.profile.timesS'));
    expect(() => createAttitudeLaw({ law: 'tabulated', profile: { timesS: [0, 1], quaternions: q4 } })).toThrow(
      fieldError('attitude.profile.quaternions'),
    );
  });
});
