import { Fragment, useId, useState, type FormEvent } from 'react';
import {
  fieldErrors,
  requirementUpsertSchema,
  type BudgetLineKey,
  type MissionRequirement,
} from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { formatUtcDate } from '../../../lib/format';
import { useDeleteRequirement } from '../api/delete-requirement';
import { useSetRequirement } from '../api/set-requirement';
import { budgetLineGroups, budgetLineLabels, comparatorSign, formatValue, lineUnit } from '../lib/budget-lines';

/** Props of RequirementsTable. */
export interface RequirementsTableProps {
  missionId: string;
  requirements: readonly MissionRequirement[];
  /** Leads set and remove requirements; everybody else reads. */
  canEdit: boolean;
}

/**
 * Every budget line with the mission's requirement on it (comparator, value in the line's unit,
 * minimum margin, note). Leads open an editor under a line to set, change or remove it.
 */
export function RequirementsTable({ missionId, requirements, canEdit }: RequirementsTableProps) {
  const [editing, setEditing] = useState<BudgetLineKey | null>(null);
  const byLine = new Map(requirements.map((r) => [r.line, r]));
  const columns = canEdit ? 6 : 5;

  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full min-w-[46rem] text-left text-sm">
        <caption className="sr-only">Requirements on budget lines</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Budget line</th>
            <th scope="col" className="px-3 py-2 font-medium">Requirement</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Min. margin</th>
            <th scope="col" className="px-3 py-2 font-medium">Note</th>
            <th scope="col" className="px-3 py-2 font-medium">Set</th>
            {canEdit && (
              <th scope="col" className="px-3 py-2 font-medium">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        {budgetLineGroups.map((group) => (
          <tbody key={group.title} className="divide-y divide-rule border-b border-rule last:border-b-0">
            <tr className="bg-paper-sunk/50">
              <th scope="colgroup" colSpan={columns} className="px-3 py-1.5 text-xs font-semibold tracking-wide text-ink-soft uppercase">
                {group.title}
              </th>
            </tr>
            {group.lines.map((line) => {
              const requirement = byLine.get(line);
              const open = editing === line;
              return (
                <Fragment key={line}>
                  <tr className={cx('h-11', open && 'bg-sodium-wash/40')}>
                    <th scope="row" className="px-3 py-2 font-medium">
                      <span className="block">{budgetLineLabels[line]}</span>
                      <span className="block font-mono text-[11px] font-normal text-ink-soft">{line}</span>
                    </th>
                    <td className="px-3 py-2 font-mono whitespace-nowrap">
                      {requirement ? (
                        <>
                          {comparatorSign(requirement.comparator)} {formatValue(requirement.value)}{' '}
                          <span className="text-ink-soft">{lineUnit(line)}</span>
                        </>
                      ) : (
                        <span className="font-sans text-xs text-ink-soft">
                          none <span className="font-mono">({lineUnit(line)})</span>
                        </span>
                      )}
                    </td>
                    <td className="px-3 py-2 text-right font-mono whitespace-nowrap">
                      {requirement ? `${formatValue(requirement.minMarginPercent)} %` : <span className="text-ink-soft">—</span>}
                    </td>
                    <td className="max-w-64 px-3 py-2 text-xs text-ink-soft">{requirement?.note || ''}</td>
                    <td className="px-3 py-2 font-mono text-xs whitespace-nowrap text-ink-soft">
                      {requirement && <time dateTime={requirement.updatedAt}>{formatUtcDate(requirement.updatedAt)}</time>}
                    </td>
                    {canEdit && (
                      <td className="px-3 py-2 text-right">
                        {!open && (
                          <Button
                            size="sm"
                            variant="quiet"
                            onClick={() => setEditing(line)}
                            aria-label={`${requirement ? 'Edit' : 'Set'} requirement on ${budgetLineLabels[line]}`}
                          >
                            {requirement ? 'Edit' : 'Set'}
                          </Button>
                        )}
                      </td>
                    )}
                  </tr>
                  {open && (
                    <tr className="bg-sodium-wash/40">
                      <td colSpan={columns} className="px-3 pt-1 pb-4">
                        <RequirementEditor
                          missionId={missionId}
                          line={line}
                          current={requirement}
                          onDone={() => setEditing(null)}
                        />
                      </td>
                    </tr>
                  )}
                </Fragment>
              );
            })}
          </tbody>
        ))}
      </table>
    </div>
  );
}

/** A typed number: undefined when blank, NaN when not a number. */
function parseNumber(value: string): number | undefined {
  const trimmed = value.trim();
  if (trimmed === '') return undefined;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(trimmed)) return Number.NaN;
  return Number(trimmed);
}

interface RequirementEditorProps {
  missionId: string;
  line: BudgetLineKey;
  current: MissionRequirement | undefined;
  onDone: () => void;
}

