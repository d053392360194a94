/**
 * One memo per geocentric ephemeris, shared by every force built on it: the Sun's and the Moon's
 * positions are needed by the third-body forces, the SRP force and its shadow model at the same
 * t within one derivative evaluation, so each is interpolated once per distinct t.
 */
import { SrpError } from '../../errors';
import type { ChebyshevTable } from '../../bodies/chebyshev-table';
import type { GeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import type { ReadonlyVec3, Vec3 } from '../../math/vec3';

/** Last-time memo of a position function. */
export interface PositionMemo {
  /** The position (m) at tSeconds; the returned vector is owned by the memo, read it at once. */
  at(tSeconds: number): ReadonlyVec3;
}

/** Wraps `positionAt` so that repeated calls at the same t (s) interpolate once. */
export function createPositionMemo(positionAt: (out: Vec3, tSeconds: number) => Vec3): PositionMemo {
  const value: Vec3 = [0, 0, 0];
  // The last time in a typed array, not a captured `let`: V8 boxes a double stored into a closure
  // variable (one allocation per update).
  const last = Float64Array.of(Number.NaN);
  return {
    at(tSeconds: number): ReadonlyVec3 {
      if (tSeconds !== last[0]) {
        positionAt(value, tSeconds);
        last[0] = tSeconds;
      }
      return value;
    },
  };
}

/**
 * A memo reading a Chebyshev table directly, the three components' Clenshaw recurrences run
 * side by side in one loop (three independent dependency chains instead of one after another;
 * measured about twice as fast as `evaluateChebyshevTable`, same values to the last bit or two).
 * Same range check and error as `evaluateChebyshevTable`.
 */
export function createTableMemo(table: ChebyshevTable): PositionMemo {
  const value: Vec3 = [0, 0, 0];
  const last = Float64Array.of(Number.NaN); // typed array: see createPositionMemo
  const coef = table.coefficients;
  const n = table.degree + 1;
  const count = table.segmentCount;
  const start = table.startSeconds;
  const invSegment = 1 / table.segmentSeconds;
  return {
    at(tSeconds: number): ReadonlyVec3 {
      if (tSeconds === last[0]) return value;
      const s = (tSeconds - start) * invSegment;
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
      const bx = k * 3 * n;
      const by = bx + n;
      const bz = by + n;
      let b1x = 0;
      let b2x = 0;
      let b1y = 0;
      let b2y = 0;
      let b1z = 0;
      let b2z = 0;
      for (let j = n - 1; j >= 1; j -= 1) {
        const b0x = coef[bx + j]! + x2 * b1x - b2x;
        const b0y = coef[by + j]! + x2 * b1y - b2y;
        const b0z = coef[bz + j]! + x2 * b1z - b2z;
        b2x = b1x;
        b1x = b0x;
        b2y = b1y;
        b1y = b0y;
        b2z = b1z;
        b1z = b0z;
      }
      value[0] = coef[bx]! + x * b1x - b2x;
      value[1] = coef[by]! + x * b1y - b2y;
      value[2] = coef[bz]! + x * b1z - b2z;
      last[0] = tSeconds;
      return value;
    },
  };
}

interface SunMoonMemo {
  sun: PositionMemo;
  moon: PositionMemo;
}

const memos = new WeakMap<GeocentricEphemeris, SunMoonMemo>();

/** The shared Sun and Moon memos of `ephemeris` (made on first use), reading its tables. */
export function sunMoonMemo(ephemeris: GeocentricEphemeris): SunMoonMemo {
  let memo = memos.get(ephemeris);
  if (memo === undefined) {
    memo = { sun: createTableMemo(ephemeris.sun), moon: createTableMemo(ephemeris.moon) };
    memos.set(ephemeris, memo);
  }
  return memo;
}
