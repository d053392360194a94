import { lazy, Suspense, useMemo } from 'react';
import { Link, useParams } from 'react-router-dom';
import { studyParamsSchema, type MissionRequirementList, type Study, type StudyStatistics } from '@photon-ledger/shared';
import { marginPercent, type BudgetComparator } from '@photon-ledger/srp-core';
import { Button } from '../../components/ui/button';
import { cautionText } from '../../components/ui/caution-footer';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useComments } from '../../features/comments/api/list-comments';
import { useMission } from '../../features/missions/api/get-mission';
import { useRequirements } from '../../features/requirements/api/list-requirements';
import { useReview } from '../../features/reviews/api/get-review';
import { ApprovalSection, ReportSection, reportPrintCss, reportTime, Term } from '../../features/reviews/components/report-parts';
import { isStudyActive, useStudy } from '../../features/studies/api/get-study';
import { useStudyBest } from '../../features/studies/api/get-study-best';
import { useStudyCases } from '../../features/studies/api/get-study-cases';
import { useStudyPareto } from '../../features/studies/api/get-study-pareto';
import { useStudyStatistics } from '../../features/studies/api/get-study-statistics';
import { studyPagePath } from '../../features/studies/api/study-path';
import { StudyStatisticsTable } from '../../features/studies/components/study-statistics-table';
import { formatValue, lineLabel, lineUnit, pathUnit } from '../../features/studies/lib/study-format';
import { ApiRequestError } from '../../lib/api-client';

// uPlot stays out of the first bundle.
const StudyScatter = lazy(() => import('../../features/studies/components/study-scatter'));



/** `/missions/:missionId/studies/:studyId/report`: printable review report of a trade study. */
export function StudyReportRoute() {
  const parsed = studyParamsSchema.safeParse(useParams());
  if (!parsed.success) return <NotFound title="Report not found" message="There is no study at this address." />;
  return <Report key={parsed.data.studyId} missionId={parsed.data.missionId} studyId={parsed.data.studyId} />;
}

function Report({ missionId, studyId }: { missionId: string; studyId: string }) {
  const study = useStudy(missionId, studyId);
  if (study.isError) {
    if (study.error instanceof ApiRequestError && study.error.status === 404) return <NotFound title="Study not found" message="There is no study at this address, or you are not a member of its mission." />;
    return <ErrorState title="Could not load this study" error={study.error} onRetry={() => void study.refetch()} retrying={study.isFetching} />;
  }
  if (!study.data) return <LoadingState label="Loading the report…" />;
  return <ReportBody missionId={missionId} study={study.data} />;
}

