import { useCallback, useEffect, useRef, useState } from 'react';
import { advanceClock, playbackRate, type PlaybackSpeed } from '../lib/playback-clock';

/** Options of usePlaybackClock. */
export interface PlaybackClockOptions {
  tStart: number;
  tEnd: number;
  outputStepSeconds: number;
}

/**
 * The playback time and its controls: a requestAnimationFrame loop advances the time while
 * playing, at the chosen speed, stopping at the end or wrapping when looping.
 */
export function usePlaybackClock({ tStart, tEnd, outputStepSeconds }: PlaybackClockOptions) {
  const [t, setTState] = useState(tStart);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState<PlaybackSpeed>(10);
  const [loop, setLoop] = useState(false);
  const tRef = useRef(tStart);

  const seek = useCallback(
    (next: number) => {
      const clamped = Math.min(tEnd, Math.max(tStart, next));
      tRef.current = clamped;
      setTState(clamped);
    },
    [tStart, tEnd],
  );

  useEffect(() => {
    if (!playing) return undefined;
    const rate = playbackRate(outputStepSeconds, speed);
    let last = performance.now();
    let frame = requestAnimationFrame(function tick(now) {
      const step = advanceClock(tRef.current, (now - last) / 1000, rate, tStart, tEnd, loop ? 'wrap' : 'stop');
      last = now;
      tRef.current = step.t;
      setTState(step.t);
      if (step.stopped) setPlaying(false);
      else frame = requestAnimationFrame(tick);
    });
    return () => cancelAnimationFrame(frame);
  }, [playing, speed, loop, tStart, tEnd, outputStepSeconds]);

  const togglePlay = useCallback(() => {
    setPlaying((was) => {
      // Play at the end starts again from the beginning.
      if (!was && tRef.current >= tEnd) seek(tStart);
      return !was;
    });
  }, [seek, tStart, tEnd]);

  return { t, playing, speed, loop, seek, togglePlay, setSpeed, setLoop, setPlaying };
}
