import { Fragment } from 'react';
import type { BudgetLineResult, RunBudgetReport } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';
import { formatNumber, formatPercent, formatQuantity, superscript } from '../lib/format-number';
import { formatDuration, formatUtc } from '../lib/format-time';
import { BudgetStatusBadge } from './budget-status-badge';

const groups: ReadonlyArray<{ prefix: string; title: string }> = [
  { prefix: 'srp.accel.', title: 'SRP acceleration' },
  { prefix: 'srp.deltaV.', title: 'Delta-v' },
  { prefix: 'drift.', title: 'Orbit drift' },
  { prefix: 'torque.', title: 'SRP torque' },
  { prefix: 'momentum.', title: 'Wheel momentum' },
  { prefix: 'sail.', title: 'Solar sail' },
];

/** Significant figures of budget values. */
const BUDGET_DIGITS = 4;

/** The value of a budget line with its unit; durations in seconds also read as days and hours. */
export function formatBudgetValue(line: Pick<BudgetLineResult, 'value' | 'unit'>): string {
  if (line.value === null) return '—';
  const text = formatQuantity(line.value, line.unit, { digits: BUDGET_DIGITS });
  return line.unit === 's' && Math.abs(line.value) >= 120 ? `${text} (${formatDuration(line.value)})` : text;
}

/** `≤ 2.000 × 10⁻⁷ m/s²`, with the margin the requirement asks for. */
export function formatRequirement(line: Pick<BudgetLineResult, 'requirement' | 'unit'>): string {
  const req = line.requirement;
  if (!req) return '—';
  const comparator = req.comparator === '<=' ? '≤' : '≥';
  return `${comparator} ${formatQuantity(req.value, line.unit, { digits: BUDGET_DIGITS })}`;
}

/** API text with plain-ASCII units and symbols (`N*m*s`, `|tau|`, `m/s^2`) in typographic form. */
export function prettyText(text: string): string {
  return text
    .replace(/\|tau\|/g, '|τ|')
    .replace(/([A-Za-z])\*(?=[A-Za-z])/g, '$1·')
    .replace(/\^(-?\d+)/g, (_m, exp: string) => superscript(Number(exp)));
}

/** Props of BudgetTable. */
export interface BudgetTableProps {
  budget: RunBudgetReport;
}

/** The run's budget lines against the mission's requirements: counts, then one row per line grouped by subject. */
export function BudgetTable({ budget }: BudgetTableProps) {
  const { counts } = budget;
  const grouped = groups
    .map((group) => ({ ...group, lines: budget.lines.filter((l) => l.key.startsWith(group.prefix)) }))
    .filter((group) => group.lines.length > 0);
  const other = budget.lines.filter((l) => !groups.some((g) => l.key.startsWith(g.prefix)));
  if (other.length > 0) grouped.push({ prefix: '', title: 'Other', lines: other });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-x-5 gap-y-2 text-sm">
        <ul aria-label="Budget lines by status" className="flex flex-wrap gap-2">
          <CountChip tone="pass" count={counts.pass} label="pass" />
          <CountChip tone="fail" count={counts.fail} label="fail" />
          <CountChip tone="none" count={counts.noRequirement} label="no requirement" />
          <CountChip tone="none" count={counts.noValue} label="no value" />
        </ul>
        <p className="text-xs text-ink-soft">
          Requirements as of <time dateTime={budget.requirementsAsOf}>{formatUtc(budget.requirementsAsOf, { seconds: false })}</time>;
          they apply to this run when read.
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
        <table className="w-full min-w-[44rem] text-left text-sm">
          <caption className="sr-only">Budget lines with value, requirement, margin and status</caption>
          <thead className="border-b border-rule text-xs text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">
                Line
              </th>
              <th scope="col" className="px-3 py-2 text-right font-medium">
                Value
              </th>
              <th scope="col" className="px-3 py-2 text-right font-medium">
                Requirement
              </th>
              <th scope="col" className="px-3 py-2 text-right font-medium">
                Margin
              </th>
              <th scope="col" className="px-3 py-2 font-medium">
                Status
              </th>
            </tr>
          </thead>
          <tbody>
            {grouped.map((group) => (
              <Fragment key={group.title}>
                <tr className="border-t border-rule bg-paper-sunk/50">
                  <th scope="rowgroup" colSpan={5} className="px-3 py-1.5 text-xs font-semibold tracking-wide text-ink-soft uppercase">
                    {group.title}
                  </th>
                </tr>
                {group.lines.map((line) => (
                  <BudgetRow key={line.key} line={line} />
                ))}
              </Fragment>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function BudgetRow({ line }: { line: BudgetLineResult }) {
  const failed = line.status === 'fail';
  return (
    <tr className={cx('border-t border-rule/70 align-top', failed && 'bg-alarm-wash/40')}>
      <th scope="row" className="px-3 py-2 font-normal">
        <span className="text-ink">{prettyText(line.label)}</span>
        {line.note && <span className="mt-0.5 block text-xs text-ink-soft">{prettyText(line.note)}</span>}
      </th>
      <td className="px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums">
        {line.value === null ? <span className="text-ink-soft">no value</span> : formatBudgetValue(line)}
      </td>
      <td className="px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums">
        {line.requirement ? (
          <>
            {formatRequirement(line)}
            {line.requirement.minMarginPercent > 0 && (
              <span className="block text-xs text-ink-soft">
                margin ≥ {formatNumber(line.requirement.minMarginPercent, { digits: 3 })} %
              </span>
            )}
          </>
        ) : (
          <span className="text-ink-soft">—</span>
        )}
      </td>
      <td className={cx('px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums', failed && 'font-semibold text-alarm')}>
        {line.marginPercent === undefined ? <span className="text-ink-soft">—</span> : formatPercent(line.marginPercent)}
      </td>
      <td className="px-3 py-2">
        <BudgetStatusBadge status={line.status} />
      </td>
    </tr>
  );
}

function CountChip({ tone, count, label }: { tone: 'pass' | 'fail' | 'none'; count: number; label: string }) {
  return (
    <li
      className={cx(
        'rounded-md border px-2.5 py-1',
        tone === 'pass' && (count > 0 ? 'border-sage/50 bg-sage-wash text-sage-deep' : 'border-rule bg-paper-raised text-ink-soft'),
        tone === 'fail' && (count > 0 ? 'border-alarm/50 bg-alarm-wash font-semibold text-alarm' : 'border-rule bg-paper-raised text-ink-soft'),
        tone === 'none' && 'border-rule bg-paper-raised text-ink-soft',
      )}
    >
      <span className="font-mono tabular-nums">{count}</span> {label}
    </li>
  );
}
