import type { Series, SeriesColumn } from '@photon-ledger/shared';

/** One column of a run as (time, value) points in time order, ready for interpolation. */
export interface Track {
  /** Times of the points (s from the epoch), non-decreasing. */
  readonly t: Float64Array;
  /** Values at those times (SI, the column's unit). */
  readonly v: Float64Array;
}

/** A track from one column of a series answer. */
export function trackFromColumn(column: Pick<SeriesColumn, 't' | 'values'>): Track {
  return { t: Float64Array.from(column.t), v: Float64Array.from(column.values) };
}

/**
 * Index i of the interval [times[i], times[i+1]] that holds t, by bisection; 0 before the first
 * point and length − 2 after the last (so that i + 1 is always a valid index for two or more points).
 */
export function intervalIndex(times: Float64Array, t: number): number {
  const n = times.length;
  if (n < 2 || t <= times[0]!) return 0;
  if (t >= times[n - 1]!) return n - 2;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid]! <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The track's value at t by linear interpolation, held at the end values outside its range; NaN for an empty track. */
export function sampleTrack(track: Track, t: number): number {
  const n = track.t.length;
  if (n === 0) return Number.NaN;
  if (n === 1 || t <= track.t[0]!) return track.v[0]!;
  if (t >= track.t[n - 1]!) return track.v[n - 1]!;
  const i = intervalIndex(track.t, t);
  const t0 = track.t[i]!;
  const t1 = track.t[i + 1]!;
  const span = t1 - t0;
  // Two points at one instant (a sample on an event): take the later one.
  if (span <= 0) return track.v[i + 1]!;
  const u = (t - t0) / span;
  return track.v[i]! + u * (track.v[i + 1]! - track.v[i]!);
}

/**
 * Cubic Hermite interpolation of a position component at t from the position track and the
 * velocity track on the same times (s, m, m/s): exact for a cubic, and within metres of the true
 * orbit between samples where a straight chord would cut inside it. Held at the ends outside the range.
 */
export function sampleHermite(position: Track, velocity: Track, t: number): number {
  const n = position.t.length;
  if (n === 0) return Number.NaN;
  if (n === 1 || t <= position.t[0]!) return position.v[0]!;
  if (t >= position.t[n - 1]!) return position.v[n - 1]!;
  const i = intervalIndex(position.t, t);
  const t0 = position.t[i]!;
  const h = position.t[i + 1]! - t0;
  if (h <= 0) return position.v[i + 1]!;
  const u = (t - t0) / h;
  const u2 = u * u;
  const u3 = u2 * u;
  // Hermite basis on [0, 1]; source: common practice (any numerical analysis text).
  const h00 = 2 * u3 - 3 * u2 + 1;
  const h10 = u3 - 2 * u2 + u;
  const h01 = -2 * u3 + 3 * u2;
  const h11 = u3 - u2;
  return h00 * position.v[i]! + h10 * h * velocity.v[i]! + h01 * position.v[i + 1]! + h11 * h * velocity.v[i + 1]!;
}

/** True when two tracks have the same times (so that one may serve as the other's derivative). */
export function sameTimes(a: Track, b: Track): boolean {
  if (a.t.length !== b.t.length) return false;
  for (let i = 0; i < a.t.length; i += 1) if (a.t[i] !== b.t[i]) return false;
  return true;
}

/** Three tracks, one per axis. */
export type TrackVec = readonly [Track, Track, Track];

/** Stored columns the playback reads, 16 (the series route's limit). */
export const playbackColumns = [
  'x_m',
  'y_m',
  'z_m',
  'vx_m_s',
  'vy_m_s',
  'vz_m_s',
  'srp_ax_eqj_m_s2',
  'srp_ay_eqj_m_s2',
  'srp_az_eqj_m_s2',
  'srp_ax_body_m_s2',
  'srp_ay_body_m_s2',
  'srp_az_body_m_s2',
  'srp_tx_body_n_m',
  'srp_ty_body_n_m',
  'srp_tz_body_n_m',
  'illuminated_fraction',
] as const;

/** Everything the playback shows, as tracks over the run. */
export interface PlaybackData {
  /** First and last time with data (s from the epoch). */
  readonly tStart: number;
  readonly tEnd: number;
  /** Position in the run's inertial frame (EQJ), centred on the central body (m). */
  readonly position: TrackVec;
  /** Velocity, same frame (m/s). */
  readonly velocity: TrackVec;
  /** SRP acceleration in inertial axes (m/s²). */
  readonly srpAccelInertial: TrackVec;
  /** SRP acceleration in body axes (m/s²). */
  readonly srpAccelBody: TrackVec;
  /** SRP torque about the centre of mass in body axes (N·m). */
  readonly srpTorqueBody: TrackVec;
  /** Fraction of the solar disc seen (0 in umbra, 1 in full Sun). */
  readonly illuminated: Track;
  /** True when position and velocity share their times, so positions are Hermite-interpolated. */
  readonly hermite: boolean;
  /** True when the series route kept only the extremes of each time bucket (more samples than points). */
  readonly decimated: boolean;
  /** Samples of the run in the range, and points kept per column at most. */
  readonly rowsInRange: number;
  readonly pointCount: number;
}

