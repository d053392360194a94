import { useEffect, useRef, type ReactNode } from 'react';
import type { StudyCase } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { formatValue, lineLabel, lineUnit, pathUnit } from '../lib/study-format';

/** One case of a study: its parameters, its budget lines, and (from the page) its comment thread. */
export function CaseDetail({
  studyCase,
  parameterPaths,
  lines,
  best,
  pareto,
  onClose,
  children,
}: {
  studyCase: StudyCase;
  parameterPaths: readonly string[];
  lines: readonly string[];
  best: boolean;
  pareto: boolean;
  onClose: () => void;
  /** The case's comments, composed by the page. */
  children?: ReactNode;
}) {
  const headingRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    headingRef.current?.focus();
    headingRef.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' });
  }, [studyCase.index]);
  const c = studyCase;
  return (
    <section aria-labelledby="case-detail-heading" className="flex flex-col gap-4 rounded-lg border border-rule-strong bg-paper-raised p-4">
      <div className="flex flex-wrap items-center gap-3">
        <h3 id="case-detail-heading" ref={headingRef} tabIndex={-1} className="text-base font-semibold outline-none">
          Case #{c.index}
        </h3>
        <span className="text-sm text-ink-soft">
          {c.status}
          {best ? ' · best for the chosen line' : ''}
          {pareto ? ' · non-dominated' : ''}
        </span>
        <Button size="sm" variant="quiet" className="ml-auto" onClick={onClose}>
          Close case
        </Button>
      </div>
      {c.errorMessage && <p className="font-mono text-xs whitespace-pre-wrap text-alarm">{c.errorMessage}</p>}
      <div className="grid gap-6 md:grid-cols-2">
        <div>
          <h4 className="mb-1 text-sm font-semibold">Parameters</h4>
          <dl className="grid grid-cols-[1fr_max-content] gap-x-4 gap-y-1 text-sm">
            {parameterPaths.map((p) => (
              <div key={p} className="contents">
                <dt className="font-mono text-xs break-all text-ink-soft">{p}</dt>
                <dd className="text-right font-mono">
                  {formatValue(c.parameters[p])} <span className="font-sans text-xs text-ink-soft">{pathUnit(p)}</span>
                </dd>
              </div>
            ))}
          </dl>
        </div>
        <div>
          <h4 className="mb-1 text-sm font-semibold">Budget lines</h4>
          {c.lines ? (
            <dl className="grid grid-cols-[1fr_max-content] gap-x-4 gap-y-1 text-sm">
              {lines.map((l) => (
                <div key={l} className="contents">
                  <dt className="text-ink-soft">{lineLabel(l)}</dt>
                  <dd className="text-right font-mono">
                    {formatValue(c.lines?.[l])} <span className="font-sans text-xs text-ink-soft">{lineUnit(l)}</span>
                  </dd>
                </div>
              ))}
            </dl>
          ) : (
            <p className="text-sm text-ink-soft">No results for this case ({c.status}).</p>
          )}
        </div>
      </div>
      {children && (
        <div className="flex flex-col gap-2">
          <h4 className="text-sm font-semibold">Comments on this case</h4>
          {children}
        </div>
      )}
    </section>
  );
}
