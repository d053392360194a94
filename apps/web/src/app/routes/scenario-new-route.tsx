import { useMemo, useState, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { missionParamsSchema, type MissionRegime, type ScenarioBody } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { useCreateScenario } from '../../features/scenarios/api/create-scenario';
import { ScenarioForm, type RevisionOption, type VehicleOption } from '../../features/scenarios/components/scenario-form';
import { defaultDraft, type ScenarioDraft } from '../../features/scenarios/lib/scenario-draft';
import { vehicleQueryOptions } from '../../features/vehicles/api/get-vehicle';
import { useVehicles } from '../../features/vehicles/api/list-vehicles';
import { ApiRequestError } from '../../lib/api-client';

/** `/missions/:missionId/scenarios/new`: set up a scenario (engineers and leads). */
export function ScenarioNewRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <ScenarioPageNotFound what="Mission" />;
  return <NewScenarioPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function NewScenarioPage({ missionId }: { missionId: string }) {
  const mission = useMission(missionId);
  const me = useMe();
  const navigate = useNavigate();
  const create = useCreateScenario(missionId);
  const canEdit = me.data?.role === 'engineer' || me.data?.role === 'lead';
  const crumbs = [
    { label: 'Missions', to: '/missions' },
    { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` },
    { label: 'New scenario' },
  ];

  if (mission.isPending || me.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading mission…" />
      </div>
    );
  }
  if (mission.isError) {
    if (mission.error instanceof ApiRequestError && mission.error.status === 404) return <ScenarioPageNotFound what="Mission" />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load this mission" error={mission.error} onRetry={() => void mission.refetch()} retrying={mission.isFetching} />
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-6">
      <title>{`New scenario · ${mission.data.name} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs} />
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-semibold">New scenario</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          A vehicle on an initial orbit with the forces, shadow and attitude to propagate. Requirements on the budget
          lines are set per mission by a lead.
        </p>
      </header>
      {canEdit ? (
        <ScenarioEditor
          missionId={missionId}
          regime={mission.data.regime}
          initial={defaultDraft(mission.data.regime)}
          readOnly={false}
          submitLabel="Create scenario"
          onSubmit={async (body) => {
            const scenario = await create.mutateAsync(body);
            void navigate(`/missions/${missionId}/scenarios/${scenario.id}`, { replace: true });
          }}
        />
      ) : (
        <div className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm">
          <p>Only engineers and leads set up scenarios; your role reads them.</p>
          <Link to={`/missions/${missionId}`} className={`${buttonClasses('secondary', 'sm')} mt-3`}>
            Back to the mission
          </Link>
        </div>
      )}
    </div>
  );
}

/** Props of ScenarioEditor. */
export interface ScenarioEditorProps {
  missionId: string;
  regime: MissionRegime;
  initial: ScenarioDraft;
  readOnly: boolean;
  submitLabel: string;
  onSubmit: (body: ScenarioBody) => Promise<unknown>;
  actions?: ReactNode;
}

/**
 * The scenario form with the mission's vehicles and the chosen vehicle's revision history, which
 * come from the vehicles feature (features meet here, in the routes).
 */
export function ScenarioEditor({ missionId, regime, initial, readOnly, submitLabel, onSubmit, actions }: ScenarioEditorProps) {
  const [vehicleId, setVehicleId] = useState(initial.vehicleId);
  const vehicles = useVehicles(missionId);
  const vehicle = useQuery({ ...vehicleQueryOptions(missionId, vehicleId), enabled: vehicleId !== '' });

  const vehicleOptions: VehicleOption[] | undefined = useMemo(
    () =>
      vehicles.data?.vehicles.map((v) => ({
        id: v.id,
        name: v.name,
        revision: v.revision,
        latestRevisionId: v.latestRevisionId,
      })),
    [vehicles.data],
  );
  const revisions: RevisionOption[] | undefined = useMemo(
    () =>
      vehicle.data?.revisions.map((r) => ({ id: r.id, revision: r.revision, note: r.note, createdAt: r.createdAt })),
    [vehicle.data],
  );

  return (
    <div className="flex flex-col gap-3">
      {vehicles.isError && (
        <ErrorState title="Could not load the vehicles" error={vehicles.error} onRetry={() => void vehicles.refetch()} retrying={vehicles.isFetching} />
      )}
      {!readOnly && vehicles.data?.vehicles.length === 0 && (
        <p className="rounded-md border border-dashed border-rule-strong px-4 py-3 text-sm">
          This mission has no vehicle yet.{' '}
          <Link to={`/missions/${missionId}/vehicles/new`} className="font-medium underline underline-offset-2">
            Define a vehicle
          </Link>{' '}
          first.
        </p>
      )}
      <ScenarioForm
        missionId={missionId}
        regime={regime}
        initial={initial}
        vehicles={vehicleOptions}
        revisions={vehicleId === '' ? undefined : revisions}
        onVehicleChange={setVehicleId}
        readOnly={readOnly}
        submitLabel={submitLabel}
        onSubmit={onSubmit}
        actions={actions}
      />
    </div>
  );
}

/** The 404 page of a scenario address. */
export function ScenarioPageNotFound({ what, missionId }: { what: 'Mission' | 'Scenario'; missionId?: string }) {
  return (
    <>
      <title>{`${what} not found · Photon Ledger`}</title>
      <Breadcrumbs
        items={[
          { label: 'Missions', to: '/missions' },
          ...(missionId ? [{ label: 'Mission', to: `/missions/${missionId}` }] : []),
          { label: 'Not found' },
        ]}
      />
      <NotFound
        title={`${what} not found`}
        message={
          what === 'Mission'
            ? 'There is no mission at this address, or you are not a member of it.'
            : 'There is no scenario at this address in this mission; it may have been deleted.'
        }
      />
    </>
  );
}
