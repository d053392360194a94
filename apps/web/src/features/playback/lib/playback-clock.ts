/** Speed multipliers offered, of the base rate (one output step per second). */
export const playbackSpeeds = [1, 10, 100, 1000] as const;
/** One of the offered multipliers. */
export type PlaybackSpeed = (typeof playbackSpeeds)[number];

/**
 * Simulated seconds per wall-clock second at a multiplier: the base plays one output step per
 * second, so every run (a GEO day at 300 s, a sail year at 1 day) starts at a readable pace.
 * @param outputStepSeconds the run's output step (s)
 */
export function playbackRate(outputStepSeconds: number, speed: number): number {
  const base = outputStepSeconds > 0 && Number.isFinite(outputStepSeconds) ? outputStepSeconds : 60;
  return base * speed;
}

/** What the clock does on reaching the end of the run. */
export type EndBehaviour = 'stop' | 'wrap';

/** The clock after one tick. */
export interface ClockTick {
  /** The new time (s from the epoch). */
  t: number;
  /** True when the clock stopped at the end (playback should pause). */
  stopped: boolean;
}

/**
 * Advances the playback clock by `wallSeconds` of real time at `rate` simulated s per s within
 * [tStart, tEnd]: at the end it stops there, or wraps to the start carrying the overshoot.
 * A negative or non-finite wall interval (a tab coming back from the background) counts as 0.
 */
export function advanceClock(
  t: number,
  wallSeconds: number,
  rate: number,
  tStart: number,
  tEnd: number,
  end: EndBehaviour,
): ClockTick {
  const span = tEnd - tStart;
  if (!(span > 0)) return { t: tStart, stopped: true };
  const dt = Number.isFinite(wallSeconds) && wallSeconds > 0 ? wallSeconds * rate : 0;
  const next = Math.min(Math.max(t, tStart), tEnd) + dt;
  if (next < tEnd) return { t: next, stopped: false };
  if (end === 'stop') return { t: tEnd, stopped: true };
  return { t: tStart + ((next - tStart) % span), stopped: false };
}

/**
 * The time one keyboard step away: `steps` output steps (negative for back), clamped to the run.
 * @param stepSeconds the run's output step (s)
 */
export function stepClock(t: number, steps: number, stepSeconds: number, tStart: number, tEnd: number): number {
  return Math.min(tEnd, Math.max(tStart, t + steps * stepSeconds));
}

/** A short text for a rate of simulated time per second, e.g. "50 min/s", "1.2 d/s". */
export function formatRate(simSecondsPerSecond: number): string {
  const r = simSecondsPerSecond;
  const fmt = (v: number) => (v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(0) : Number(v.toPrecision(2)).toString());
  if (r < 60) return `${fmt(r)} s/s`;
  if (r < 3600) return `${fmt(r / 60)} min/s`;
  if (r < 86_400) return `${fmt(r / 3600)} h/s`;
  return `${fmt(r / 86_400)} d/s`;
}
