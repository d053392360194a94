import { useId } from 'react';
import { studyCaseStatuses, type StudyCase, type StudyCaseStatus } from '@photon-ledger/shared';
import type { CaseTableQuery } from '../api/get-study-cases';
import { formatValue, lineLabel, lineUnit, pathUnit } from '../lib/study-format';

/** The case table with sortable headers and its filters (status, a line's range). */
export function CaseTable({
  cases,
  total,
  parameterPaths,
  lines,
  query,
  onQuery,
  bestIndex,
  paretoIndices,
  openIndex,
  onOpen,
}: {
  cases: readonly StudyCase[];
  total: number;
  parameterPaths: readonly string[];
  lines: readonly string[];
  query: CaseTableQuery;
  onQuery: (q: CaseTableQuery) => void;
  bestIndex: number | undefined;
  paretoIndices: ReadonlySet<number>;
  /** The case shown in the detail panel, if any. */
  openIndex?: number | undefined;
  /** Opens a case's detail (parameters, lines, comments); no row action without it. */
  onOpen?: ((c: StudyCase) => void) | undefined;
}) {
  const id = useId();
  const header = (key: string, label: string, unit: string) => {
    const active = query.sort === key;
    const next = active && query.dir === 'asc' ? 'desc' : 'asc';
    return (
      <th key={key} scope="col" aria-sort={active ? (query.dir === 'asc' ? 'ascending' : 'descending') : 'none'} className="py-1 text-right font-medium">
        <button type="button" onClick={() => onQuery({ ...query, sort: key, dir: next })} className="underline-offset-2 hover:underline focus-visible:underline">
          {label} <span className="text-ink-soft">({unit})</span> {active ? (query.dir === 'asc' ? '▲' : '▼') : ''}
        </button>
      </th>
    );
  };
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-status`} className="font-medium">
            Status
          </label>
          <select id={`${id}-status`} value={query.status ?? ''} onChange={(e) => onQuery({ ...query, status: (e.target.value || undefined) as StudyCaseStatus | undefined })} className="h-9 rounded-md border border-rule-strong bg-paper-raised px-2">
            <option value="">Any</option>
            {studyCaseStatuses.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-line`} className="font-medium">
            Range of line
          </label>
          <select id={`${id}-line`} value={query.line ?? lines[0] ?? ''} onChange={(e) => onQuery({ ...query, line: e.target.value })} className="h-9 rounded-md border border-rule-strong bg-paper-raised px-2">
            {lines.map((l) => (
              <option key={l} value={l}>
                {lineLabel(l)}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-min`} className="font-medium">
            Min ({lineUnit(query.line ?? lines[0] ?? '')})
          </label>
          <input id={`${id}-min`} inputMode="decimal" value={query.min ?? ''} onChange={(e) => onQuery({ ...query, line: query.line ?? lines[0], min: e.target.value })} className="h-9 w-32 rounded-md border border-rule-strong bg-paper-raised px-2 font-mono" />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-max`} className="font-medium">
            Max ({lineUnit(query.line ?? lines[0] ?? '')})
          </label>
          <input id={`${id}-max`} inputMode="decimal" value={query.max ?? ''} onChange={(e) => onQuery({ ...query, line: query.line ?? lines[0], max: e.target.value })} className="h-9 w-32 rounded-md border border-rule-strong bg-paper-raised px-2 font-mono" />
        </div>
        <p className="ml-auto font-mono text-xs text-ink-soft">
          {cases.length < total ? `first ${cases.length} of ${total}` : `${total}`} cases
        </p>
      </div>
      <div className="max-h-[28rem] overflow-auto rounded-md border border-rule">
        <table className="w-full text-left text-sm">
          <thead className="sticky top-0 bg-paper-raised text-xs">
            <tr>
              {header('index', 'Case', '#')}
              <th scope="col" className="py-1 pl-3 font-medium">
                Status
              </th>
              {parameterPaths.map((p) => header(`param:${p}`, p.replace(/^vehicle\.|^scenario\./, ''), pathUnit(p)))}
              {lines.map((l) => header(`line:${l}`, l, lineUnit(l)))}
              {onOpen && (
                <th scope="col" className="py-1 pr-2 pl-3 text-right font-medium">
                  <span className="sr-only">Details</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody className="font-mono">
            {cases.map((c) => (
              <tr key={c.index} className={`border-t border-rule ${c.index === bestIndex ? 'bg-sodium/15' : ''} ${c.index === openIndex ? 'outline-2 -outline-offset-2 outline-ink' : ''}`}>
                <td className="py-1.5 pr-2 text-right">
                  {c.index}
                  {c.index === bestIndex && <span className="ml-1 font-sans text-xs">(best)</span>}
                  {paretoIndices.has(c.index) && <span className="ml-1 font-sans text-xs text-ink-soft">◆</span>}
                </td>
                <td className="py-1.5 pl-3 font-sans" title={c.errorMessage ?? undefined}>
                  {c.status}
                </td>
                {parameterPaths.map((p) => (
                  <td key={p} className="py-1.5 pr-2 text-right">
                    {formatValue(c.parameters[p])}
                  </td>
                ))}
                {lines.map((l) => (
                  <td key={l} className="py-1.5 pr-2 text-right">
                    {formatValue(c.lines?.[l])}
                  </td>
                ))}
                {onOpen && (
                  <td className="py-1 pr-2 pl-3 text-right font-sans">
                    <button
                      type="button"
                      onClick={() => onOpen(c)}
                      aria-pressed={c.index === openIndex}
                      aria-label={`Open case ${c.index}`}
                      className="rounded px-2 py-0.5 text-xs underline decoration-rule-strong underline-offset-2 hover:bg-paper-sunk focus-visible:outline-2 focus-visible:outline-sodium"
                    >
                      Open
                    </button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
        {cases.length === 0 && <p className="p-3 text-sm text-ink-soft">No case matches these filters.</p>}
      </div>
      <p className="text-xs text-ink-soft">◆ non-dominated (Pareto) for the chart's two lines; the highlighted row is the best case for the chosen line.</p>
    </div>
  );
}
