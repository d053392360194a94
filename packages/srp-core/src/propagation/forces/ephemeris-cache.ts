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

/**
 * The Sun and Moon memos of one ephemeris, paired: a miss on either at a t inside both tables
 * (same degree) interpolates both, their six Clenshaw recurrences side by side in one loop (six
 * independent dependency chains: the Moon costs little more than the Sun alone, and every force
 * that reads one body at a t reads the other at the same t). Same values to the bit as
 * `createTableMemo` for each; outside either table's range each body is interpolated alone, with
 * its own range check and error.
 */
function createSunMoonMemo(sunTable: ChebyshevTable, moonTable: ChebyshevTable): SunMoonMemo {
  const sunAlone = createTableMemo(sunTable);
  const moonAlone = createTableMemo(moonTable);
  if (sunTable.degree !== moonTable.degree) return { sun: sunAlone, moon: moonAlone };
  const sunValue: Vec3 = [0, 0, 0];
  const moonValue: Vec3 = [0, 0, 0];
  // [0]: time of sunValue, [1]: time of moonValue; typed array: see createPositionMemo.
  const last = Float64Array.of(Number.NaN, Number.NaN);
  const cs = sunTable.coefficients;
  const cm = moonTable.coefficients;
  const n = sunTable.degree + 1;
  const countS = sunTable.segmentCount;
  const countM = moonTable.segmentCount;
  const startS = sunTable.startSeconds;
  const startM = moonTable.startSeconds;
  const invS = 1 / sunTable.segmentSeconds;
  const invM = 1 / moonTable.segmentSeconds;

  /** Both bodies at t (true), or false when t is outside either table (nothing written). */
  function both(tSeconds: number): boolean {
    const ss = (tSeconds - startS) * invS;
    const sm = (tSeconds - startM) * invM;
    if (!(ss >= 0 && ss <= countS && sm >= 0 && sm <= countM)) return false;
    let ks = Math.floor(ss);
    if (ks === countS) ks -= 1;
    let km = Math.floor(sm);
    if (km === countM) km -= 1;
    const xs = 2 * (ss - ks) - 1;
    const xm = 2 * (sm - km) - 1;
    const xs2 = 2 * xs;
    const xm2 = 2 * xm;
    const sx = ks * 3 * n;
    const sy = sx + n;
    const sz = sy + n;
    const mx = km * 3 * n;
    const my = mx + n;
    const mz = my + n;
    let s1x = 0;
    let s2x = 0;
    let s1y = 0;
    let s2y = 0;
    let s1z = 0;
    let s2z = 0;
    let m1x = 0;
    let m2x = 0;
    let m1y = 0;
    let m2y = 0;
    let m1z = 0;
    let m2z = 0;
    for (let j = n - 1; j >= 1; j -= 1) {
      const s0x = cs[sx + j]! + xs2 * s1x - s2x;
      const s0y = cs[sy + j]! + xs2 * s1y - s2y;
      const s0z = cs[sz + j]! + xs2 * s1z - s2z;
      const m0x = cm[mx + j]! + xm2 * m1x - m2x;
      const m0y = cm[my + j]! + xm2 * m1y - m2y;
      const m0z = cm[mz + j]! + xm2 * m1z - m2z;
      s2x = s1x;
      s1x = s0x;
      s2y = s1y;
      s1y = s0y;
      s2z = s1z;
      s1z = s0z;
      m2x = m1x;
      m1x = m0x;
      m2y = m1y;
      m1y = m0y;
      m2z = m1z;
      m1z = m0z;
    }
    sunValue[0] = cs[sx]! + xs * s1x - s2x;
    sunValue[1] = cs[sy]! + xs * s1y - s2y;
    sunValue[2] = cs[sz]! + xs * s1z - s2z;
    moonValue[0] = cm[mx]! + xm * m1x - m2x;
    moonValue[1] = cm[my]! + xm * m1y - m2y;
    moonValue[2] = cm[mz]! + xm * m1z - m2z;
    last[0] = tSeconds;
    last[1] = tSeconds;
    return true;
  }

  return {
    sun: {
      at(tSeconds: number): ReadonlyVec3 {
        if (tSeconds === last[0] || both(tSeconds)) return sunValue;
        return sunAlone.at(tSeconds); // t outside a table: this body alone, or its range error
      },
    },
    moon: {
      at(tSeconds: number): ReadonlyVec3 {
        if (tSeconds === last[1] || both(tSeconds)) return moonValue;
        return moonAlone.at(tSeconds);
      },
    },
  };
}

const memos = new WeakMap<GeocentricEphemeris, SunMoonMemo>();

/** The shared Sun and Moon memos of `ephemeris` (made on first use), reading its tables. */
export function sunMoonMemo(ephemeris: GeocentricEphemeris): SunMoonMemo {
  let memo = memos.get(ephemeris);
  if (memo === undefined) {
    memo = createSunMoonMemo(ephemeris.sun, ephemeris.moon);
    memos.set(ephemeris, memo);
  }
  return memo;
}