function ReportBody({ missionId, study }: { missionId: string; study: Study }) {
  const mission = useMission(missionId);
  const review = useReview(missionId, 'study', study.id);
  const comments = useComments(missionId, 'study', study.id);
  const statistics = useStudyStatistics(missionId, study.id, false);
  const requirements = useRequirements(missionId);
  const everyCase = useStudyCases(missionId, study.id, { sort: 'index', dir: 'asc', status: 'succeeded', limit: 5000 }, false);
  const [line0, line1] = study.lines as readonly (string | undefined)[];
  const firstLine = line0 ?? 'srp.accel.mean';
  const param0 = study.parameterPaths[0];
  const best0 = useStudyBest(missionId, study.id, firstLine, 'min', false);
  const pareto = useStudyPareto(missionId, study.id, { x: firstLine, xDir: 'min', y: line1 ?? firstLine, yDir: 'min' }, false);
  const bestIndex = best0.data?.case?.index;
  const paretoIndices = useMemo(() => new Set(line1 ? (pareto.data?.cases.map((c) => c.index) ?? []) : []), [pareto.data, line1]);

  const cases = everyCase.data?.cases;
  const paramPoints = useMemo(() => {
    if (!param0 || !cases) return [];
    return cases.flatMap((c) => {
      const x = c.parameters[param0];
      const y = c.lines?.[firstLine];
      return typeof x === 'number' && typeof y === 'number' ? [{ index: c.index, x, y, pareto: false, best: c.index === bestIndex }] : [];
    });
  }, [cases, param0, firstLine, bestIndex]);
  const linePoints = useMemo(() => {
    if (!line1 || !cases) return [];
    return cases.flatMap((c) => {
      const x = c.lines?.[firstLine];
      const y = c.lines?.[line1];
      return typeof x === 'number' && typeof y === 'number' ? [{ index: c.index, x, y, pareto: paretoIndices.has(c.index), best: c.index === bestIndex }] : [];
    });
  }, [cases, line1, firstLine, paretoIndices, bestIndex]);

  const lineAxis = (l: string) => `${lineLabel(l)} (${lineUnit(l)})`;
  const design = study.design;

  return (
    <article className="report mx-auto flex w-full max-w-[680px] flex-col gap-6">
      <style>{reportPrintCss}</style>
      <title>{`Study report · ${study.name} · Photon Ledger`}</title>
      <div className="no-print flex flex-wrap items-center gap-3">
        <Link to={studyPagePath(missionId, study.id)} className="text-sm underline decoration-rule-strong underline-offset-2">
          Back to the study
        </Link>
        <Button size="sm" variant="primary" onClick={() => window.print()}>
          Print…
        </Button>
      </div>
      <div className="border-b-2 border-ink pb-3">
        <p className="text-sm text-ink-soft">Photon Ledger · trade study review report</p>
        <h1 className="text-2xl font-semibold">
          {mission.data?.name ?? 'Mission'} — {study.name}
        </h1>
        <p className="font-mono text-xs text-ink-soft">
          study {study.id} · created {reportTime(study.createdAt)} · printed {reportTime(new Date().toISOString())}
        </p>
      </div>
      <p role="note" className="border-l-4 border-sodium px-3 py-1 text-sm">
        <span className="font-semibold">Caution. </span>
        {statistics.data?.caution ?? cautionText}
      </p>
      {isStudyActive(study) && (
        <p role="status" className="rounded-md border border-rule-strong px-3 py-2 text-sm">
          This study is still running ({study.progress.succeeded + study.progress.failed + study.progress.cancelled} of {study.progress.total} cases done): the figures below are partial.
        </p>
      )}

      <ApprovalSection missionId={missionId} subjectType="study" subjectId={study.id} review={review.data} failed={review.isError} />

      <ReportSection title="Study definition">
        <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
          <Term label="Base scenario">{study.scenarioName}</Term>
          <Term label="Base vehicle revision">
            <span className="font-mono text-xs">{study.vehicleRevisionId}</span>
          </Term>
          <Term label="Design">{design.kind === 'grid' ? 'Sweep, full grid of the parameters below' : `Monte Carlo dispersion, ${design.samples} samples`}</Term>
          {design.kind === 'monte-carlo' && (
            <Term label="Seed">
              <span className="font-mono">{design.seed}</span> (same seed, same cases)
            </Term>
          )}
          <Term label="Cases">{`${study.progress.total} (${study.progress.succeeded} succeeded, ${study.progress.failed} failed, ${study.progress.cancelled} cancelled)`}</Term>
          <Term label="Lines compared">{study.lines.map((l) => lineLabel(l)).join('; ')}</Term>
        </dl>
        <table className="mt-2 w-full text-left text-sm">
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 font-medium">Parameter</th>
              <th className="py-1 font-medium">{design.kind === 'grid' ? 'Values' : 'Distribution'}</th>
            </tr>
          </thead>
          <tbody>
            {design.kind === 'grid'
              ? design.parameters.map((p) => (
                  <tr key={p.path} className="border-t border-rule">
                    <td className="py-1.5 pr-3 font-mono text-xs break-all">{p.path}</td>
                    <td className="py-1.5 font-mono text-xs">
                      {'values' in p
                        ? `${p.values.map((v) => formatValue(v)).join(', ')} ${pathUnit(p.path)}`
                        : `${formatValue(p.from)} to ${formatValue(p.to)} ${pathUnit(p.path)} in ${p.steps} evenly spaced steps`}
                    </td>
                  </tr>
                ))
              : design.parameters.map((p) => (
                  <tr key={p.path} className="border-t border-rule">
                    <td className="py-1.5 pr-3 font-mono text-xs break-all">{p.path}</td>
                    <td className="py-1.5 font-mono text-xs">
                      {p.distribution.kind === 'normal'
                        ? `normal, mean ${formatValue(p.distribution.mean)}, SD ${formatValue(p.distribution.sd)} ${pathUnit(p.path)}`
                        : `uniform ${formatValue(p.distribution.min)} to ${formatValue(p.distribution.max)} ${pathUnit(p.path)}`}
                      {p.driftPerYear !== undefined ? `; drift ${formatValue(p.driftPerYear)} per year (mid-mission value used)` : ''}
                      {p.companion ? `; ${p.companion} takes the rest` : ''}
                    </td>
                  </tr>
                ))}
          </tbody>
        </table>
      </ReportSection>

      <ReportSection title="Statistics of the compared lines">
        {statistics.data ? (
          <>
            <StudyStatisticsTable statistics={statistics.data} />
            <Margins statistics={statistics.data} requirements={requirements.data} />
          </>
        ) : statistics.isError ? (
          <p className="text-sm text-alarm">The statistics could not be loaded.</p>
        ) : (
          <LoadingState label="Loading the statistics…" />
        )}
      </ReportSection>

      <ReportSection title="Charts">
        {everyCase.isError ? (
          <p className="text-sm text-alarm">The cases could not be loaded, so the charts are missing.</p>
        ) : !cases ? (
          <div role="status" className="min-h-[340px] text-sm text-ink-soft">Loading the cases for the charts…</div>
        ) : (
          <Suspense fallback={<div className="min-h-[340px]" aria-hidden />}>
            {param0 && (
              <figure className="flex flex-col gap-1">
                <figcaption className="text-sm font-semibold">
                  {lineLabel(firstLine)} against {param0}
                </figcaption>
                {paramPoints.length > 0 ? (
                  <StudyScatter
                    points={paramPoints}
                    xLabel={`${param0} (${pathUnit(param0)})`}
                    yLabel={lineAxis(firstLine)}
                    ariaLabel={`Scatter of ${lineLabel(firstLine)} against ${param0}, ${paramPoints.length} cases`}
                    staticLegend
                  />
                ) : (
                  <p className="text-sm text-ink-soft">No succeeded case to plot.</p>
                )}
              </figure>
            )}
            {line1 && (
              <figure className="flex flex-col gap-1">
                <figcaption className="text-sm font-semibold">
                  {lineLabel(line1)} against {lineLabel(firstLine)}, non-dominated cases marked (both smaller is better)
                </figcaption>
                {linePoints.length > 0 ? (
                  <StudyScatter
                    points={linePoints}
                    xLabel={lineAxis(firstLine)}
                    yLabel={lineAxis(line1)}
                    ariaLabel={`Scatter of ${lineLabel(line1)} against ${lineLabel(firstLine)}, ${linePoints.length} cases, ${paretoIndices.size} non-dominated`}
                    staticLegend
                  />
                ) : (
                  <p className="text-sm text-ink-soft">No succeeded case to plot.</p>
                )}
              </figure>
            )}
            <p className="text-xs text-ink-soft">Ringed: the case with the smallest {lineLabel(firstLine)}. Larger orange marks: non-dominated (Pareto) cases.</p>
          </Suspense>
        )}
      </ReportSection>

      <ReportSection title="Best case per line">
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 font-medium">Line (smallest is best)</th>
              <th className="py-1 text-right font-medium">Case</th>
              <th className="py-1 pl-3 text-right font-medium">Value</th>
              <th className="py-1 pl-3 font-medium">Parameters</th>
            </tr>
          </thead>
          <tbody>
            {study.lines.map((l) => (
              <BestRow key={l} missionId={missionId} studyId={study.id} line={l} />
            ))}
          </tbody>
        </table>
      </ReportSection>

      <ReportSection title="Comments on the study">
        {comments.data ? (
          comments.data.comments.length === 0 ? (
            <p className="text-sm">No comments.</p>
          ) : (
            <ol className="flex flex-col gap-2 text-sm">
              {comments.data.comments.map((c) => (
                <li key={c.id} className={c.parentId ? 'ml-6 border-l-2 border-rule pl-3' : ''}>
                  <p className="text-xs text-ink-soft">
                    {c.author?.displayName ?? 'Former member'} · {reportTime(c.createdAt)}
                    {c.lineKey ? ` · on ${lineLabel(c.lineKey)}` : ''}
                    {c.resolved ? ' · resolved' : ' · open'}
                  </p>
                  <p className="whitespace-pre-wrap">{c.body}</p>
                </li>
              ))}
            </ol>
          )
        ) : comments.isError ? (
          <p className="text-sm text-alarm">The comments could not be loaded.</p>
        ) : (
          <LoadingState label="Loading the comments…" />
        )}
      </ReportSection>
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">{cautionText}</p>
    </article>
  );
}

