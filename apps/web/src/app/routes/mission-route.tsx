import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { missionParamsSchema, type Run } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { MemberList } from '../../features/missions/components/member-list';
import { MissionOverview } from '../../features/missions/components/mission-overview';
import { TableSkeleton } from '../../features/missions/components/table-skeleton';
import { useRequirements } from '../../features/requirements/api/list-requirements';
import { BudgetGlance } from '../../features/requirements/components/budget-glance';
import { useRunBudget } from '../../features/runs/api/get-run-budget';
import { useRuns } from '../../features/runs/api/list-runs';
import { runPagePath } from '../../features/runs/api/run-path';
import { RunList } from '../../features/runs/components/run-list';
import { useStudies } from '../../features/studies/api/list-studies';
import { StudyList } from '../../features/studies/components/study-list';
import { useScenarios } from '../../features/scenarios/api/list-scenarios';
import { ScenarioList } from '../../features/scenarios/components/scenario-list';
import { useVehicles } from '../../features/vehicles/api/list-vehicles';
import { VehicleList } from '../../features/vehicles/components/vehicle-list';
import { ApiRequestError } from '../../lib/api-client';
import { formatUtcDate } from '../../lib/format';

/** `/missions/:missionId`: one mission with its members; a 404 page for an id that is malformed or not found. */
export function MissionRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <MissionNotFound />;
  return <MissionPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function MissionPage({ missionId }: { missionId: string }) {
  const mission = useMission(missionId);
  const me = useMe();
  const canEdit = me.data?.role === 'engineer' || me.data?.role === 'lead';

  if (mission.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Mission' }]} />
        <LoadingState label="Loading mission…" />
      </div>
    );
  }
  if (mission.isError) {
    if (mission.error instanceof ApiRequestError && mission.error.status === 404) return <MissionNotFound />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Mission' }]} />
        <ErrorState
          title="Could not load this mission"
          error={mission.error}
          onRetry={() => void mission.refetch()}
          retrying={mission.isFetching}
        />
      </div>
    );
  }

  const { data } = mission;
  const base = `/missions/${missionId}`;
  return (
    <div className="flex flex-col gap-8">
      <title>{`${data.name} · Photon Ledger`}</title>
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: data.name }]} />
        <MissionOverview mission={data} />
      </div>
      <Section
        id="budgets-heading"
        title="Budgets"
        action={
          <Link to={`${base}/requirements`} className={buttonClasses('secondary', 'sm')}>
            Requirements
          </Link>
        }
      >
        <MissionBudget missionId={missionId} />
      </Section>
      <VehiclesSection missionId={missionId} canEdit={canEdit} />
      <ScenariosSection missionId={missionId} canEdit={canEdit} />
      <RunsSection missionId={missionId} />
      <StudiesSection missionId={missionId} canEdit={canEdit} />
      <Section id="members-heading" title="Members" count={data.members.length}>
        <MemberList members={data.members} />
      </Section>
    </div>
  );
}

/** A titled section of the mission page, with an optional count and an action at the right. */
function Section({ id, title, count, action, children }: { id: string; title: string; count?: number | undefined; action?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <div className="flex min-h-8 items-center justify-between gap-3">
        <h2 id={id} className="text-lg font-semibold">
          {title}{' '}
          {count !== undefined && <span className="font-mono text-sm font-normal text-ink-soft">{count}</span>}
        </h2>
        {action}
      </div>
      {children}
    </section>
  );
}

function VehiclesSection({ missionId, canEdit }: { missionId: string; canEdit: boolean }) {
  const vehicles = useVehicles(missionId);
  return (
    <Section
      id="vehicles-heading"
      title="Vehicles"
      count={vehicles.data?.vehicles.length}
      action={
        <div className="flex items-center gap-2">
          <Link to={`/missions/${missionId}/meshes`} className={buttonClasses('secondary', 'sm')}>
            Meshes
          </Link>
          {canEdit && (
            <Link to={`/missions/${missionId}/vehicles/new`} className={buttonClasses('secondary', 'sm')}>
              New vehicle
            </Link>
          )}
        </div>
      }
    >
      {vehicles.isPending ? (
        <TableSkeleton label="Loading vehicles…" rows={2} />
      ) : vehicles.isError ? (
        <ErrorState title="Could not load the vehicles" error={vehicles.error} onRetry={() => void vehicles.refetch()} retrying={vehicles.isFetching} />
      ) : (
        <VehicleList missionId={missionId} vehicles={vehicles.data.vehicles} />
      )}
    </Section>
  );
}

