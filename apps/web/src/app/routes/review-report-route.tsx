import { lazy, Suspense, useMemo, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { runParamsSchema } from '@photon-ledger/shared';
import { Button } from '../../components/ui/button';
import { cautionText } from '../../components/ui/caution-footer';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useComments } from '../../features/comments/api/list-comments';
import { useMission } from '../../features/missions/api/get-mission';
import { useReview } from '../../features/reviews/api/get-review';
import { reviewStateLabels } from '../../features/reviews/components/review-state-badge';
import { useRun } from '../../features/runs/api/get-run';
import { useRunBudget } from '../../features/runs/api/get-run-budget';
import { useRunSummary } from '../../features/runs/api/get-run-summary';
import { runPagePath } from '../../features/runs/api/run-path';
import { BudgetTable } from '../../features/runs/components/budget-table';
import { useRunEvents } from '../../features/runs/api/get-run-events';
import { ChartsPlaceholder } from '../../features/runs/components/charts/chart-frame';
import { pairEclipses } from '../../features/runs/lib/eclipses';
import { ReviewHistory } from '../../features/reviews/components/review-history';

// uPlot stays out of the first bundle.
const RunCharts = lazy(() => import('../../features/runs/components/charts/run-charts'));

/**
 * Print rules: no app chrome, no buttons, black on white, tables kept whole. The report is laid
 * out at most 680 CSS px wide on screen too, so the chart canvases are drawn at the width of an A4
 * page (210 mm less 2 × 14 mm margins ≈ 688 px) and print without scaling or clipping.
 */
const printCss = `
.report-budget table { min-width: 0 !important; }
.report-budget th, .report-budget td { padding-left: 6px !important; padding-right: 6px !important; }
@media print {
  @page { size: A4; margin: 16mm 14mm; }
  html { background: white !important; }
  .report canvas { max-width: 100% !important; }
  .report-charts fieldset { display: none !important; }
  .report-charts figure { break-inside: avoid; }
  body { background: white !important; }
  body > div header, body > div footer, .no-print, [href="#main"] { display: none !important; }
  .report { display: flex !important; }
  main { max-width: none !important; padding: 0 !important; }
  .report section { break-inside: avoid-page; }
  .report table { break-inside: auto; }
  .report tr { break-inside: avoid; }
  .report a { color: inherit; text-decoration: none; }
}`;

const when = (iso: string | null | undefined) => (iso ? `${iso.slice(0, 16).replace('T', ' ')} UTC` : '—');

/** `/missions/:missionId/runs/:runId/report`: a printable review report of a run's budget. */
export function ReviewReportRoute() {
  const parsed = runParamsSchema.safeParse(useParams());
  if (!parsed.success) return <NotFound title="Report not found" message="There is no run at this address." />;
  return <Report missionId={parsed.data.missionId} runId={parsed.data.runId} />;
}

