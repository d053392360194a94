import { describe, expect, it } from 'vitest';
import { brentRoot, createRootBracket } from './brent-root';

describe('brentRoot', () => {
  it('finds cos x = x within the tolerance, with a bracket of opposite signs', () => {
    // source: the Dottie number 0.739085133215160641655312087673873404 (OEIS A003957).
    const g = (x: number) => Math.cos(x) - x;
    const out = brentRoot(createRootBracket(), g, 0, 1, g(0), g(1), 1e-12);
    expect(Math.abs(out.root - 0.7390851332151607)).toBeLessThan(1e-12);
    expect(out.gRoot * out.gOther).toBeLessThanOrEqual(0);
    expect(Math.abs(out.other - out.root)).toBeLessThan(2e-12);
  });

  it('converges in few evaluations on a smooth function and falls back to bisection on a step', () => {
    let calls = 0;
    const cubic = (x: number) => {
      calls += 1;
      return x * x * x - 2; // root 2^(1/3)
    };
    brentRoot(createRootBracket(), cubic, 0, 3, -2, 25, 1e-12);
    expect(calls).toBeLessThan(15);

    const step = (x: number) => (x < 0.3 ? -1 : 1);
    const out = brentRoot(createRootBracket(), step, 0, 1, -1, 1, 1e-9);
    // Bisection bound: the bracket around the jump shrinks below 2 · (tol/2 + rounding).
    expect(Math.abs(out.root - 0.3)).toBeLessThan(1.1e-9);
  });

  it('returns an end point where g is exactly zero', () => {
    const g = (x: number) => x - 2;
    expect(brentRoot(createRootBracket(), g, 2, 5, 0, 3, 1e-9).root).toBe(2);
    expect(brentRoot(createRootBracket(), g, 0, 2, -2, 0, 1e-9).root).toBe(2);
  });
});