/**
 * The playback tracks from a series answer holding every column of `playbackColumns`.
 * @throws Error naming a missing column (the answer does not match the request)
 */
export function playbackDataFromSeries(series: Series): PlaybackData {
  const byName = new Map(series.series.map((c) => [c.column, c]));
  const track = (name: (typeof playbackColumns)[number]): Track => {
    const column = byName.get(name);
    if (!column) throw new Error(`the series answer has no column ${name}`);
    return trackFromColumn(column);
  };
  const vec = (a: (typeof playbackColumns)[number], b: (typeof playbackColumns)[number], c: (typeof playbackColumns)[number]): TrackVec => [
    track(a),
    track(b),
    track(c),
  ];
  const position = vec('x_m', 'y_m', 'z_m');
  const velocity = vec('vx_m_s', 'vy_m_s', 'vz_m_s');
  const hermite = position.every((p, j) => sameTimes(p, velocity[j]!));
  return {
    tStart: position[0].t[0] ?? series.fromT,
    tEnd: position[0].t[position[0].t.length - 1] ?? series.toT,
    position,
    velocity,
    srpAccelInertial: vec('srp_ax_eqj_m_s2', 'srp_ay_eqj_m_s2', 'srp_az_eqj_m_s2'),
    srpAccelBody: vec('srp_ax_body_m_s2', 'srp_ay_body_m_s2', 'srp_az_body_m_s2'),
    srpTorqueBody: vec('srp_tx_body_n_m', 'srp_ty_body_n_m', 'srp_tz_body_n_m'),
    illuminated: track('illuminated_fraction'),
    hermite,
    decimated: series.rowsInRange > series.bucketCount,
    rowsInRange: series.rowsInRange,
    pointCount: position[0].t.length,
  };
}

/** [x, y, z]. */
export type Vec3 = [number, number, number];

/** The state shown at one instant. */
export interface PlaybackState {
  /** Seconds from the epoch (s). */
  tSeconds: number;
  positionM: Vec3;
  srpAccelInertialMps2: Vec3;
  srpAccelBodyMps2: Vec3;
  srpTorqueBodyNm: Vec3;
  /** 0..1. */
  illuminatedFraction: number;
}

/** A zeroed state, to be filled by `stateAt`. */
export function createPlaybackState(): PlaybackState {
  return {
    tSeconds: 0,
    positionM: [0, 0, 0],
    srpAccelInertialMps2: [0, 0, 0],
    srpAccelBodyMps2: [0, 0, 0],
    srpTorqueBodyNm: [0, 0, 0],
    illuminatedFraction: 0,
  };
}

function sampleVec(out: Vec3, tracks: TrackVec, t: number): Vec3 {
  out[0] = sampleTrack(tracks[0], t);
  out[1] = sampleTrack(tracks[1], t);
  out[2] = sampleTrack(tracks[2], t);
  return out;
}

/** Fills `out` with the state at t (s from the epoch): Hermite positions when possible, linear otherwise. */
export function stateAt(out: PlaybackState, data: PlaybackData, t: number): PlaybackState {
  out.tSeconds = t;
  if (data.hermite) {
    for (let j = 0; j < 3; j += 1) out.positionM[j] = sampleHermite(data.position[j]!, data.velocity[j]!, t);
  } else {
    sampleVec(out.positionM, data.position, t);
  }
  sampleVec(out.srpAccelInertialMps2, data.srpAccelInertial, t);
  sampleVec(out.srpAccelBodyMps2, data.srpAccelBody, t);
  sampleVec(out.srpTorqueBodyNm, data.srpTorqueBody, t);
  out.illuminatedFraction = Math.min(1, Math.max(0, sampleTrack(data.illuminated, t)));
  return out;
}

/** Largest norm over the points of a vector's tracks (0 for empty tracks). */
export function maxNorm(tracks: TrackVec): number {
  const [x, y, z] = tracks;
  // The three columns may have different times when decimated: bound by the per-axis extremes.
  if (!(sameTimes(x, y) && sameTimes(x, z))) {
    const axisMax = (tr: Track) => tr.v.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
    return Math.hypot(axisMax(x), axisMax(y), axisMax(z));
  }
  let best = 0;
  for (let i = 0; i < x.v.length; i += 1) best = Math.max(best, Math.hypot(x.v[i]!, y.v[i]!, z.v[i]!));
  return best;
}

/** Points per column to ask for: every sample when the route allows it (2 points per bucket), else its limit. */
export function playbackMaxPoints(sampleCount: number, limit: number): number {
  return Math.max(4, Math.min(limit, 2 * sampleCount));
}
