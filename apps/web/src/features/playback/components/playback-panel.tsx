import { useId, useMemo, type KeyboardEvent } from 'react';
import { MAX_SERIES_POINTS, type RunSummary } from '@photon-ledger/shared';
import { parseUtcEpoch } from '@photon-ledger/srp-core';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { usePlaybackEvents } from '../api/get-playback-events';
import { usePlaybackSeries } from '../api/get-playback-series';
import { sunDirectionEci } from '../lib/ephemeris';
import { formatQuantity } from '../lib/format-quantity';
import { stepClock } from '../lib/playback-clock';
import { arrowScale } from '../lib/scales';
import {
  createPlaybackState,
  maxNorm,
  playbackColumns,
  playbackDataFromSeries,
  playbackMaxPoints,
  stateAt,
  type PlaybackData,
} from '../lib/series-track';
import { shadowIntervals } from '../lib/shadow-intervals';
import { BodyView } from './body-view';
import { OrbitView } from './orbit-view';
import { PlaybackControls } from './playback-controls';
import { PlaybackReadouts } from './playback-readouts';
import { usePlaybackClock } from './use-playback-clock';
import { WebglBoundary } from './webgl-boundary';

/** Props of the 3D playback of a succeeded run (loaded lazily by the run page). */
export interface PlaybackPanelProps {
  missionId: string;
  runId: string;
  summary: RunSummary;
}

/** Height of the whole player and of the loading, empty and error states alike (PLAYBACK_PANEL_HEIGHT_PX), so the page does not jump. */
const STAGE = 'lg:h-[700px] max-lg:min-h-[420px]';
/** Height of the views and readouts inside the player. */
const VIEWS = 'lg:h-[610px]';

/** 3D playback of a run: orbit view and body view driven by a time scrubber. */
export default function PlaybackPanel({ missionId, runId, summary }: PlaybackPanelProps) {
  const missing = playbackColumns.filter((c) => !summary.columns.includes(c));
  const enough = summary.sampleCount >= 2 && missing.length === 0;
  const series = usePlaybackSeries({
    missionId,
    runId,
    columns: playbackColumns,
    maxPoints: playbackMaxPoints(summary.sampleCount, MAX_SERIES_POINTS),
  });
  const events = usePlaybackEvents(missionId, runId);
  const data = useMemo(() => (series.data ? playbackDataFromSeries(series.data) : null), [series.data]);

  let body;
  if (!enough) {
    body = (
      <div className={`${STAGE} flex items-center justify-center rounded-md border border-dashed border-rule-strong px-6 text-center text-sm text-ink-soft`}>
        {missing.length > 0
          ? `This run does not store ${missing.join(', ')}, so it cannot be played back.`
          : 'This run has fewer than two samples: there is nothing to play back.'}
      </div>
    );
  } else if (series.isError) {
    body = (
      <div className={STAGE}>
        <ErrorState title="Could not load the run for playback" error={series.error} onRetry={() => void series.refetch()} retrying={series.isFetching} />
      </div>
    );
  } else if (!data) {
    body = (
      <div className={`${STAGE} flex items-center justify-center rounded-md bg-paper-sunk`}>
        <LoadingState label="Loading the trajectory for playback…" />
      </div>
    );
  } else {
    body = <PlaybackStage summary={summary} data={data} events={events.data?.events ?? null} eventsFailed={events.isError} />;
  }

  return body;
}

interface PlaybackStageProps {
  summary: RunSummary;
  data: PlaybackData;
  events: PlaybackEventList | null;
  eventsFailed: boolean;
}

type PlaybackEventList = Parameters<typeof shadowIntervals>[0];

