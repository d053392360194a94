/**
 * Piecewise Chebyshev interpolation of a 3-vector function of time: sample once, evaluate fast.
 *
 * Each segment of length `segmentSeconds` holds `degree + 1` coefficients per component, fitted by
 * interpolation at the Chebyshev–Gauss nodes (discrete cosine transform), which is within a small
 * factor of the best polynomial approximation of that degree; evaluation is Clenshaw's recurrence.
 * Source: Press et al., Numerical Recipes, 3rd ed. (2007), §5.8 "Chebyshev approximation",
 * eqs. 5.8.7 (coefficients) and 5.8.11 (Clenshaw) (equation numbers from memory). The same scheme
 * is how JPL distributes its DE ephemerides.
 */
import { SrpError } from '../errors';
import type { Vec3 } from '../math/vec3';

/** A fitted table; plain data (it may be sent to a worker or cached). */
export interface ChebyshevTable {
  /** First time covered (s from the scenario epoch). */
  readonly startSeconds: number;
  /** Last time covered (s from the scenario epoch): start + segmentCount · segmentSeconds. */
  readonly endSeconds: number;
  /** Length of one segment (s). */
  readonly segmentSeconds: number;
  /** Number of segments. */
  readonly segmentCount: number;
  /** Polynomial degree per segment (coefficients per component: degree + 1). */
  readonly degree: number;
  /** Coefficients, segment-major then component (x, y, z), in the unit of the sampled function. */
  readonly coefficients: Float64Array;
}

/**
 * Fits a table to `sample` over [startSeconds, endSeconds] (the last segment may reach past the end).
 * Calls `sample` segmentCount · (degree + 1) times; allocates the table.
 * @param sample writes the function's value at time t (s) into `out` and returns it
 * @param startSeconds first time to cover (s)
 * @param endSeconds last time to cover (s), > startSeconds
 * @param segmentSeconds segment length (s), > 0
 * @param degree polynomial degree, integer 1 to 30
 * @throws SrpError `invalid_input` / `out_of_range` naming the offending argument
 */
export function fitChebyshevTable(
  sample: (out: Vec3, tSeconds: number) => Vec3,
  startSeconds: number,
  endSeconds: number,
  segmentSeconds: number,
  degree: number,
): ChebyshevTable {
  if (!Number.isFinite(startSeconds) || !Number.isFinite(endSeconds) || !(endSeconds > startSeconds)) {
    const message = `endSeconds must be finite and after startSeconds (${startSeconds} s); got ${endSeconds}`;
    throw new SrpError('out_of_range', message, {
      field: 'endSeconds',
      value: endSeconds,
      limit: `> ${startSeconds}`,
    });
  }
  if (!Number.isFinite(segmentSeconds) || !(segmentSeconds > 0)) {
    throw new SrpError('out_of_range', `segmentSeconds must be a finite number (s) greater than 0; got ${segmentSeconds}`, {
      field: 'segmentSeconds',
      value: segmentSeconds,
      limit: '> 0',
    });
  }
  if (!Number.isInteger(degree) || degree < 1 || degree > 30) {
    throw new SrpError('out_of_range', `degree must be an integer from 1 to 30; got ${degree}`, {
      field: 'degree',
      value: degree,
      limit: '1..30',
    });
  }
  const n = degree + 1;
  const segmentCount = Math.max(1, Math.ceil((endSeconds - startSeconds) / segmentSeconds - 1e-9));
  const coefficients = new Float64Array(segmentCount * 3 * n);
  const values = new Float64Array(3 * n);
  const point: Vec3 = [0, 0, 0];
  for (let k = 0; k < segmentCount; k += 1) {
    const t0 = startSeconds + k * segmentSeconds;
    for (let i = 0; i < n; i += 1) {
      // Chebyshev–Gauss node x_i = cos(π (i + ½) / n) on [-1, 1], mapped onto the segment.
      const x = Math.cos((Math.PI * (i + 0.5)) / n);
      sample(point, t0 + ((x + 1) / 2) * segmentSeconds);
      values[i] = point[0];
      values[n + i] = point[1];
      values[2 * n + i] = point[2];
    }
    for (let c = 0; c < 3; c += 1) {
      for (let j = 0; j < n; j += 1) {
        let sum = 0;
        for (let i = 0; i < n; i += 1) sum += (values[c * n + i] as number) * Math.cos((Math.PI * j * (i + 0.5)) / n);
        coefficients[(k * 3 + c) * n + j] = ((j === 0 ? 1 : 2) / n) * sum;
      }
    }
  }
  return {
    startSeconds,
    endSeconds: startSeconds + segmentCount * segmentSeconds,
    segmentSeconds,
    segmentCount,
    degree,
    coefficients,
  };
}

/**
 * Evaluates a fitted table at `tSeconds`; allocates nothing.
 * @param tSeconds time (s from the scenario epoch) within [startSeconds, endSeconds]
 * @returns out, in the unit of the sampled function
 * @throws SrpError `out_of_range` naming `tSeconds` outside the table (never extrapolates)
 */
export function evaluateChebyshevTable(out: Vec3, table: ChebyshevTable, tSeconds: number): Vec3 {
  const s = (tSeconds - table.startSeconds) / table.segmentSeconds;
  const count = table.segmentCount;
  if (!(s >= 0 && s <= count)) {
    throw new SrpError(
      'out_of_range',
      `tSeconds ${tSeconds} s lies outside the interpolated ephemeris ` +
        `[${table.startSeconds}, ${table.endSeconds}] s; fit a longer span`,
      { field: 'tSeconds', value: tSeconds, limit: `[${table.startSeconds}, ${table.endSeconds}]` },
    );
  }
  let k = Math.floor(s);
  if (k === count) k -= 1;
  const x = 2 * (s - k) - 1;
  const x2 = 2 * x;
  const n = table.degree + 1;
  const coef = table.coefficients;
  let base = k * 3 * n;
  for (let c = 0; c < 3; c += 1) {
    // Clenshaw: b_j = c_j + 2x b_{j+1} − b_{j+2}; f = c_0 + x b_1 − b_2.
    let b1 = 0;
    let b2 = 0;
    for (let j = n - 1; j >= 1; j -= 1) {
      const b0 = (coef[base + j] as number) + x2 * b1 - b2;
      b2 = b1;
      b1 = b0;
    }
    out[c] = (coef[base] as number) + x * b1 - b2;
    base += n;
  }
  return out;
}