function ScenariosSection({ missionId, canEdit }: { missionId: string; canEdit: boolean }) {
  const scenarios = useScenarios(missionId);
  return (
    <Section
      id="scenarios-heading"
      title="Scenarios"
      count={scenarios.data?.scenarios.length}
      action={
        canEdit && (
          <Link to={`/missions/${missionId}/scenarios/new`} className={buttonClasses('secondary', 'sm')}>
            New scenario
          </Link>
        )
      }
    >
      {scenarios.isPending ? (
        <TableSkeleton label="Loading scenarios…" rows={2} />
      ) : scenarios.isError ? (
        <ErrorState title="Could not load the scenarios" error={scenarios.error} onRetry={() => void scenarios.refetch()} retrying={scenarios.isFetching} />
      ) : (
        <ScenarioList missionId={missionId} scenarios={scenarios.data.scenarios} />
      )}
    </Section>
  );
}

function RunsSection({ missionId }: { missionId: string }) {
  const runs = useRuns(missionId);
  return (
    <Section id="runs-heading" title="Runs" count={runs.data?.runs.length}>
      {runs.isPending ? (
        <TableSkeleton label="Loading runs…" rows={3} />
      ) : runs.isError ? (
        <ErrorState title="Could not load the runs" error={runs.error} onRetry={() => void runs.refetch()} retrying={runs.isFetching} />
      ) : (
        <RunList missionId={missionId} runs={runs.data.runs} />
      )}
    </Section>
  );
}

/** The latest succeeded run's budget counts and how many lines carry a requirement. */
function MissionBudget({ missionId }: { missionId: string }) {
  const runs = useRuns(missionId);
  const requirements = useRequirements(missionId);
  const latest: Run | undefined = runs.data?.runs.find((run) => run.status === 'succeeded');
  const budget = useRunBudget(missionId, latest?.id ?? '', { enabled: latest !== undefined });
  const counts = runs.isPending ? undefined : latest === undefined ? (runs.isError ? undefined : null) : budget.data?.counts;
  return (
    <BudgetGlance
      counts={counts}
      run={
        latest && {
          label: `${latest.scenarioName}, finished ${formatUtcDate(latest.finishedAt ?? latest.queuedAt)}`,
          to: runPagePath(missionId, latest.id),
        }
      }
      error={runs.isError ? runs.error.message : budget.isError ? budget.error.message : undefined}
      requirementCount={requirements.data?.requirements.length}
      requirementsTo={`/missions/${missionId}/requirements`}
    />
  );
}

function StudiesSection({ missionId, canEdit }: { missionId: string; canEdit: boolean }) {
  const studies = useStudies(missionId);
  return (
    <Section
      id="studies-heading"
      title="Trade studies"
      count={studies.data?.studies.length}
      action={
        canEdit && (
          <Link to={`/missions/${missionId}/studies/new`} className={buttonClasses('secondary', 'sm')}>
            New study
          </Link>
        )
      }
    >
      {studies.isPending ? (
        <TableSkeleton label="Loading trade studies…" rows={2} />
      ) : studies.isError ? (
        <ErrorState title="Could not load the trade studies" error={studies.error} onRetry={() => void studies.refetch()} retrying={studies.isFetching} />
      ) : (
        <StudyList missionId={missionId} studies={studies.data.studies} />
      )}
    </Section>
  );
}

function MissionNotFound() {
  return (
    <>
      <title>Mission not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound
        title="Mission not found"
        message="There is no mission at this address, or you are not a member of it."
      />
    </>
  );
}
