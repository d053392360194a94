import { SrpError } from '../errors';
import { checkFinite, checkUnitQuat } from './attitude-input';
import { createQuat, slerpQuat } from './quaternion';
import type { Quat } from './quaternion';

/** A table of attitudes: times and quaternions, packed. */
export interface AttitudeProfileData {
  /** Times from the scenario epoch (s), strictly increasing, at least 2. */
  timesS: ArrayLike<number>;
  /**
   * Attitudes `[w, x, y, z]` (EQJ axes onto body axes) packed 4 per row, `4 × timesS.length`
   * numbers; each |q| = 1 ± 1e-4, normalised on creation.
   */
  quaternions: ArrayLike<number>;
}

/**
 * What the tabulated law does at a time outside the table:
 * `refuse` (default) throws `out_of_range`; `clamp` holds the first or last attitude.
 */
export type OutsideTable = 'refuse' | 'clamp';

/** A tabulated attitude profile as a caller describes it. */
export interface TabulatedLawOptions {
  /** The table, e.g. from `parseAttitudeCsv`. */
  profile: AttitudeProfileData;
  /** Behaviour outside [first time, last time]; default `refuse`. */
  outside?: OutsideTable | undefined;
}
/** `TabulatedLawOptions` tagged for `createAttitudeLaw`. */
export type TabulatedLawSpec = TabulatedLawOptions & { law: 'tabulated' };

declare const checkedTabulatedLaw: unique symbol;

/** A checked tabulated law, made by `createTabulatedLaw`. */
export type TabulatedLaw = {
  readonly law: 'tabulated';
  /** Times from the scenario epoch (s), strictly increasing (a private copy). */
  readonly timesS: Float64Array;
  /** Unit quaternions packed 4 per row, signs made continuous (q_i · q_{i-1} ≥ 0). */
  readonly quaternions: Float64Array;
  readonly outside: OutsideTable;
  /** Index of the table interval used last (a cursor for monotone time). */
  readonly cursor: number;
  readonly [checkedTabulatedLaw]: true;
};

/**
 * Checks and compiles a tabulated attitude profile (allocates; not for hot paths). Copies the
 * table, normalises each quaternion and flips the sign of any quaternion whose dot product with
 * the previous one is negative (q and -q are the same attitude), so that slerp between rows and
 * the output are continuous. Consecutive rows must be less than 180° apart (slerp takes the
 * shorter arc).
 * @param field path of `spec` in the caller's input, used in errors (`attitude`)
 * @throws SrpError `invalid_input` naming `<field>.profile.timesS`, `<field>.profile.timesS.<i>`,
 *   `<field>.profile.quaternions` or `<field>.profile.quaternions.<i>` (i: 0-based row), or
 *   `<field>.outside`
 */
