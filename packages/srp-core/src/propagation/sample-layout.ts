import { SrpError } from '../errors';

/**
 * Column offsets of one sample row in a packed propagation history (`Float64Array`, row k starts
 * at k·stride). Columns, in order: t (s from epoch), r (3, m, inertial EQJ), v (3, m/s, inertial
 * EQJ), SRP acceleration inertial (3, m/s²), SRP acceleration body (3, m/s²), SRP torque body
 * (3, N·m), illuminated fraction (0..1), Sun distance (m), then one acceleration magnitude
 * (m/s²) per force, in `forceNames` order (from `propagate`: SRP's evaluated at the row, the
 * others interpolated linearly between the integrator's step points, within about 1 %).
 */
export interface SampleLayout {
  /** Numbers per row. */
  readonly stride: number;
  /** Force names in column order (the propagation request's `forces` order). */
  readonly forceNames: readonly string[];
  /** Time from the scenario epoch (s). */
  readonly t: number;
  /** First of 3: position (m), inertial EQJ. */
  readonly r: number;
  /** First of 3: velocity (m/s), inertial EQJ. */
  readonly v: number;
  /** First of 3: SRP acceleration (m/s²), inertial EQJ. */
  readonly srpAccelInertial: number;
  /** First of 3: SRP acceleration (m/s²), body axes. */
  readonly srpAccelBody: number;
  /** First of 3: SRP torque about the centre of mass (N·m), body axes. */
  readonly srpTorqueBody: number;
  /** Fraction of the solar disc seen (1 full Sun, 0 umbra). */
  readonly illuminatedFraction: number;
  /** Distance from the Sun (m). */
  readonly sunDistanceM: number;
  /** First force-magnitude column (m/s²); force i is at forceAccel + i. */
  readonly forceAccel: number;
}

/** Offsets of the fixed columns, shared by every layout. */
export const SAMPLE_T = 0;
export const SAMPLE_R = 1;
export const SAMPLE_V = 4;
export const SAMPLE_SRP_ACCEL_INERTIAL = 7;
export const SAMPLE_SRP_ACCEL_BODY = 10;
export const SAMPLE_SRP_TORQUE_BODY = 13;
export const SAMPLE_ILLUMINATED_FRACTION = 16;
export const SAMPLE_SUN_DISTANCE = 17;
export const SAMPLE_FORCE_ACCEL = 18;

/**
 * The layout for a run with these forces (names must be distinct and non-empty).
 * @throws SrpError 'invalid_input' for an empty or repeated name (field `forceNames.i`)
 */
export function createSampleLayout(forceNames: readonly string[]): SampleLayout {
  const seen = new Set<string>();
  forceNames.forEach((name, i) => {
    if (name.length === 0 || seen.has(name)) {
      throw new SrpError(
        'invalid_input',
        `forceNames.${i} must be a non-empty name not used before; got '${name}'`,
        { field: `forceNames.${i}`, value: name },
      );
    }
    seen.add(name);
  });
  return Object.freeze({
    stride: SAMPLE_FORCE_ACCEL + forceNames.length,
    forceNames: Object.freeze([...forceNames]),
    t: SAMPLE_T,
    r: SAMPLE_R,
    v: SAMPLE_V,
    srpAccelInertial: SAMPLE_SRP_ACCEL_INERTIAL,
    srpAccelBody: SAMPLE_SRP_ACCEL_BODY,
    srpTorqueBody: SAMPLE_SRP_TORQUE_BODY,
    illuminatedFraction: SAMPLE_ILLUMINATED_FRACTION,
    sunDistanceM: SAMPLE_SUN_DISTANCE,
    forceAccel: SAMPLE_FORCE_ACCEL,
  });
}

/** Offset of the named force's magnitude column, or -1 when the layout has no such force. */
export function forceColumn(layout: SampleLayout, name: string): number {
  const i = layout.forceNames.indexOf(name);
  return i < 0 ? -1 : layout.forceAccel + i;
}

/** A packed history as budgets and exports read it (a PropagationResult carries these three). */
export interface SampleHistory {
  readonly layout: SampleLayout;
  /** Row k starts at k·layout.stride; rows in increasing time. */
  readonly samples: Float64Array;
  readonly sampleCount: number;
}
