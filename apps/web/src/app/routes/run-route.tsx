import { lazy, Suspense, useMemo, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { runParamsSchema, type Role, type Run, type RunSummary } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { cautionText } from '../../components/ui/caution-footer';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { PLAYBACK_PANEL_HEIGHT_PX } from '../../features/playback/playback-layout';
import { useRun } from '../../features/runs/api/get-run';
import { useRunBudget } from '../../features/runs/api/get-run-budget';
import { useRunEvents } from '../../features/runs/api/get-run-events';
import { useRunSummary } from '../../features/runs/api/get-run-summary';
import { isRunActive } from '../../features/runs/api/list-runs';
import { runPagePath } from '../../features/runs/api/run-path';
import { BudgetTable } from '../../features/runs/components/budget-table';
import { ChartsPlaceholder } from '../../features/runs/components/charts/chart-frame';
import { EclipseTable } from '../../features/runs/components/eclipse-table';
import { PerturbationTable } from '../../features/runs/components/perturbation-table';
import { RunActions } from '../../features/runs/components/run-actions';
import { RunExports } from '../../features/runs/components/run-exports';
import { RunLivePanel } from '../../features/runs/components/run-live-panel';
import { RunStatusBadge } from '../../features/runs/components/run-status-badge';
import { RunSummaryFacts, RunSummaryFactsSkeleton } from '../../features/runs/components/run-summary-facts';
import { pairEclipses } from '../../features/runs/lib/eclipses';
import { formatDuration, formatUtc, secondsBetween } from '../../features/runs/lib/format-time';
import { ApiRequestError } from '../../lib/api-client';
import { ReviewPanel } from '../../features/reviews/components/review-panel';
import { CommentThread } from '../../features/comments/components/comment-thread';

// uPlot and three.js stay out of the first bundle.
const RunCharts = lazy(() => import('../../features/runs/components/charts/run-charts'));
const PlaybackPanel = lazy(() => import('../../features/playback/components/playback-panel'));

/** Height kept for the 3D playback while its module loads. */
const PLAYBACK_HEIGHT = PLAYBACK_PANEL_HEIGHT_PX;

/** `/missions/:missionId/runs/:runId`: a run: live progress, then charts, events, budget, exports and 3D playback. */
export function RunRoute() {
  const parsed = runParamsSchema.safeParse(useParams());
  if (!parsed.success) return <RunNotFound />;
  const { missionId, runId } = parsed.data;
  return <RunPage key={`${missionId}/${runId}`} missionId={missionId} runId={runId} />;
}

function RunPage({ missionId, runId }: { missionId: string; runId: string }) {
  const run = useRun(missionId, runId);
  const mission = useMission(missionId);
  const me = useMe();
  const missionCrumb = { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` };
  const crumbs = [{ label: 'Missions', to: '/missions' }, missionCrumb, { label: run.data ? `Run of ${run.data.scenarioName}` : 'Run' }];

  if (run.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading run…" />
      </div>
    );
  }
  if (run.isError) {
    if (run.error instanceof ApiRequestError && run.error.status === 404) return <RunNotFound />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load this run" error={run.error} onRetry={() => void run.refetch()} retrying={run.isFetching} />
      </div>
    );
  }

  const data = run.data;
  const role = me.data?.role;
  const canEdit = role === 'engineer' || role === 'lead';
  return (
    <div className="flex flex-col gap-8">
      <title>{`Run of ${data.scenarioName} · Photon Ledger`}</title>
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <RunHeader run={data} actions={canEdit ? <RunActionsSlot run={data} /> : null} />
        <p role="note" className="rounded-md border-l-4 border-sodium bg-sodium-wash/60 px-4 py-2.5 text-sm text-ink">
          <span className="font-semibold">Caution. </span>
          {cautionText}
        </p>
      </div>
      {isRunActive(data) && (
        <section aria-labelledby="progress-heading" className="flex flex-col gap-3">
          <h2 id="progress-heading" className="text-lg font-semibold">
            Progress
          </h2>
          <RunLivePanel run={data} />
        </section>
      )}
      {data.status === 'failed' && (
        <div role="alert" className="rounded-md border border-alarm/40 bg-alarm-wash px-4 py-3 text-sm">
          <p className="font-semibold text-alarm">This run failed{data.finishedAt ? ` at ${formatUtc(data.finishedAt)}` : ''}.</p>
          <p className="mt-1 font-mono text-[13px] whitespace-pre-wrap text-ink">{data.errorMessage ?? 'No error message was recorded.'}</p>
          <p className="mt-2 text-ink-soft">No results were stored. Fix the scenario or vehicle and start a new run{canEdit ? ', or re-run it if the cause was passing' : ''}.</p>
        </div>
      )}
      {data.status === 'cancelled' && (
        <div role="status" className="rounded-md border border-rule-strong bg-paper-sunk px-4 py-3 text-sm">
          <p className="font-semibold">This run was cancelled{data.finishedAt ? ` at ${formatUtc(data.finishedAt)}` : ''}.</p>
          <p className="mt-1 text-ink-soft">
            {data.startedAt
              ? `It stopped at ${Math.floor(data.progress * 100)} % and stored no results.`
              : 'It was cancelled before a worker took it up; nothing was computed.'}
          </p>
        </div>
      )}
      {data.status === 'succeeded' && <RunReview missionId={missionId} runId={runId} role={role} />}
      {data.status === 'succeeded' && <RunResults missionId={missionId} runId={runId} />}
      {data.status === 'succeeded' && <RunComments missionId={missionId} runId={runId} role={role} />}
    </div>
  );
}

/** Review of the run's budget (submit, approve, send back) with a link to its printable report. */
function RunReview({ missionId, runId, role }: { missionId: string; runId: string; role: Role | undefined }) {
  return (
    <Section
      id="review"
      title="Review"
      aside={
        <Link to={`${runPagePath(missionId, runId)}/report`} className="text-sm underline decoration-rule-strong underline-offset-2 hover:text-sodium-deep">
          Printable review report
        </Link>
      }
    >
      <ReviewPanel missionId={missionId} subjectType="budget" subjectId={runId} role={role} />
    </Section>
  );
}

/** Comments on the budget as a whole or on one of its lines. */
function RunComments({ missionId, runId, role }: { missionId: string; runId: string; role: Role | undefined }) {
  const budget = useRunBudget(missionId, runId);
  const lines = (budget.data?.lines ?? []).map((l) => ({ key: l.key, label: l.label }));
  return (
    <Section id="comments" title="Comments on the budget">
      <CommentThread missionId={missionId} subjectType="budget" subjectId={runId} canComment={role === 'engineer' || role === 'lead' || role === 'reviewer'} lines={lines} />
    </Section>
  );
}

/** The actions column; a separate component so the mutations live only for editors. */
function RunActionsSlot({ run }: { run: Run }) {
  return <RunActions run={run} />;
}

function RunHeader({ run, actions }: { run: Run; actions: ReactNode }) {
  const duration = secondsBetween(run.startedAt, run.finishedAt);
  return (
    <header className="flex flex-wrap items-start justify-between gap-4">
      <div className="flex min-w-0 flex-col gap-2">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold">Run of {run.scenarioName}</h1>
          <RunStatusBadge status={run.status} />
        </div>
        <dl className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-soft">
          <Fact term="Scenario">
            <Link to={`/missions/${run.missionId}/scenarios/${run.scenarioId}`} className="text-ink underline decoration-rule-strong underline-offset-2 hover:text-sodium-deep">
              {run.scenarioName}
            </Link>
          </Fact>
          <Fact term="Queued">{formatUtc(run.queuedAt)}</Fact>
          {run.startedAt && <Fact term="Started">{formatUtc(run.startedAt)}</Fact>}
          {run.finishedAt && duration !== null && <Fact term="Took">{formatDuration(duration)}</Fact>}
          {!isRunActive(run) && run.workerId && <Fact term="Worker">{run.workerId}</Fact>}
          {run.rerunOf && (
            <Fact term="Re-run of">
              <Link to={runPagePath(run.missionId, run.rerunOf)} className="text-ink underline decoration-rule-strong underline-offset-2 hover:text-sodium-deep">
                an earlier run
              </Link>
            </Fact>
          )}
        </dl>
      </div>
      {actions}
    </header>
  );
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex gap-1.5">
      <dt>{term}</dt>
      <dd className="text-ink">{children}</dd>
    </div>
  );
}

function RunResults({ missionId, runId }: { missionId: string; runId: string }) {
  const summary = useRunSummary(missionId, runId);
  const budget = useRunBudget(missionId, runId);
  const events = useRunEvents(missionId, runId);
  const passages = useMemo(
    () => (events.data && summary.data ? pairEclipses(events.data.events, summary.data.spanSeconds) : []),
    [events.data, summary.data],
  );

  return (
    <>
      <Section id="summary" title="Summary">
        {summary.isError ? (
          <ErrorState title="Could not load the run summary" error={summary.error} onRetry={() => void summary.refetch()} retrying={summary.isFetching} />
        ) : summary.data ? (
          <RunSummaryFacts summary={summary.data} />
        ) : (
          <RunSummaryFactsSkeleton />
        )}
      </Section>

      <Section id="budget" title="Budget" aside={<span className="text-xs text-ink-soft">against the mission's current requirements</span>}>
        {budget.isError ? (
          <ErrorState title="Could not load the budget" error={budget.error} onRetry={() => void budget.refetch()} retrying={budget.isFetching} />
        ) : budget.data ? (
          <BudgetTable budget={budget.data} />
        ) : (
          <BlockSkeleton height={860} label="Loading the budget…" />
        )}
      </Section>

      <Section id="exports" title="Exports">
        <RunExports missionId={missionId} runId={runId} />
      </Section>

      <Section id="charts" title="Charts">
        {summary.isError ? (
          <p className="text-sm text-ink-soft">Charts need the run summary, which did not load.</p>
        ) : summary.data && (budget.data || budget.isError) ? (
          <Suspense fallback={<ChartsPlaceholder withMomentum={Boolean(budget.data?.momentum)} />}>
            <RunCharts
              missionId={missionId}
              runId={runId}
              summary={summary.data}
              eclipses={passages}
              withMomentum={Boolean(budget.data?.momentum)}
            />
          </Suspense>
        ) : (
          <ChartsPlaceholder withMomentum />
        )}
      </Section>

      <Section id="perturbations" title="Perturbation comparison">
        {budget.isError ? (
          <p className="text-sm text-ink-soft">The comparison comes with the budget, which did not load.</p>
        ) : budget.data ? (
          <PerturbationTable perturbations={budget.data.perturbations} />
        ) : (
          <BlockSkeleton height={260} label="Loading the force comparison…" />
        )}
      </Section>

      <Section id="eclipses" title="Eclipses">
        {events.isError ? (
          <ErrorState title="Could not load the events" error={events.error} onRetry={() => void events.refetch()} retrying={events.isFetching} />
        ) : events.data ? (
          <EclipseTable passages={passages} events={events.data.events} />
        ) : (
          <BlockSkeleton height={200} label="Loading the eclipses…" />
        )}
      </Section>

      <Section id="playback" title="3D playback">
        {summary.data ? <Playback missionId={missionId} runId={runId} summary={summary.data} /> : <BlockSkeleton height={PLAYBACK_HEIGHT} label="Loading the 3D playback…" />}
      </Section>
    </>
  );
}

function Playback({ missionId, runId, summary }: { missionId: string; runId: string; summary: RunSummary }) {
  return (
    <Suspense fallback={<BlockSkeleton height={PLAYBACK_HEIGHT} label="Loading the 3D playback…" />}>
      <PlaybackPanel missionId={missionId} runId={runId} summary={summary} />
    </Suspense>
  );
}

function Section({ id, title, aside, children }: { id: string; title: string; aside?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby={`${id}-heading`} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h2 id={`${id}-heading`} className="text-lg font-semibold">
          {title}
        </h2>
        {aside}
      </div>
      {children}
    </section>
  );
}

function BlockSkeleton({ height, label }: { height: number; label: string }) {
  return (
    <div role="status" style={{ height }} className="animate-pulse rounded-lg border border-rule bg-paper-sunk/60 motion-reduce:animate-none">
      <span className="sr-only">{label}</span>
    </div>
  );
}

function RunNotFound() {
  return (
    <>
      <title>Run not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Run not found" message="There is no run at this address, or you are not a member of its mission." />
    </>
  );
}
