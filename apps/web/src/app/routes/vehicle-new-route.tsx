import { lazy, Suspense } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { missionParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { LoadingState } from '../../components/ui/loading-state';
import { useMeshes } from '../../features/meshes/api/list-meshes';
import { meshesPagePath } from '../../features/meshes/api/mesh-paths';

// The lit 3D view of a chosen mesh (three, r3f, srp-core's ray caster), loaded when a mesh is chosen.
const MeshView = lazy(() => import('../../features/meshes/components/mesh-view'));

// The editor brings srp-core (for the live preview): loaded with the page, not with the app.
const NewVehicleEditor = lazy(() =>
  import('../../features/vehicles/components/vehicle-editor-containers').then((m) => ({ default: m.NewVehicleEditor })),
);

/** `/missions/:missionId/vehicles/new — a new vehicle (plates, cannonball, sail or mesh) with its live 3D preview. */
export function VehicleNewRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) {
    return <NotFound title="Mission not found" message="There is no mission at this address, or you are not a member of it." />;
  }
  return <VehicleNewPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function VehicleNewPage({ missionId }: { missionId: string }) {
  const navigate = useNavigate();
  const me = useMe();
  const mission = useMission(missionId);
  const role = me.data?.role;
  const canEdit = role === 'engineer' || role === 'lead';
  const missionName = mission.data?.name ?? 'Mission';
  const meshes = useMeshes(missionId);

  return (
    <div className="flex flex-col gap-5">
      <title>{`New vehicle · ${missionName} · Photon Ledger`}</title>
      <Breadcrumbs
        items={[
          { label: 'Missions', to: '/missions' },
          { label: missionName, to: `/missions/${missionId}` },
          { label: 'New vehicle' },
        ]}
      />
      <h1 className="text-2xl font-semibold">New vehicle</h1>
      {role === undefined ? null : canEdit ? (
        <Suspense fallback={<LoadingState label="Loading the editor…" className="min-h-[28rem] items-start" />}>
          <NewVehicleEditor
            missionId={missionId}
            onCreated={(vehicleId) => void navigate(`/missions/${missionId}/vehicles/${vehicleId}`)}
            mesh={{
              meshChoices: { meshes: meshes.data?.meshes, error: meshes.isError ? meshes.error.message : null, meshesPath: meshesPagePath(missionId) },
              renderMeshPreview: (meshId, view) => (
                <Suspense fallback={<LoadingState label="Loading the 3D view…" className="h-[22rem] items-start" />}>
                  <MeshView key={meshId} missionId={missionId} meshId={meshId} optics={view.optics} samplesPerFacet={view.samplesPerFacet} heightClass="h-[22rem]" />
                </Suspense>
              ),
            }}
          />
        </Suspense>
      ) : (
        <div className="flex max-w-xl flex-col items-start gap-3 rounded-lg border border-rule bg-paper-raised p-4 text-sm">
          <p>Engineers and leads create vehicles; your role sees them read-only.</p>
          <Link to={`/missions/${missionId}`} className={buttonClasses('secondary', 'sm')}>
            Back to the mission
          </Link>
        </div>
      )}
    </div>
  );
}
