import { useState, type ReactNode } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { scenarioRouteParamsSchema, type MissionDetail, type ScenarioDetail } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { Button } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { TableSkeleton } from '../../features/missions/components/table-skeleton';
import { useRuns } from '../../features/runs/api/list-runs';
import { RunList } from '../../features/runs/components/run-list';
import { StartRunButton } from '../../features/runs/components/start-run-button';
import { useDeleteScenario } from '../../features/scenarios/api/delete-scenario';
import { useScenario } from '../../features/scenarios/api/get-scenario';
import { useUpdateScenario } from '../../features/scenarios/api/update-scenario';
import { draftFromSpec } from '../../features/scenarios/lib/scenario-draft';
import { orbitSummary, spanSummary } from '../../features/scenarios/lib/orbit-summary';
import { ApiRequestError } from '../../lib/api-client';
import { formatUtcDate } from '../../lib/format';
import { ScenarioEditor, ScenarioPageNotFound } from './scenario-new-route';

/** `/missions/:missionId/scenarios/:scenarioId`: a scenario: its set-up, its runs, start a run. */
export function ScenarioRoute() {
  const parsed = scenarioRouteParamsSchema.safeParse(useParams());
  if (!parsed.success) return <ScenarioPageNotFound what="Scenario" />;
  const { missionId, scenarioId } = parsed.data;
  return <ScenarioPage key={`${missionId}/${scenarioId}`} missionId={missionId} scenarioId={scenarioId} />;
}

function ScenarioPage({ missionId, scenarioId }: { missionId: string; scenarioId: string }) {
  const mission = useMission(missionId);
  const scenario = useScenario(missionId, scenarioId);
  const me = useMe();
  const crumbs = [
    { label: 'Missions', to: '/missions' },
    { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` },
    { label: scenario.data?.name ?? 'Scenario' },
  ];

  const notFound = [mission.error, scenario.error].some((e) => e instanceof ApiRequestError && e.status === 404);
  if (notFound) return <ScenarioPageNotFound what={mission.isError ? 'Mission' : 'Scenario'} missionId={missionId} />;
  if (mission.isError || scenario.isError) {
    const failed = mission.isError ? mission : scenario;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load this scenario" error={failed.error} onRetry={() => void failed.refetch()} retrying={failed.isFetching} />
      </div>
    );
  }
  if (mission.isPending || scenario.isPending || me.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading scenario…" />
      </div>
    );
  }

  const canEdit = me.data?.role === 'engineer' || me.data?.role === 'lead';
  return <ScenarioView mission={mission.data} scenario={scenario.data} canEdit={canEdit} crumbs={crumbs} />;
}

interface ScenarioViewProps {
  mission: MissionDetail;
  scenario: ScenarioDetail;
  canEdit: boolean;
  crumbs: Array<{ label: string; to?: string }>;
}

function ScenarioView({ mission, scenario, canEdit, crumbs }: ScenarioViewProps) {
  const missionId = mission.id;
  const update = useUpdateScenario(missionId, scenario.id);
  const runs = useRuns(missionId, { scenarioId: scenario.id });
  // The form starts from the scenario as first loaded; a save keeps what the user typed on screen.
  const [initial] = useState(() => draftFromSpec(scenario.name, scenario.spec, scenario.vehicle.id, mission.regime));

  return (
    <div className="flex flex-col gap-6">
      <title>{`${scenario.name} · ${mission.name} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs} />
      <header className="flex flex-col gap-3 md:flex-row md:items-start md:justify-between">
        <div className="flex flex-col gap-2">
          <h1 className="text-2xl font-semibold">{scenario.name}</h1>
          <dl className="flex flex-wrap gap-x-6 gap-y-1 text-xs">
            <Meta term="Vehicle">
              {scenario.vehicle.name} <span className="font-mono">rev. {scenario.vehicle.revision}</span>
            </Meta>
            <Meta term="Orbit" mono>
              {orbitSummary(scenario.spec.orbit)}
            </Meta>
            <Meta term="Epoch" mono>
              {scenario.spec.orbit.epochUtc}
            </Meta>
            <Meta term="Span" mono>
              {spanSummary(scenario.spanDays)}
            </Meta>
            <Meta term="Updated" mono>
              <time dateTime={scenario.updatedAt}>{formatUtcDate(scenario.updatedAt)}</time>
              {scenario.author ? ` by ${scenario.author.displayName}` : ''}
            </Meta>
          </dl>
        </div>
        {canEdit && <StartRunButton missionId={missionId} scenarioId={scenario.id} />}
      </header>

      <section aria-labelledby="scenario-runs-heading" className="flex flex-col gap-3">
        <h2 id="scenario-runs-heading" className="text-lg font-semibold">
          Runs{' '}
          {runs.data && <span className="font-mono text-sm font-normal text-ink-soft">{runs.data.runs.length}</span>}
        </h2>
        {runs.isPending ? (
          <TableSkeleton label="Loading runs…" rows={2} />
        ) : runs.isError ? (
          <ErrorState title="Could not load the runs" error={runs.error} onRetry={() => void runs.refetch()} retrying={runs.isFetching} />
        ) : (
          <RunList missionId={missionId} runs={runs.data.runs} hideScenario />
        )}
      </section>

      <section aria-labelledby="scenario-setup-heading" className="flex flex-col gap-3">
        <div className="flex flex-col gap-0.5">
          <h2 id="scenario-setup-heading" className="text-lg font-semibold">
            Set-up
          </h2>
          <p className="text-xs text-ink-soft">
            {canEdit
              ? 'Saving replaces the scenario; runs already made keep the set-up they were started with.'
              : 'Read only: engineers and leads edit scenarios.'}
          </p>
        </div>
        <ScenarioEditor
          missionId={missionId}
          regime={mission.regime}
          initial={initial}
          readOnly={!canEdit}
          submitLabel="Save scenario"
          onSubmit={(body) => update.mutateAsync(body)}
          actions={canEdit && <DeleteScenario missionId={missionId} scenario={scenario} hasRuns={scenario.runCount > 0 || (runs.data?.runs.length ?? 0) > 0} />}
        />
      </section>
    </div>
  );
}

