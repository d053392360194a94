import { describe, expect, it } from 'vitest';
import * as K from './dop853-coefficients';

// Stage s (1-based) of the tableau: its node c_s and its row a_s,j; stage 13 is f(t + h, y1) (FSAL),
// whose row is the weights b. Read from the module by name so a typo in a name shows up here too.
const coefficients = K as unknown as Record<string, number>;
const STAGES = 16;
const node = (s: number): number => (s === 1 ? 0 : s === 13 ? 1 : coefficients[`C${s}`]!);
const a = (s: number, j: number): number => (s === 13 ? (coefficients[`B${j}`] ?? 0) : (coefficients[`A${s}_${j}`] ?? 0));
const b = (j: number): number => coefficients[`B${j}`] ?? 0;

/** Relative tolerance of the checks: sums of up to 12 terms of size up to ~50, each rounded once. */
const TOL = 1e-13;

describe('DOP853 coefficients', () => {
  it('every stage node is the sum of its row (c_s = Σ_j a_s,j)', () => {
    for (let s = 2; s <= STAGES; s += 1) {
      let sum = 0;
      for (let j = 1; j < s; j += 1) sum += a(s, j);
      expect(Math.abs(sum - node(s))).toBeLessThan(TOL * 50);
    }
  });

  it('the weights integrate polynomials up to degree 7 exactly (Σ b_j c_j^(q−1) = 1/q, q ≤ 8)', () => {
    // source: Hairer, Nørsett & Wanner (1993), §II.2, order conditions for the bushy trees.
    for (let q = 1; q <= 8; q += 1) {
      let sum = 0;
      for (let j = 1; j <= 12; j += 1) sum += b(j) * node(j) ** (q - 1);
      expect(Math.abs(sum - 1 / q)).toBeLessThan(TOL * 50);
    }
  });

  it('satisfy the order conditions Σ b_i a_ij c_j^(q−1) = 1/(q (q+1)) for q ≤ 7', () => {
    // source: Hairer, Nørsett & Wanner (1993), §II.2, trees [τ^(q−1)] grafted on a root.
    for (let q = 1; q <= 7; q += 1) {
      let sum = 0;
      for (let i = 1; i <= 12; i += 1) for (let j = 1; j < i; j += 1) sum += b(i) * a(i, j) * node(j) ** (q - 1);
      expect(Math.abs(sum - 1 / (q * (q + 1)))).toBeLessThan(TOL * 100);
    }
  });

  it('the 5th-order error estimator vanishes on polynomials of degree ≤ 4, the 3rd-order one on degree ≤ 2', () => {
    // Each estimator is b − b̂ for an embedded method of that order: Σ (b − b̂)_j c_j^(q−1) = 0.
    const er = (j: number): number => coefficients[`ER${j}`] ?? 0;
    const bhh = (j: number): number => (j === 1 ? K.BHH1 : j === 9 ? K.BHH2 : j === 12 ? K.BHH3 : 0);
    for (let q = 1; q <= 5; q += 1) {
      let sum5 = 0;
      for (let j = 1; j <= 12; j += 1) sum5 += er(j) * node(j) ** (q - 1);
      expect(Math.abs(sum5)).toBeLessThan(TOL * 50);
    }
    for (let q = 1; q <= 3; q += 1) {
      let sum3 = 0;
      for (let j = 1; j <= 12; j += 1) sum3 += (b(j) - bhh(j)) * node(j) ** (q - 1);
      expect(Math.abs(sum3)).toBeLessThan(TOL * 50);
    }
  });
});