/** Margins of the statistical values against the mission's requirements, where a line has one. */
function Margins({ statistics, requirements }: { statistics: StudyStatistics; requirements: MissionRequirementList | undefined }) {
  if (!requirements) return null;
  const rows = statistics.lines.flatMap((s) => {
    const req = requirements.requirements.find((r) => r.line === s.line);
    if (!req) return [];
    // A ceiling is held by the 99th percentile; a floor by the smallest case (no low percentile is reported).
    const comparator = req.comparator as BudgetComparator;
    const basis = comparator === '<=' ? { name: '99th pct', value: s.p99 } : { name: 'min', value: s.min };
    const margin = basis.value === null ? null : marginPercent(basis.value, comparator, req.value);
    const pass = margin === null ? null : margin >= req.minMarginPercent - 1e-9;
    return [{ s, req, basis, margin, pass }];
  });
  if (rows.length === 0) return <p className="text-xs text-ink-soft">The mission sets no requirement on these lines, so no margin is given.</p>;
  return (
    <table className="mt-2 w-full text-left text-sm">
      <caption className="mb-1 text-left text-sm font-semibold">Margins against the mission's requirements</caption>
      <thead className="text-xs text-ink-soft">
        <tr>
          <th className="py-1 font-medium">Line</th>
          <th className="py-1 text-right font-medium">Requirement</th>
          <th className="py-1 text-right font-medium">Held by</th>
          <th className="py-1 text-right font-medium">Margin</th>
          <th className="py-1 pl-3 font-medium">Verdict</th>
        </tr>
      </thead>
      <tbody className="font-mono">
        {rows.map(({ s, req, basis, margin, pass }) => (
          <tr key={s.line} className="border-t border-rule">
            <td className="py-1.5 font-sans">{lineLabel(s.line)}</td>
            <td className="py-1.5 text-right">
              {req.comparator === '<=' ? '≤' : '≥'} {formatValue(req.value)} <span className="font-sans text-xs text-ink-soft">{lineUnit(s.line)}</span>
            </td>
            <td className="py-1.5 text-right">
              {formatValue(basis.value)} <span className="font-sans text-xs text-ink-soft">({basis.name})</span>
            </td>
            <td className="py-1.5 text-right">{margin === null ? '—' : `${margin.toFixed(1)} %`}</td>
            <td className="py-1.5 pl-3 font-sans">{pass === null ? '—' : pass ? `meets ${req.minMarginPercent} % policy` : `below ${req.minMarginPercent} % policy`}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function BestRow({ missionId, studyId, line }: { missionId: string; studyId: string; line: string }) {
  const best = useStudyBest(missionId, studyId, line, 'min', false);
  const c = best.data?.case;
  return (
    <tr className="border-t border-rule align-top">
      <td className="py-1.5">
        {lineLabel(line)} <span className="text-xs text-ink-soft">({lineUnit(line)})</span>
      </td>
      <td className="py-1.5 text-right font-mono">{best.isError ? 'error' : c ? `#${c.index}` : best.data ? '—' : '…'}</td>
      <td className="py-1.5 pl-3 text-right font-mono whitespace-nowrap">{c ? formatValue(c.lines?.[line]) : ''}</td>
      <td className="py-1.5 pl-3 font-mono text-xs">
        {c
          ? Object.entries(c.parameters)
              .map(([p, v]) => `${p.replace(/^vehicle\.|^scenario\./, '')} = ${formatValue(v)} ${pathUnit(p)}`)
              .join('; ')
          : ''}
      </td>
    </tr>
  );
}


