import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import { formatRate, playbackRate, playbackSpeeds, type PlaybackSpeed } from '../lib/playback-clock';
import { utcLabel } from '../lib/format-quantity';
import type { ShadowInterval } from '../lib/shadow-intervals';

/** Props of PlaybackControls. */
export interface PlaybackControlsProps {
  epochUtc: string;
  tStart: number;
  tEnd: number;
  /** Current time (s from the epoch). */
  t: number;
  outputStepSeconds: number;
  playing: boolean;
  speed: PlaybackSpeed;
  loop: boolean;
  /** Shadow stretches to shade on the time strip; null while the events load or when they failed. */
  shadows: ShadowInterval[] | null;
  onTogglePlay: () => void;
  onSeek: (t: number) => void;
  onSpeed: (speed: PlaybackSpeed) => void;
  onLoop: (loop: boolean) => void;
}

/** Play/pause, the time scrubber with its UTC label and shadow strip, the speed and loop choices. */
export function PlaybackControls(props: PlaybackControlsProps) {
  const { tStart, tEnd, t } = props;
  const speedId = useId();
  const loopId = useId();
  const span = tEnd - tStart;
  const percent = (x: number) => (span > 0 ? ((x - tStart) / span) * 100 : 0);
  const label = utcLabel(props.epochUtc, t);
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-3">
      <Button variant="primary" size="sm" className="w-20" onClick={props.onTogglePlay}>
        {props.playing ? 'Pause' : 'Play'}
      </Button>
      <div className="min-w-[16rem] flex-1">
        <input
          type="range"
          aria-label="Playback time"
          aria-valuetext={label}
          min={tStart}
          max={tEnd}
          step="any"
          value={t}
          onChange={(e) => props.onSeek(Number(e.currentTarget.value))}
          className="block w-full accent-sodium-strong"
        />
        <div aria-hidden="true" className="relative mt-1 h-2 overflow-hidden rounded-sm bg-paper-sunk">
          {props.shadows?.map((s, i) => (
            <span
              key={i}
              className={s.depth === 'umbra' ? 'absolute inset-y-0 bg-ink' : 'absolute inset-y-0 bg-ink-soft/50'}
              style={{ left: `${percent(s.fromT)}%`, width: `${Math.max(0.2, percent(s.toT) - percent(s.fromT))}%` }}
            />
          ))}
        </div>
      </div>
      <output className="w-[13.5rem] font-mono text-sm tabular-nums text-ink" aria-label="Playback time (UTC)">
        {label}
      </output>
      <div className="flex items-center gap-2">
        <label htmlFor={speedId} className="text-sm text-ink-soft">
          Speed
        </label>
        <select
          id={speedId}
          value={props.speed}
          onChange={(e) => props.onSpeed(Number(e.currentTarget.value) as PlaybackSpeed)}
          className="h-8 rounded-md border border-rule-strong bg-paper-raised px-2 text-sm"
        >
          {playbackSpeeds.map((s) => (
            <option key={s} value={s}>
              {s}× ({formatRate(playbackRate(props.outputStepSeconds, s))})
            </option>
          ))}
        </select>
      </div>
      <div className="flex items-center gap-2">
        <input id={loopId} type="checkbox" checked={props.loop} onChange={(e) => props.onLoop(e.currentTarget.checked)} className="size-4 accent-sodium-strong" />
        <label htmlFor={loopId} className="text-sm text-ink-soft">
          Loop at the end
        </label>
      </div>
    </div>
  );
}