function Meta({ term, mono, children }: { term: string; mono?: boolean; children: ReactNode }) {
  return (
    <div className="flex gap-1.5">
      <dt className="text-ink-soft">{term}</dt>
      <dd className={mono ? 'font-mono' : undefined}>{children}</dd>
    </div>
  );
}

/** Deletes a scenario that has no runs, after a second click to confirm. */
function DeleteScenario({ missionId, scenario, hasRuns }: { missionId: string; scenario: ScenarioDetail; hasRuns: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteScenario(missionId, scenario.id);
  const navigate = useNavigate();
  if (hasRuns) {
    return <p className="text-xs text-ink-soft">A scenario with runs cannot be deleted.</p>;
  }
  if (!confirming) {
    return (
      <Button variant="quiet" onClick={() => setConfirming(true)}>
        Delete scenario
      </Button>
    );
  }
  return (
    <div className="flex flex-wrap items-center gap-2">
      <span className="text-sm">Delete “{scenario.name}” for good?</span>
      <Button
        className="border-alarm text-alarm"
        disabled={remove.isPending}
        onClick={() =>
          remove.mutate(undefined, { onSuccess: () => void navigate(`/missions/${missionId}`, { replace: true }) })
        }
      >
        {remove.isPending ? 'Deleting…' : 'Yes, delete'}
      </Button>
      <Button variant="quiet" onClick={() => setConfirming(false)} disabled={remove.isPending}>
        Keep it
      </Button>
      {remove.isError && (
        <span role="alert" className="text-sm text-alarm">
          {remove.error.message}
        </span>
      )}
    </div>
  );
}
