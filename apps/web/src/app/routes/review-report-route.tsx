import { lazy, Suspense, useMemo } from 'react';
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
import { ApprovalSection, ReportSection, reportPrintCss, reportTime, Term } from '../../features/reviews/components/report-parts';
import { useRun } from '../../features/runs/api/get-run';
import { useRunBudget } from '../../features/runs/api/get-run-budget';
import { useRunSummary } from '../../features/runs/api/get-run-summary';
import { runPagePath } from '../../features/runs/api/run-path';
import { BudgetTable } from '../../features/runs/components/budget-table';
import { useRunEvents } from '../../features/runs/api/get-run-events';
import { ChartsPlaceholder } from '../../features/runs/components/charts/chart-frame';
import { pairEclipses } from '../../features/runs/lib/eclipses';

// uPlot stays out of the first bundle.
const RunCharts = lazy(() => import('../../features/runs/components/charts/run-charts'));

/** Beside the shared print rules: a budget table that fits A4 and charts without their view controls. */
const runReportCss = `
.report-budget table { min-width: 0 !important; }
.report-budget th, .report-budget td { padding-left: 6px !important; padding-right: 6px !important; }
@media print {
  .report-charts fieldset { display: none !important; }
  .report-charts figure { break-inside: avoid; }
}`;

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
      <style>{reportPrintCss + runReportCss}</style>
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
          run {runId} · finished {reportTime(run.data.finishedAt)} · printed {reportTime(new Date().toISOString())}
        </p>
      </div>
      <p role="note" className="border-l-4 border-sodium px-3 py-1 text-sm">
        <span className="font-semibold">Caution. </span>
        {cautionText}
      </p>

      <ApprovalSection missionId={missionId} subjectType="budget" subjectId={runId} review={review.data} failed={review.isError} />

      <ReportSection title="Vehicle and scenario">
        {summary.data ? (
          <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
            <Term label="Vehicle">{`${summary.data.vehicle.name} (${summary.data.vehicle.kind}), ${summary.data.vehicle.massKg.toLocaleString('en-GB', { maximumSignificantDigits: 5 })} kg`}</Term>
            <Term label="Vehicle revision">
              <span className="font-mono text-xs">{summary.data.vehicle.revisionId}</span>
            </Term>
            <Term label="Scenario">{summary.data.scenarioName}</Term>
            <Term label="Epoch">{reportTime(summary.data.epochUtc)}</Term>
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
                    {c.author?.displayName ?? 'Former member'} · {reportTime(c.createdAt)}
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