export function createTabulatedLaw(
  spec: TabulatedLawOptions & { law?: 'tabulated' },
  field = 'attitude',
): TabulatedLaw {
  const { timesS, quaternions } = spec.profile;
  const outside = spec.outside ?? 'refuse';
  if (outside !== 'refuse' && outside !== 'clamp') {
    throw new SrpError('invalid_input', `${field}.outside must be refuse or clamp; got ${String(outside)}`, {
      field: `${field}.outside`,
      value: outside,
      limit: 'refuse | clamp',
    });
  }
  const n = timesS.length;
  if (n < 2) {
    throw new SrpError('invalid_input', `${field}.profile.timesS must have at least 2 rows; got ${n}`, {
      field: `${field}.profile.timesS`,
      value: n,
      limit: '>= 2 rows',
    });
  }
  if (quaternions.length !== 4 * n) {
    throw new SrpError(
      'invalid_input',
      `${field}.profile.quaternions must hold 4 numbers per row (${4 * n} for ${n} times); got ${quaternions.length}`,
      { field: `${field}.profile.quaternions`, value: quaternions.length, limit: `${4 * n}` },
    );
  }
  const times = new Float64Array(n);
  const quats = new Float64Array(4 * n);
  const q = createQuat();
  for (let i = 0; i < n; i += 1) {
    const t = checkFinite(timesS[i]!, `${field}.profile.timesS.${i}`, 's');
    if (i > 0 && !(t > times[i - 1]!)) {
      throw new SrpError(
        'invalid_input',
        `${field}.profile.timesS.${i} must be greater than the previous time ${times[i - 1]} s (strictly increasing); got ${t}`,
        { field: `${field}.profile.timesS.${i}`, value: t, limit: `> ${times[i - 1]}` },
      );
    }
    times[i] = t;
    const row = [quaternions[4 * i]!, quaternions[4 * i + 1]!, quaternions[4 * i + 2]!, quaternions[4 * i + 3]!];
    checkUnitQuat(q, row, `${field}.profile.quaternions.${i}`);
    const k = 4 * i;
    const sign =
      i > 0 && q[0] * quats[k - 4]! + q[1] * quats[k - 3]! + q[2] * quats[k - 2]! + q[3] * quats[k - 1]! < 0 ? -1 : 1;
    quats[k] = sign * q[0];
    quats[k + 1] = sign * q[1];
    quats[k + 2] = sign * q[2];
    quats[k + 3] = sign * q[3];
  }
  return { law: 'tabulated', timesS: times, quaternions: quats, outside, cursor: 0 } as unknown as TabulatedLaw;
}

const qA = createQuat();
const qB = createQuat();

function copyRow(out: Quat, quats: Float64Array, i: number): Quat {
  const k = 4 * i;
  out[0] = quats[k]!;
  out[1] = quats[k + 1]!;
  out[2] = quats[k + 2]!;
  out[3] = quats[k + 3]!;
  return out;
}

/**
 * Attitude at a time by slerp between the two table rows around it. The interval is found from a
 * cursor (the interval used last, or the next one: O(1) for monotone time) or else by binary
 * search (O(log n), e.g. after an integrator rejects a step). At a row time the row itself is
 * returned. Allocates nothing.
 * @param out receives the attitude quaternion (EQJ axes onto body axes)
 * @param tSeconds time from the scenario epoch (s)
 * @returns out
 * @throws SrpError `out_of_range` naming `tSeconds` outside the table with `outside: 'refuse'`;
 *   `invalid_input` for a non-finite time
 */
export function tabulatedAttitude(out: Quat, law: TabulatedLaw, tSeconds: number): Quat {
  const times = law.timesS;
  const quats = law.quaternions;
  const last = times.length - 1;
  const t0 = times[0]!;
  const tEnd = times[last]!;
  if (!(tSeconds >= t0 && tSeconds <= tEnd)) {
    if (law.outside === 'clamp' && Number.isFinite(tSeconds)) {
      return copyRow(out, quats, tSeconds < t0 ? 0 : last);
    }
    throw new SrpError(
      Number.isFinite(tSeconds) ? 'out_of_range' : 'invalid_input',
      `tSeconds must lie within the attitude table [${t0}, ${tEnd}] s; got ${tSeconds}`,
      { field: 'tSeconds', value: tSeconds, limit: `[${t0}, ${tEnd}]` },
    );
  }
  let i = law.cursor;
  if (!(times[i]! <= tSeconds && tSeconds <= times[i + 1]!)) {
    if (i + 2 <= last && times[i + 1]! <= tSeconds && tSeconds <= times[i + 2]!) {
      i += 1;
    } else {
      // Largest i with times[i] <= t, kept in [0, last - 1].
      let lo = 0;
      let hi = last;
      while (hi - lo > 1) {
        const mid = (lo + hi) >>> 1;
        if (times[mid]! <= tSeconds) lo = mid;
        else hi = mid;
      }
      i = lo;
    }
    (law as { cursor: number }).cursor = i;
  }
  const ta = times[i]!;
  const u = (tSeconds - ta) / (times[i + 1]! - ta);
  return slerpQuat(out, copyRow(qA, quats, i), copyRow(qB, quats, i + 1), u);
}