function PlaybackStage({ summary, data, events, eventsFailed }: PlaybackStageProps) {
  const orbitCaptionId = useId();
  const bodyCaptionId = useId();
  const step = summary.outputStepSeconds > 0 ? summary.outputStepSeconds : (data.tEnd - data.tStart) / 100;
  const clock = usePlaybackClock({ tStart: data.tStart, tEnd: data.tEnd, outputStepSeconds: step });
  const epoch = useMemo(() => parseUtcEpoch(summary.epochUtc), [summary.epochUtc]);
  const state = useMemo(() => stateAt(createPlaybackState(), data, clock.t), [data, clock.t]);
  const earth = summary.centralBody === 'earth';
  const sunDir = useMemo(() => (earth ? sunDirectionEci(epoch, clock.t) : null), [earth, epoch, clock.t]);
  const massKg = summary.vehicle.massKg;
  const forceScale = useMemo(() => arrowScale(massKg * maxNorm(data.srpAccelBody)), [data, massKg]);
  const torqueScale = useMemo(() => arrowScale(maxNorm(data.srpTorqueBody)), [data]);
  const shadows = useMemo(() => (events ? shadowIntervals(events, data.tStart, data.tEnd) : null), [events, data]);
  const forceBodyN = useMemo(
    () => state.srpAccelBodyMps2.map((a) => a * massKg) as [number, number, number],
    [state, massKg],
  );

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const target = e.target as HTMLElement;
    // Buttons, lists and boxes keep their own keys; the panel and the scrubber take these.
    const own = target === e.currentTarget || (target instanceof HTMLInputElement && target.type === 'range') || target.closest('[data-playback-view]');
    if (!own) return;
    const big = e.shiftKey ? 10 : 1;
    let next: number | null = null;
    switch (e.key) {
      case ' ':
        e.preventDefault();
        clock.togglePlay();
        return;
      case 'ArrowRight':
      case 'ArrowUp':
        next = stepClock(clock.t, big, step, data.tStart, data.tEnd);
        break;
      case 'ArrowLeft':
      case 'ArrowDown':
        next = stepClock(clock.t, -big, step, data.tStart, data.tEnd);
        break;
      case 'PageUp':
        next = clock.t + (data.tEnd - data.tStart) / 10;
        break;
      case 'PageDown':
        next = clock.t - (data.tEnd - data.tStart) / 10;
        break;
      case 'Home':
        next = data.tStart;
        break;
      case 'End':
        next = data.tEnd;
        break;
      default:
        return;
    }
    e.preventDefault();
    clock.seek(next);
  };

  return (
    <div
      role="group"
      aria-label="Playback: space plays or pauses, arrow keys step one output step (with Shift ten)"
      tabIndex={0}
      onKeyDown={onKeyDown}
      className={`space-y-3 rounded-md ${STAGE}`}
    >
      <div className={`grid gap-4 lg:grid-cols-[minmax(0,1fr)_25rem] ${VIEWS}`}>
        <figure className="flex min-h-0 flex-col">
          <div data-playback-view className="relative min-h-[360px] flex-1 overflow-hidden rounded-md bg-ink">
            <WebglBoundary view="Orbit view">
              <OrbitView
                centralBody={summary.centralBody}
                data={data}
                state={state}
                epoch={epoch}
                sunDirectionEci={sunDir}
                describedBy={orbitCaptionId}
              />
            </WebglBoundary>
          </div>
          <figcaption id={orbitCaptionId} className="mt-2 text-xs leading-relaxed text-ink-soft">
            {earth ? (
              <>
                Orbit view (drag to turn, scroll to zoom) in inertial axes, {summary.frame}; Earth to scale (radius 6378 km). White: the stored path. Orange arrow:
                direction to the Sun (srp-core ephemeris). Dark cylinder: the Earth’s shadow drawn as a cylinder for display (the run
                used the scenario’s shadow model). Pale arrow: nadir. The vehicle marker dims as its illuminated fraction falls below 1.
              </>
            ) : (
              <>
                Orbit view (drag to turn, scroll to zoom) in heliocentric inertial axes, {summary.frame}. White: the stored path; grey: one orbit each of Venus, the
                Earth and Mars from the epoch (srp-core ephemeris), planets not to scale; the Sun is to scale inside its halo. Green
                arrows along the path and the orange arrow at the vehicle: direction of the SRP acceleration, which is the sail normal
                for an ideal sail only.
              </>
            )}
          </figcaption>
        </figure>
        <div className="flex min-h-0 flex-col gap-3">
          <figure className="flex flex-col">
            <div data-playback-view className="relative h-[230px] overflow-hidden rounded-md bg-ink">
              <WebglBoundary view="Body view">
                <BodyView
                  forceBodyN={forceBodyN}
                  torqueBodyNm={state.srpTorqueBodyNm}
                  forceScale={forceScale}
                  torqueScale={torqueScale}
                  describedBy={bodyCaptionId}
                />
              </WebglBoundary>
            </div>
            <figcaption id={bodyCaptionId} className="mt-2 text-xs leading-relaxed text-ink-soft">
              Body view, body axes (unit length). Orange: SRP force F = m·a_srp, axis length ={' '}
              {forceScale.perAxisLength > 0 ? formatQuantity(forceScale.perAxisLength, 'N', 2) : '– (no SRP force)'}. Green: SRP torque,
              axis length = {torqueScale.perAxisLength > 0 ? formatQuantity(torqueScale.perAxisLength, 'N·m', 2) : '– (no SRP torque)'}.
              The run stores no attitude, so the Sun is not drawn in body axes; see the orbit view.
            </figcaption>
          </figure>
          <PlaybackReadouts epochUtc={summary.epochUtc} centralBody={summary.centralBody} state={state} massKg={massKg} sunDirectionEci={sunDir} />
          <p className="text-xs text-ink-soft">
            {data.decimated
              ? `The run has ${data.rowsInRange.toLocaleString('en-GB')} samples; the playback reads the extremes of ${Math.floor(data.pointCount / 2).toLocaleString('en-GB')} time buckets per column, so values between them are approximate.`
              : `Between the ${data.pointCount.toLocaleString('en-GB')} stored samples, positions are interpolated with their velocities (cubic Hermite), the other values linearly.`}
          </p>
        </div>
      </div>
      <PlaybackControls
        epochUtc={summary.epochUtc}
        tStart={data.tStart}
        tEnd={data.tEnd}
        t={clock.t}
        outputStepSeconds={step}
        playing={clock.playing}
        speed={clock.speed}
        loop={clock.loop}
        shadows={shadows}
        onTogglePlay={clock.togglePlay}
        onSeek={clock.seek}
        onSpeed={clock.setSpeed}
        onLoop={clock.setLoop}
      />
      <p className="text-xs text-ink-soft">
        {eventsFailed
          ? 'The run’s events could not be loaded, so shadow passes are not marked under the scrubber.'
          : shadows && shadows.length === 0
            ? 'The run’s located events hold no shadow pass.'
            : 'Under the scrubber: shadow passes from the run’s located events (dark: umbra or antumbra, grey: penumbra).'}
      </p>
    </div>
  );
}
