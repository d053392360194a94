import { describe, expect, it } from 'vitest';
import { advanceClock, formatRate, playbackRate, stepClock } from './playback-clock';

describe('the playback clock', () => {
  it('advances by wall time times the rate, one output step per second at 1×', () => {
    expect(playbackRate(300, 1)).toBe(300);
    expect(playbackRate(300, 100)).toBe(30_000);
    expect(advanceClock(1000, 0.5, playbackRate(300, 10), 0, 86_400, 'stop')).toEqual({ t: 2500, stopped: false });
  });

  it('stops exactly at the end', () => {
    expect(advanceClock(86_000, 1, 3000, 0, 86_400, 'stop')).toEqual({ t: 86_400, stopped: true });
  });

  it('wraps to the start carrying the overshoot when looping', () => {
    const tick = advanceClock(86_000, 1, 3000, 0, 86_400, 'wrap');
    expect(tick.stopped).toBe(false);
    expect(tick.t).toBe(2600);
  });

  it('ignores a negative or non-finite wall interval and clamps a time outside the run', () => {
    expect(advanceClock(500, -3, 100, 0, 1000, 'stop').t).toBe(500);
    expect(advanceClock(500, Number.NaN, 100, 0, 1000, 'stop').t).toBe(500);
    expect(advanceClock(-50, 0, 100, 0, 1000, 'stop').t).toBe(0);
  });

  it('a run without a span is stopped at its start', () => {
    expect(advanceClock(0, 1, 100, 10, 10, 'wrap')).toEqual({ t: 10, stopped: true });
  });

  it('keyboard steps move by output steps and stay inside the run', () => {
    expect(stepClock(600, 1, 300, 0, 1200)).toBe(900);
    expect(stepClock(600, -10, 300, 0, 1200)).toBe(0);
    expect(stepClock(600, 10, 300, 0, 1200)).toBe(1200);
  });

  it('prints rates in the largest fitting unit', () => {
    expect(formatRate(30)).toBe('30 s/s');
    expect(formatRate(3000)).toBe('50 min/s');
    expect(formatRate(30_000)).toBe('8.3 h/s');
    expect(formatRate(864_000)).toBe('10 d/s');
  });
});
