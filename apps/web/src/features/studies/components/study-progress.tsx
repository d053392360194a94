import type { Study } from '@photon-ledger/shared';
import { Badge } from '../../../components/ui/badge';

const statusLabel: Record<Study['status'], string> = { running: 'Running', finished: 'Finished', cancelling: 'Cancelling', cancelled: 'Cancelled' };

export function StudyStatusBadge({ study }: { study: Study }) {
  return <Badge tone={study.status === 'finished' ? 'sage' : study.status === 'running' ? 'sodium' : 'ink'}>{statusLabel[study.status]}</Badge>;
}

/** Cases done over total, with the failures and cancellations counted. */
export function StudyProgress({ study }: { study: Study }) {
  const p = study.progress;
  const done = p.succeeded + p.failed + p.cancelled;
  return (
    <div className="flex flex-col gap-2">
      <div
        role="progressbar"
        aria-label="Cases done"
        aria-valuemin={0}
        aria-valuemax={p.total}
        aria-valuenow={done}
        className="h-2 w-full overflow-hidden rounded-full bg-paper-sunk"
      >
        <div className="h-full bg-sodium transition-[width]" style={{ width: `${(p.fractionDone * 100).toFixed(1)}%` }} />
      </div>
      <p className="font-mono text-xs text-ink-soft">
        {done} / {p.total} cases done · {p.succeeded} succeeded · {p.failed} failed · {p.cancelled} cancelled · {p.running} running · {p.queued} queued
      </p>
    </div>
  );
}
