import { Link } from 'react-router-dom';
import { budgetLineKeys } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';

/** Lines of a budget by where they stand against the mission's requirements. */
export interface BudgetCounts {
  pass: number;
  fail: number;
  noRequirement: number;
  noValue: number;
}

/** Props of BudgetGlance. */
export interface BudgetGlanceProps {
  /** The latest succeeded run's counts; undefined while loading, null when no run has succeeded. */
  counts: BudgetCounts | null | undefined;
  /** The run they come from: its scenario and when it finished, and its page. */
  run?: { label: string; to: string } | undefined;
  /** How many lines carry a requirement (undefined while loading). */
  requirementCount: number | undefined;
  requirementsTo: string;
  /** Why the counts could not be read. */
  error?: string | undefined;
}

/**
 * The mission's budgets at a glance: how many lines of the latest succeeded run pass, fail or have
 * no requirement, with links to that run and to the requirements. Fixed height in every state.
 */
export function BudgetGlance({ counts, run, requirementCount, requirementsTo, error }: BudgetGlanceProps) {
  const cells: Array<{ label: string; value: number | undefined; tone: string }> = [
    { label: 'pass', value: counts?.pass, tone: 'text-sage-deep' },
    { label: 'fail', value: counts?.fail, tone: counts && counts.fail > 0 ? 'text-alarm' : 'text-ink' },
    { label: 'no requirement', value: counts?.noRequirement, tone: 'text-ink-soft' },
    { label: 'no value', value: counts?.noValue, tone: 'text-ink-soft' },
  ];
  return (
    <div className="flex min-h-24 flex-col gap-3 rounded-lg border border-rule bg-paper-raised p-4 md:flex-row md:items-center md:justify-between">
      <div className="flex flex-col gap-1 text-sm">
        <p className="font-medium">
          {counts === null
            ? 'No run has succeeded yet.'
            : error
              ? 'The latest budget could not be read.'
              : 'Latest succeeded run'}
        </p>
        <p className="text-xs text-ink-soft">
          {error ??
            (run ? (
              <Link to={run.to} className="underline underline-offset-2 hover:text-ink">
                {run.label}
              </Link>
            ) : counts === null ? (
              'Start a run from a scenario to see its budget here.'
            ) : (
              <span aria-hidden="true" className="inline-block h-3 w-48 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
            ))}
        </p>
        <p className="text-xs text-ink-soft">
          {requirementCount === undefined ? (
            '\u00a0'
          ) : (
            <Link to={requirementsTo} className="underline underline-offset-2 hover:text-ink">
              {requirementCount} of {budgetLineKeys.length} budget lines carry a requirement
            </Link>
          )}
        </p>
      </div>
      {counts !== null && (
        <dl className="grid grid-cols-4 gap-2" aria-busy={counts === undefined || undefined}>
          {cells.map((cell) => (
            <div key={cell.label} className="flex min-w-20 flex-col-reverse items-center rounded-md bg-paper-sunk/60 px-3 py-2">
              <dt className="text-[11px] text-ink-soft">{cell.label}</dt>
              <dd className={cx('font-mono text-xl font-semibold tabular-nums', cell.tone)}>{cell.value ?? '–'}</dd>
            </div>
          ))}
        </dl>
      )}
    </div>
  );
}
