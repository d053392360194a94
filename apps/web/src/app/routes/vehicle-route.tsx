import { lazy, Suspense } from 'react';
import { Link, useParams } from 'react-router-dom';
import { vehicleRouteParamsSchema, type MeshSummary, type VehicleDetail } from '@photon-ledger/shared';
import { Badge } from '../../components/ui/badge';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { useVehicle } from '../../features/vehicles/api/get-vehicle';
import { useMeshes } from '../../features/meshes/api/list-meshes';
import { meshesPagePath, meshPagePath } from '../../features/meshes/api/mesh-paths';
import { ApiRequestError } from '../../lib/api-client';
import { formatUtcDate } from '../../lib/format';

/** `/missions/:missionId/vehicles/:vehicleId — the vehicle editor with its live 3D preview; saving makes a new revision. */
export function VehicleRoute() {
  const parsed = vehicleRouteParamsSchema.safeParse(useParams());
  if (!parsed.success) return <VehicleNotFound />;
  const { missionId, vehicleId } = parsed.data;
  return <VehiclePage key={`${missionId}/${vehicleId}`} missionId={missionId} vehicleId={vehicleId} />;
}

// The editor brings srp-core (for the live preview): loaded with the page, not with the app.
const ExistingVehicleEditor = lazy(() =>
  import('../../features/vehicles/components/vehicle-editor-containers').then((m) => ({ default: m.ExistingVehicleEditor })),
);

// A mesh vehicle's table, its map and the lit 3D view (three, r3f, srp-core): loaded with mesh vehicles only.
const MeshVehicleTable = lazy(() => import('../../features/meshes/components/mesh-vehicle-table'));
const MeshView = lazy(() => import('../../features/meshes/components/mesh-view'));

const kindLabels = { plates: 'Plates', cannonball: 'Cannonball', sail: 'Sail', mesh: 'Mesh' } as const;

function VehiclePage({ missionId, vehicleId }: { missionId: string; vehicleId: string }) {
  const me = useMe();
  const mission = useMission(missionId);
  const vehicle = useVehicle(missionId, vehicleId);
  const isMesh = vehicle.data?.kind === 'mesh';
  const meshes = useMeshes(missionId);
  const missionName = mission.data?.name ?? 'Mission';
  const crumbs = (name: string) => [
    { label: 'Missions', to: '/missions' },
    { label: missionName, to: `/missions/${missionId}` },
    { label: name },
  ];

  if (vehicle.isPending || me.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs('Vehicle')} />
        <LoadingState label="Loading vehicle…" />
      </div>
    );
  }
  if (vehicle.isError) {
    if (vehicle.error instanceof ApiRequestError && vehicle.error.status === 404) return <VehicleNotFound />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs('Vehicle')} />
        <ErrorState title="Could not load this vehicle" error={vehicle.error} onRetry={() => void vehicle.refetch()} retrying={vehicle.isFetching} />
      </div>
    );
  }

  const data = vehicle.data;
  const role = me.data?.role;
  const readOnly = !(role === 'engineer' || role === 'lead');
  const spec = data.latestSpec;
  return (
    <div className="flex flex-col gap-5">
      <title>{`${data.name} · ${missionName} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs(data.name)} />
      <VehicleHeader missionId={missionId} vehicle={data} />
      {spec.kind === 'mesh' && (
        <Suspense fallback={<LoadingState label="Loading the coefficient table…" className="min-h-[28rem] items-start" />}>
          <MeshVehicleTable
            key={`${spec.meshId}/${data.revision}`}
            missionId={missionId}
            meshId={spec.meshId}
            table={data.coefficientTable}
            request={readOnly || data.coefficientTable !== undefined ? undefined : { optics: spec.optics, table: spec.table }}
            editable={readOnly ? undefined : { optics: spec.optics, table: spec.table }}
            optics={spec.optics}
            samplesPerFacet={spec.table.samplesPerFacet}
          />
        </Suspense>
      )}
      <Suspense fallback={<LoadingState label="Loading the editor…" className="min-h-[28rem] items-start" />}>
        <ExistingVehicleEditor
          missionId={missionId}
          vehicle={data}
          readOnly={readOnly}
          onReload={async () => (await vehicle.refetch()).data}
          mesh={{
            meshChoices: { meshes: meshes.data?.meshes, error: meshes.isError ? meshes.error.message : null, meshesPath: meshesPagePath(missionId) },
            renderMeshPreview: (meshId, view) =>
              isMesh ? (
                <ChosenMeshNote missionId={missionId} meshId={meshId} meshes={meshes.data?.meshes} />
              ) : (
                <Suspense fallback={<LoadingState label="Loading the 3D view…" className="h-[22rem] items-start" />}>
                  <MeshView key={meshId} missionId={missionId} meshId={meshId} optics={view.optics} samplesPerFacet={view.samplesPerFacet} heightClass="h-[22rem]" />
                </Suspense>
              ),
          }}
        />
      </Suspense>
    </div>
  );
}

function VehicleHeader({ missionId, vehicle }: { missionId: string; vehicle: VehicleDetail }) {
  const latest = vehicle.revisions[0];
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-semibold">{vehicle.name}</h1>
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink-soft">
          <Badge>{kindLabels[vehicle.kind]}</Badge>
          <span>
            revision <span className="font-mono text-ink">r{vehicle.revision}</span> of {vehicle.revisions.length}
          </span>
          {latest && (
            <span>
              saved <time dateTime={latest.createdAt}>{formatUtcDate(latest.createdAt)}</time>
              {latest.author ? ` by ${latest.author.displayName}` : ''}
            </span>
          )}
        </p>
      </div>
      <Link to={`/missions/${missionId}/vehicles/${vehicle.id}/history`} className={buttonClasses('secondary', 'sm')}>
        Revision history
      </Link>
    </div>
  );
}

/** In the editor of a saved mesh vehicle: the chosen mesh in short (its lit view is with the table above). */
function ChosenMeshNote({ missionId, meshId, meshes }: { missionId: string; meshId: string; meshes: readonly MeshSummary[] | undefined }) {
  const mesh = meshes?.find((m) => m.id === meshId);
  return (
    <div className="flex min-h-[10rem] flex-col gap-2 rounded-lg border border-rule bg-paper-raised px-4 py-3 text-sm">
      {mesh ? (
        <>
          <p>
            <Link to={meshPagePath(missionId, meshId)} className="font-medium underline underline-offset-2">
              {mesh.name}
            </Link>{' '}
            <span className="text-ink-soft">({mesh.fileName})</span>
          </p>
          <p className="font-mono text-xs text-ink-soft">
            {mesh.triangleCount.toLocaleString('en-GB')} triangles · {mesh.groups.length} groups · {mesh.totalAreaM2.toPrecision(4)} m²
          </p>
        </>
      ) : (
        <p className="text-ink-soft">{meshes ? 'This mesh is not in the mission’s list.' : 'Loading the mesh…'}</p>
      )}
      <p className="text-xs text-ink-soft">The lit 3D view and the table’s map of the saved revision are above; a save computes (or finds) the table of the new optics and settings.</p>
    </div>
  );
}

function VehicleNotFound() {
  return (
    <>
      <title>Vehicle not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Vehicle not found" message="There is no vehicle at this address, or you are not a member of its mission." />
    </>
  );
}
