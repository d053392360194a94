import { lazy, Suspense, useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { studyParamsSchema, type Role, type Study } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { Button, buttonClasses } from '../../components/ui/button';
import { cautionText } from '../../components/ui/caution-footer';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { useCancelStudy } from '../../features/studies/api/cancel-study';
import { isStudyActive, useStudy } from '../../features/studies/api/get-study';
import { useStudyBest } from '../../features/studies/api/get-study-best';
import { caseQueryParams, useStudyCases, type CaseTableQuery } from '../../features/studies/api/get-study-cases';
import { useStudyPareto } from '../../features/studies/api/get-study-pareto';
import { useStudyStatistics } from '../../features/studies/api/get-study-statistics';
import { studyPath, STUDY_POLL_MS } from '../../features/studies/api/study-path';
import { CaseTable } from '../../features/studies/components/case-table';
import { StudyProgress, StudyStatusBadge } from '../../features/studies/components/study-progress';
import { StudyStatisticsTable } from '../../features/studies/components/study-statistics-table';
import { lineLabel, lineUnit, pathUnit } from '../../features/studies/lib/study-format';
import { ApiRequestError } from '../../lib/api-client';
import { CommentThread } from '../../features/comments/components/comment-thread';
import { ReviewPanel } from '../../features/reviews/components/review-panel';
import { ReviewHistory } from '../../features/reviews/components/review-history';
import { useReview } from '../../features/reviews/api/get-review';
import { CaseDetail } from '../../features/studies/components/case-detail';
import type { StudyCaseRow } from '../../features/studies/api/get-study-cases';

// uPlot stays out of the first bundle.
const StudyScatter = lazy(() => import('../../features/studies/components/study-scatter'));

/** `/missions/:missionId/studies/:studyId`: progress, statistics, chart, case table, CSV. */
export function StudyRoute() {
  const parsed = studyParamsSchema.safeParse(useParams());
  if (!parsed.success) return <NotFound title="Study not found" message="There is no study at this address." />;
  return <StudyPage key={parsed.data.studyId} missionId={parsed.data.missionId} studyId={parsed.data.studyId} />;
}

function StudyPage({ missionId, studyId }: { missionId: string; studyId: string }) {
  const study = useStudy(missionId, studyId);
  const mission = useMission(missionId);
  const crumbs = [{ label: 'Missions', to: '/missions' }, { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` }, { label: study.data?.name ?? 'Trade study' }];
  if (study.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading study…" />
      </div>
    );
  }
  if (study.isError) {
    if (study.error instanceof ApiRequestError && study.error.status === 404) return <NotFound title="Study not found" message="There is no study at this address, or you are not a member of its mission." />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load this study" error={study.error} onRetry={() => void study.refetch()} retrying={study.isFetching} />
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-8">
      <title>{`${study.data.name} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs} />
      <StudyBody missionId={missionId} study={study.data} />
    </div>
  );
}

function StudyBody({ missionId, study }: { missionId: string; study: Study }) {
  const me = useMe();
  const role = me.data?.role;
  const canEdit = role === 'engineer' || role === 'lead';
  const canComment = canEdit || role === 'reviewer';
  const [openIndex, setOpenIndex] = useState<number | undefined>();
  const [openSnapshot, setOpenSnapshot] = useState<StudyCaseRow | undefined>();
  const cancel = useCancelStudy(missionId, study.id);
  const active = isStudyActive(study);
  const refresh = active ? STUDY_POLL_MS * 2 : false;
  const firstLine: string = study.lines[0] ?? 'srp.accel.mean';

  const [query, setQuery] = useState<CaseTableQuery>({ sort: 'index', dir: 'asc' });
  const [bestLine, setBestLine] = useState(firstLine);
  const [bestDir, setBestDir] = useState<'min' | 'max'>('min');
  const [xAxis, setXAxis] = useState(study.parameterPaths[0] ? `param:${study.parameterPaths[0]}` : `line:${firstLine}`);
  const [yLine, setYLine] = useState(firstLine);
  const [xDir, setXDir] = useState<'min' | 'max'>('min');
  const [yDir, setYDir] = useState<'min' | 'max'>('min');

  const table = useStudyCases(missionId, study.id, { ...query, limit: 500 }, refresh);
  const everyCase = useStudyCases(missionId, study.id, { sort: 'index', dir: 'asc', status: 'succeeded', limit: 5000 }, refresh);
  const statistics = useStudyStatistics(missionId, study.id, refresh);
  const best = useStudyBest(missionId, study.id, bestLine, bestDir, refresh);
  const xIsLine = xAxis.startsWith('line:');
  const paretoX = xIsLine ? xAxis.slice(5) : yLine;
  const pareto = useStudyPareto(missionId, study.id, { x: paretoX, xDir, y: yLine, yDir }, refresh);
  const paretoIndices = useMemo(() => new Set(xIsLine ? (pareto.data?.cases.map((c) => c.index) ?? []) : []), [pareto.data, xIsLine]);
  const bestIndex = best.data?.case?.index;

  const points = useMemo(() => {
    const out: { index: number; x: number; y: number; pareto: boolean; best: boolean }[] = [];
    for (const c of everyCase.data?.cases ?? []) {
      const x = xIsLine ? c.lines?.[xAxis.slice(5)] : c.parameters[xAxis.slice(6)];
      const y = c.lines?.[yLine];
      if (typeof x === 'number' && typeof y === 'number') out.push({ index: c.index, x, y, pareto: paretoIndices.has(c.index), best: c.index === bestIndex });
    }
    return out;
  }, [everyCase.data, xAxis, xIsLine, yLine, paretoIndices, bestIndex]);

  // The open case: its freshest row (the table or every succeeded case), else the row clicked.
  const openCase: StudyCaseRow | undefined =
    openIndex === undefined
      ? undefined
      : (table.data?.cases.find((c) => c.index === openIndex) ?? everyCase.data?.cases.find((c) => c.index === openIndex) ?? openSnapshot);

  const csvQuery = new URLSearchParams(Object.entries(caseQueryParams(query)).filter((e): e is [string, string] => Boolean(e[1])));
  const xLabel = xIsLine ? `${lineLabel(xAxis.slice(5))} (${lineUnit(xAxis.slice(5))})` : `${xAxis.slice(6)} (${pathUnit(xAxis.slice(6))})`;
  const select = 'h-9 rounded-md border border-rule-strong bg-paper-raised px-2 text-sm';

  return (
    <>
      <header className="flex flex-col gap-3">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold">{study.name}</h1>
          <StudyStatusBadge study={study} />
          <div className="ml-auto flex gap-2">
            <Link to={`/missions/${missionId}/studies/${study.id}/report`} className={buttonClasses('secondary', 'sm')}>
              Printable report
            </Link>
            <a href={`${studyPath(missionId, study.id)}/export/cases.csv?${csvQuery.toString()}`} className={buttonClasses('secondary', 'sm')} download>
              Download CSV
            </a>
            {canEdit && active && !study.cancelRequested && (
              <Button size="sm" onClick={() => cancel.mutate()} disabled={cancel.isPending}>
                Cancel study
              </Button>
            )}
          </div>
        </div>
        <p className="text-sm text-ink-soft">
          Base scenario {study.scenarioName} ·{' '}
          {study.design.kind === 'grid' ? `sweep over ${study.parameterPaths.length} parameter(s), full grid` : `Monte Carlo, ${study.design.samples} samples, seed “${study.design.seed}”`}
        </p>
        <StudyProgress study={study} />
        {cancel.isError && <p className="text-sm text-alarm">{cancel.error.message}</p>}
      </header>

      <StudyReview missionId={missionId} studyId={study.id} role={role} />

      <section aria-labelledby="stats-heading" className="flex flex-col gap-3">
        <h2 id="stats-heading" className="text-lg font-semibold">
          Statistics of the compared lines
        </h2>
        {statistics.isPending ? (
          <LoadingState label="Loading statistics…" />
        ) : statistics.isError ? (
          <ErrorState title="Could not load the statistics" error={statistics.error} onRetry={() => void statistics.refetch()} retrying={statistics.isFetching} />
        ) : (
          <StudyStatisticsTable statistics={statistics.data} />
        )}
      </section>

      <section aria-labelledby="chart-heading" className="flex flex-col gap-3">
        <h2 id="chart-heading" className="text-lg font-semibold">
          Chart
        </h2>
        <div className="flex flex-wrap items-end gap-3 text-sm">
          <label className="flex flex-col gap-1 font-medium">
            Horizontal axis
            <select className={select} value={xAxis} onChange={(e) => setXAxis(e.target.value)}>
              {study.parameterPaths.map((p) => (
                <option key={p} value={`param:${p}`}>
                  Parameter {p}
                </option>
              ))}
              {study.lines.map((l) => (
                <option key={l} value={`line:${l}`}>
                  Line {lineLabel(l)}
                </option>
              ))}
            </select>
          </label>
          {xIsLine && (
            <label className="flex flex-col gap-1 font-medium">
              Better when (horizontal)
              <select className={select} value={xDir} onChange={(e) => setXDir(e.target.value as 'min' | 'max')}>
                <option value="min">smaller</option>
                <option value="max">larger</option>
              </select>
            </label>
          )}
          <label className="flex flex-col gap-1 font-medium">
            Vertical axis (line)
            <select className={select} value={yLine} onChange={(e) => setYLine(e.target.value)}>
              {study.lines.map((l) => (
                <option key={l} value={l}>
                  {lineLabel(l)}
                </option>
              ))}
            </select>
          </label>
          {xIsLine && (
            <label className="flex flex-col gap-1 font-medium">
              Better when (vertical)
              <select className={select} value={yDir} onChange={(e) => setYDir(e.target.value as 'min' | 'max')}>
                <option value="min">smaller</option>
                <option value="max">larger</option>
              </select>
            </label>
          )}
          <label className="flex flex-col gap-1 font-medium">
            Best case for
            <select className={select} value={bestLine} onChange={(e) => setBestLine(e.target.value)}>
              {study.lines.map((l) => (
                <option key={l} value={l}>
                  {lineLabel(l)}
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1 font-medium">
            Best is
            <select className={select} value={bestDir} onChange={(e) => setBestDir(e.target.value as 'min' | 'max')}>
              <option value="min">smallest</option>
              <option value="max">largest</option>
            </select>
          </label>
        </div>
        {best.data?.case && (
          <p className="text-sm">
            Best case for {lineLabel(bestLine)}: <span className="font-mono">#{best.data.case.index}</span> ({' '}
            {Object.entries(best.data.case.parameters)
              .map(([p, v]) => `${p} = ${Number(v.toPrecision(5))} ${pathUnit(p)}`)
              .join(', ')}{' '}
            )
          </p>
        )}
        <Suspense fallback={<div className="min-h-[340px]" aria-hidden />}>
          {points.length === 0 ? (
            <div className="flex min-h-[340px] items-center justify-center rounded-md border border-dashed border-rule text-sm text-ink-soft">
              {everyCase.isPending ? 'Loading cases…' : 'No succeeded case to plot yet.'}
            </div>
          ) : (
            <StudyScatter
              points={points}
              xLabel={xLabel}
              yLabel={`${lineLabel(yLine)} (${lineUnit(yLine)})`}
              ariaLabel={`Scatter of ${lineLabel(yLine)} against ${xLabel}, ${points.length} cases${xIsLine ? `, ${paretoIndices.size} non-dominated` : ''}`}
            />
          )}
        </Suspense>
      </section>

      <section aria-labelledby="cases-heading" className="flex flex-col gap-3">
        <h2 id="cases-heading" className="text-lg font-semibold">
          Cases
        </h2>
        {table.isPending ? (
          <LoadingState label="Loading cases…" />
        ) : table.isError ? (
          <ErrorState title="Could not load the cases" error={table.error} onRetry={() => void table.refetch()} retrying={table.isFetching} />
        ) : (
          <CaseTable
            cases={table.data.cases}
            total={table.data.total}
            parameterPaths={study.parameterPaths}
            lines={study.lines}
            query={query}
            onQuery={setQuery}
            bestIndex={bestIndex}
            paretoIndices={paretoIndices}
            openIndex={openIndex}
            onOpen={(c) => {
              setOpenIndex(c.index);
              setOpenSnapshot(c);
            }}
          />
        )}
        {openCase && (
          <CaseDetail
            studyCase={openCase}
            parameterPaths={study.parameterPaths}
            lines={study.lines}
            best={openCase.index === bestIndex}
            pareto={paretoIndices.has(openCase.index)}
            onClose={() => setOpenIndex(undefined)}
          >
            <CommentThread key={openCase.id} missionId={missionId} subjectType="case" subjectId={openCase.id} canComment={canComment} />
          </CaseDetail>
        )}
      </section>

      <section aria-labelledby="comments-heading" className="flex flex-col gap-3">
        <h2 id="comments-heading" className="text-lg font-semibold">
          Comments on the study
        </h2>
        <CommentThread
          missionId={missionId}
          subjectType="study"
          subjectId={study.id}
          canComment={canComment}
          lines={study.lines.map((l) => ({ key: l, label: lineLabel(l) }))}
          wholeLabel="The whole study"
        />
      </section>
      <p className="rounded-md border border-rule bg-paper-sunk/60 p-3 text-xs text-ink-soft">{statistics.data?.caution ?? cautionText}</p>
    </>
  );
}

/** The study's review (submit, approve, send back), its history, and the link to the printable report. */
function StudyReview({ missionId, studyId, role }: { missionId: string; studyId: string; role: Role | undefined }) {
  const review = useReview(missionId, 'study', studyId);
  return (
    <section aria-labelledby="review-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h2 id="review-heading" className="text-lg font-semibold">
          Review
        </h2>
        <Link to={`/missions/${missionId}/studies/${studyId}/report`} className="text-sm underline decoration-rule-strong underline-offset-2 hover:text-sodium-deep">
          Printable report
        </Link>
      </div>
      <ReviewPanel missionId={missionId} subjectType="study" subjectId={studyId} role={role} />
      {review.data && review.data.state !== 'draft' && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft hover:text-ink">History of this review</summary>
          <div className="mt-2">
            <ReviewHistory missionId={missionId} subjectType="study" subjectId={studyId} version={review.data.updatedAt} />
          </div>
        </details>
      )}
    </section>
  );
}
