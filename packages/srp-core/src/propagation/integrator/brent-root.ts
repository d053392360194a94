/**
 * Brent's method for a root of a continuous function bracketed by a sign change: inverse quadratic
 * interpolation and secant steps, safeguarded by bisection, so it never does worse than bisection.
 * Source: R. P. Brent, Algorithms for Minimization without Derivatives (1973), chapter 4,
 * procedure `zero` (the netlib `zeroin`).
 */

/** A located root: `root` is the best estimate, and g changes sign between `root` and `other`. */
export interface RootBracket {
  /** Best estimate of the root (where |g| is smallest of the last bracket). */
  root: number;
  /** g(root). */
  gRoot: number;
  /** The other end of the final bracket, within 2·(tol/2 + 2ε|root|) of `root` (equal to it when g(root) = 0). */
  other: number;
  /** g(other). */
  gOther: number;
}

/** Allocates a result record to reuse with `brentRoot`. */
export function createRootBracket(): RootBracket {
  return { root: 0, gRoot: 0, other: 0, gOther: 0 };
}

/**
 * Finds a root of g in [a, b] given g(a) and g(b) of opposite signs (or one of them zero), to
 * within `tol` plus 4 rounding units of the root. Calls g about 10 times for tol/|b − a| ~ 1e-12
 * on smooth functions; allocates nothing.
 * @param out receives the root and the final bracket
 * @param g the function; called only at points inside [a, b]
 * @param tol absolute tolerance on the root, in the unit of a and b, > 0
 * @returns out
 */
export function brentRoot(
  out: RootBracket,
  g: (x: number) => number,
  a: number,
  b: number,
  ga: number,
  gb: number,
  tol: number,
): RootBracket {
  let fa = ga;
  let fb = gb;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < 200; iteration += 1) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol1 = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) break;
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s; // secant
        q = 1 - s;
      } else {
        const qa = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * xm * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm; // interpolation would leave the bracket or converge too slowly: bisect
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    fb = g(b);
  }
  out.root = b;
  out.gRoot = fb;
  out.other = fb === 0 ? b : c;
  out.gOther = fb === 0 ? fb : fc;
  return out;
}
