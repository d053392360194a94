import type { RunStatus } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';

const statusLook: Record<RunStatus, { label: string; className: string; mark: string }> = {
  queued: { label: 'Queued', className: 'bg-ink-wash text-ink', mark: '○' },
  running: { label: 'Running', className: 'bg-sodium-wash text-sodium-deep', mark: '◐' },
  succeeded: { label: 'Succeeded', className: 'bg-sage-wash text-sage-deep', mark: '●' },
  failed: { label: 'Failed', className: 'bg-alarm-wash text-alarm', mark: '✕' },
  cancelled: { label: 'Cancelled', className: 'bg-paper-sunk text-ink-soft', mark: '–' },
};

/** The state of a run as text with a colour and a mark (never colour alone). */
export function RunStatusBadge({ status }: { status: RunStatus }) {
  const look = statusLook[status];
  return (
    <span className={cx('inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-medium', look.className)}>
      <span aria-hidden="true">{look.mark}</span>
      {look.label}
    </span>
  );
}