function Report({ missionId, runId }: { missionId: string; runId: string }) {
  const mission = useMission(missionId);
  const run = useRun(missionId, runId);
  const ready = run.data?.status === 'succeeded';
  const summary = useRunSummary(missionId, runId, { enabled: ready });
  const budget = useRunBudget(missionId, runId, { enabled: ready });
  const review = useReview(missionId, 'budget', runId);
  const comments = useComments(missionId, 'budget', runId);
  const events = useRunEvents(missionId, runId, { enabled: ready });
  const passages = useMemo(() => (events.data && summary.data ? pairEclipses(events.data.events, summary.data.spanSeconds) : []), [events.data, summary.data]);

  if (run.isError) return <ErrorState title="Could not load this run" error={run.error} onRetry={() => void run.refetch()} retrying={run.isFetching} />;
  if (!run.data) return <LoadingState label="Loading the report…" />;
  if (!ready) return <NotFound title="No budget yet" message="A review report needs a run that succeeded." />;

  return (
    <article className="report mx-auto flex w-full max-w-[680px] flex-col gap-6">
      <style>{printCss}</style>
      <title>{`Review report · ${run.data.scenarioName} · Photon Ledger`}</title>
      <div className="no-print flex flex-wrap items-center gap-3">
        <Link to={runPagePath(missionId, runId)} className="text-sm underline decoration-rule-strong underline-offset-2">
          Back to the run
        </Link>
        <Button size="sm" variant="primary" onClick={() => window.print()}>
          Print…
        </Button>
      </div>
      <div className="border-b-2 border-ink pb-3">
        <p className="text-sm text-ink-soft">Photon Ledger · SRP budget review report</p>
        <h1 className="text-2xl font-semibold">
          {mission.data?.name ?? 'Mission'} — run of {run.data.scenarioName}
        </h1>
        <p className="font-mono text-xs text-ink-soft">
          run {runId} · finished {when(run.data.finishedAt)} · printed {when(new Date().toISOString())}
        </p>
      </div>
      <p role="note" className="border-l-4 border-sodium px-3 py-1 text-sm">
        <span className="font-semibold">Caution. </span>
        {cautionText}
      </p>

      <ReportSection title="Approval">
        {review.data ? (
          <>
            <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
              <Term label="State">{reviewStateLabels[review.data.state]}</Term>
              <Term label="Submitted">{review.data.submittedBy ? `${review.data.submittedBy.displayName}, ${when(review.data.submittedAt)}` : '—'}</Term>
              <Term label={review.data.state === 'approved' ? 'Approved' : 'Decided'}>{review.data.decidedBy ? `${review.data.decidedBy.displayName}, ${when(review.data.decidedAt)}` : '—'}</Term>
              {review.data.reason && <Term label="Reason">{review.data.reason}</Term>}
              {review.data.frozen && (
                <>
                  <Term label="Content SHA-256">
                    <span className="font-mono text-xs break-all">{review.data.frozen.contentHash}</span>
                  </Term>
                  <Term label="Still matches">{review.data.intact === false ? 'NO — content changed after approval' : 'yes'}</Term>
                </>
              )}
            </dl>
            <h3 className="mt-2 text-sm font-semibold">History</h3>
            <ReviewHistory missionId={missionId} subjectType="budget" subjectId={runId} version={review.data.updatedAt} />
          </>
        ) : review.isError ? (
          <p className="text-sm text-alarm">The review could not be loaded.</p>
        ) : (
          <LoadingState label="Loading the review…" />
        )}
      </ReportSection>

      <ReportSection title="Vehicle and scenario">
        {summary.data ? (
          <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
            <Term label="Vehicle">{`${summary.data.vehicle.name} (${summary.data.vehicle.kind}), ${summary.data.vehicle.massKg.toLocaleString('en-GB', { maximumSignificantDigits: 5 })} kg`}</Term>
            <Term label="Vehicle revision">
              <span className="font-mono text-xs">{summary.data.vehicle.revisionId}</span>
            </Term>
            <Term label="Scenario">{summary.data.scenarioName}</Term>
            <Term label="Epoch">{when(summary.data.epochUtc)}</Term>
            <Term label="Span">{`${(summary.data.spanSeconds / 86_400).toLocaleString('en-GB', { maximumSignificantDigits: 4 })} d, output every ${summary.data.outputStepSeconds} s`}</Term>
            <Term label="Frame, central body">{`${summary.data.frame}, ${summary.data.centralBody}`}</Term>
          </dl>
        ) : summary.isError ? (
          <p className="text-sm text-alarm">The run summary could not be loaded.</p>
        ) : (
          <LoadingState label="Loading the summary…" />
        )}
      </ReportSection>

      <ReportSection title="Budget with margins">
        {budget.data ? (
          <div className="report-budget">
            <BudgetTable budget={budget.data} />
          </div>
        ) : budget.isError ? (
          <p className="text-sm text-alarm">The budget could not be loaded.</p>
        ) : (
          <LoadingState label="Loading the budget…" />
        )}
      </ReportSection>

      <ReportSection title="Charts">
        {summary.isError ? (
          <p className="text-sm text-alarm">The charts need the run summary, which could not be loaded.</p>
        ) : summary.data && (budget.data || budget.isError) && (events.data || events.isError) ? (
          <div className="report-charts">
            <Suspense fallback={<ChartsPlaceholder withMomentum={Boolean(budget.data?.momentum)} />}>
              <RunCharts missionId={missionId} runId={runId} summary={summary.data} eclipses={passages} withMomentum={Boolean(budget.data?.momentum)} />
            </Suspense>
          </div>
        ) : (
          <ChartsPlaceholder withMomentum />
        )}
      </ReportSection>

      <ReportSection title="Comments">
        {comments.data ? (
          comments.data.comments.length === 0 ? (
            <p className="text-sm">No comments.</p>
          ) : (
            <ol className="flex flex-col gap-2 text-sm">
              {comments.data.comments.map((c) => (
                <li key={c.id} className={c.parentId ? 'ml-6 border-l-2 border-rule pl-3' : ''}>
                  <p className="text-xs text-ink-soft">
                    {c.author?.displayName ?? 'Former member'} · {when(c.createdAt)}
                    {c.lineKey ? ` · on ${c.lineKey}` : ''}
                    {c.resolved ? ' · resolved' : ' · open'}
                  </p>
                  <p className="whitespace-pre-wrap">{c.body}</p>
                </li>
              ))}
            </ol>
          )
        ) : (
          <LoadingState label="Loading the comments…" />
        )}
      </ReportSection>
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">{cautionText}</p>
    </article>
  );
}

function ReportSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-2">
      <h2 className="text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

function Term({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-soft">{label}</dt>
      <dd>{children}</dd>
    </>
  );
}
