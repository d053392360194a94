import type { Run } from '@photon-ledger/shared';
import { formatDuration, secondsBetween } from '../lib/format-time';
import { useNow } from '../lib/use-now';
import { RunProgressBar } from './run-progress-bar';

/** Props of RunLivePanel. */
export interface RunLivePanelProps {
  run: Run;
  /** Clock for the elapsed time (tests pass a fixed one). */
  now?: number;
}

/** Progress of a queued or running run: bar with percentage, worker, attempts and elapsed time. */
export function RunLivePanel({ run, now: fixedNow }: RunLivePanelProps) {
  const tickingNow = useNow(fixedNow === undefined);
  const now = fixedNow ?? tickingNow;
  const queued = run.status === 'queued';
  const elapsed = queued ? secondsBetween(run.queuedAt, null, now) : secondsBetween(run.startedAt, null, now);
  const sinceHeartbeat = secondsBetween(run.heartbeatAt, null, now);
  return (
    <div className="flex flex-col gap-4 rounded-lg border border-rule bg-paper-raised p-4 sm:p-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-base font-semibold">
          {queued ? 'Waiting for a worker' : run.cancelRequested ? 'Cancelling…' : 'Propagating the orbit'}
        </p>
        <p className="text-xs text-ink-soft">Refreshes every second.</p>
      </div>
      <RunProgressBar progress={run.progress} waiting={queued} size="lg" label="Run progress" />
      <dl className="grid grid-cols-2 gap-x-6 gap-y-3 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-xs text-ink-soft">{queued ? 'Waiting for' : 'Elapsed'}</dt>
          <dd className="font-mono tabular-nums">{elapsed === null ? '—' : formatDuration(elapsed)}</dd>
        </div>
        <div>
          <dt className="text-xs text-ink-soft">Last heartbeat</dt>
          <dd className="font-mono tabular-nums">{sinceHeartbeat === null ? '—' : `${formatDuration(sinceHeartbeat)} ago`}</dd>
        </div>
        <div className="min-w-0">
          <dt className="text-xs text-ink-soft">Worker</dt>
          <dd className="truncate font-mono" title={run.workerId ?? undefined}>
            {run.workerId ?? 'none yet'}
          </dd>
        </div>
        <div>
          <dt className="text-xs text-ink-soft">Attempts</dt>
          <dd className="font-mono tabular-nums">
            {run.attempts}
            {run.attempts > 1 && <span className="ml-1 font-sans text-xs text-ink-soft">(a worker stopped; picked up again)</span>}
          </dd>
        </div>
      </dl>
    </div>
  );
}
