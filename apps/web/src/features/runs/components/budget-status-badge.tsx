import type { BudgetLineResult } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';

type BudgetStatus = BudgetLineResult['status'];

const statusLook: Record<BudgetStatus, { label: string; mark: string; className: string }> = {
  pass: { label: 'Pass', mark: '✓', className: 'bg-sage-wash text-sage-deep' },
  fail: { label: 'Fail', mark: '✕', className: 'bg-alarm-wash text-alarm font-semibold' },
  'no-requirement': { label: 'No requirement', mark: '–', className: 'bg-ink-wash text-ink' },
  'no-value': { label: 'No value', mark: '∅', className: 'bg-paper-sunk text-ink-soft' },
};

/** Text of a budget line status, e.g. `No requirement`. */
export function budgetStatusLabel(status: BudgetStatus): string {
  return statusLook[status].label;
}

/** Where a budget line stands, as a mark and words on a colour (never colour alone). */
export function BudgetStatusBadge({ status }: { status: BudgetStatus }) {
  const look = statusLook[status];
  return (
    <span className={cx('inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-medium whitespace-nowrap', look.className)}>
      <span aria-hidden="true">{look.mark}</span>
      {look.label}
    </span>
  );
}