/** Sets one line's requirement, checked with the shared schema before it is sent. */
function RequirementEditor({ missionId, line, current, onDone }: RequirementEditorProps) {
  const id = useId();
  const [comparator, setComparator] = useState<'<=' | '>='>(current?.comparator ?? '<=');
  const [value, setValue] = useState(current ? String(current.value) : '');
  const [margin, setMargin] = useState(current ? String(current.minMarginPercent) : '0');
  const [note, setNote] = useState(current?.note ?? '');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const save = useSetRequirement(missionId);
  const remove = useDeleteRequirement(missionId);
  const unit = lineUnit(line);
  const label = budgetLineLabels[line];

  async function submit(event: FormEvent) {
    event.preventDefault();
    setMessage(null);
    const parsed = requirementUpsertSchema.safeParse({
      line,
      comparator,
      value: parseNumber(value),
      minMarginPercent: parseNumber(margin),
      ...(note.trim() ? { note } : {}),
    });
    if (!parsed.success) {
      setErrors(fieldErrors(parsed.error));
      return;
    }
    setErrors({});
    const { line: _line, unit: _unit, ...input } = parsed.data;
    try {
      await save.mutateAsync({ line, input });
      onDone();
    } catch (error) {
      if (error instanceof ApiRequestError && error.fields) setErrors(error.fields);
      setMessage(error instanceof Error ? error.message : 'The requirement was not saved.');
    }
  }

  async function removeRequirement() {
    setMessage(null);
    try {
      await remove.mutateAsync(line);
      onDone();
    } catch (error) {
      setMessage(error instanceof Error ? error.message : 'The requirement was not removed.');
    }
  }

  const input = (error: string | undefined) =>
    cx(
      'h-9 rounded-md border bg-paper-raised px-2.5 font-mono text-sm focus-visible:border-sodium',
      error ? 'border-alarm' : 'border-rule-strong',
    );
  const fieldError = (key: string) =>
    errors[key] ? (
      <p id={`${id}-${key}-error`} className="text-xs font-medium text-alarm">
        {errors[key]}
      </p>
    ) : null;
  const busy = save.isPending || remove.isPending;

  return (
    <form noValidate onSubmit={submit} aria-label={`Requirement on ${label}`} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-start gap-4">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-comparator`} className="text-sm font-medium">
            Comparator
          </label>
          <select
            id={`${id}-comparator`}
            value={comparator}
            onChange={(event) => setComparator(event.target.value as '<=' | '>=')}
            className={cx(input(errors.comparator), 'font-sans')}
          >
            <option value="<=">≤ at most (a ceiling)</option>
            <option value=">=">≥ at least (a floor)</option>
          </select>
          {fieldError('comparator')}
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-value`} className="text-sm font-medium">
            Value<span className="sr-only"> ({unit})</span>
          </label>
          <div className="flex items-center gap-1.5">
            <input
              id={`${id}-value`}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              value={value}
              onChange={(event) => setValue(event.target.value)}
              aria-invalid={errors.value || errors.unit ? true : undefined}
              aria-describedby={errors.value ? `${id}-value-error` : undefined}
              className={cx(input(errors.value), 'w-36')}
              autoFocus
            />
            <span aria-hidden="true" className="flex h-9 min-w-10 items-center justify-center rounded-md bg-paper-sunk px-2 font-mono text-xs text-ink-soft">
              {unit}
            </span>
          </div>
          {fieldError('value')}
          {fieldError('unit')}
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-margin`} className="text-sm font-medium">
            Minimum margin<span className="sr-only"> (%)</span>
          </label>
          <div className="flex items-center gap-1.5">
            <input
              id={`${id}-margin`}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              value={margin}
              onChange={(event) => setMargin(event.target.value)}
              aria-invalid={errors.minMarginPercent ? true : undefined}
              aria-describedby={errors.minMarginPercent ? `${id}-minMarginPercent-error` : undefined}
              className={cx(input(errors.minMarginPercent), 'w-24')}
            />
            <span aria-hidden="true" className="flex h-9 min-w-10 items-center justify-center rounded-md bg-paper-sunk px-2 font-mono text-xs text-ink-soft">
              %
            </span>
          </div>
          {fieldError('minMarginPercent')}
        </div>
        <div className="flex min-w-56 flex-1 flex-col gap-1">
          <label htmlFor={`${id}-note`} className="text-sm font-medium">
            Note
          </label>
          <input
            id={`${id}-note`}
            type="text"
            value={note}
            maxLength={2000}
            placeholder="Source document or rationale"
            onChange={(event) => setNote(event.target.value)}
            aria-invalid={errors.note ? true : undefined}
            aria-describedby={errors.note ? `${id}-note-error` : undefined}
            className={cx(input(errors.note), 'font-sans')}
          />
          {fieldError('note')}
        </div>
      </div>
      {message && (
        <p role="alert" className="text-sm text-alarm">
          {message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="primary" size="sm" disabled={busy}>
          {save.isPending ? 'Saving…' : 'Save requirement'}
        </Button>
        <Button size="sm" onClick={onDone} disabled={busy}>
          Cancel
        </Button>
        {current && (
          <Button size="sm" variant="quiet" className="text-alarm" onClick={() => void removeRequirement()} disabled={busy}>
            {remove.isPending ? 'Removing…' : 'Remove requirement'}
          </Button>
        )}
      </div>
    </form>
  );
}
