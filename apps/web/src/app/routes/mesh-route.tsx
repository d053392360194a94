import { lazy, Suspense } from 'react';
import { useParams } from 'react-router-dom';
import { meshRouteParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { cautionText } from '../../components/ui/caution-footer';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMission } from '../../features/missions/api/get-mission';
import { useMesh } from '../../features/meshes/api/get-mesh';
import { meshesPagePath } from '../../features/meshes/api/mesh-paths';
import { MeshFacts, MeshGroupsTable } from '../../features/meshes/components/mesh-summary';
import { ApiRequestError } from '../../lib/api-client';

// three, r3f and srp-core's ray caster load with this view, not with the app.
const MeshView = lazy(() => import('../../features/meshes/components/mesh-view'));

/** `/missions/:missionId/meshes/:meshId`: a mesh, its groups and its lit/shadowed 3D view. */
export function MeshRoute() {
  const parsed = meshRouteParamsSchema.safeParse(useParams());
  if (!parsed.success) return <MeshNotFound />;
  const { missionId, meshId } = parsed.data;
  return <MeshPage key={`${missionId}/${meshId}`} missionId={missionId} meshId={meshId} />;
}

function MeshPage({ missionId, meshId }: { missionId: string; meshId: string }) {
  const mission = useMission(missionId);
  const mesh = useMesh(missionId, meshId);
  const missionName = mission.data?.name ?? 'Mission';
  const crumbs = (name: string) => [
    { label: 'Missions', to: '/missions' },
    { label: missionName, to: `/missions/${missionId}` },
    { label: 'Meshes', to: meshesPagePath(missionId) },
    { label: name },
  ];
  if (mesh.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs('Mesh')} />
        <LoadingState label="Loading mesh…" className="min-h-[28rem] items-start" />
      </div>
    );
  }
  if (mesh.isError) {
    if (mesh.error instanceof ApiRequestError && mesh.error.status === 404) return <MeshNotFound />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs('Mesh')} />
        <ErrorState title="Could not load this mesh" error={mesh.error} onRetry={() => void mesh.refetch()} retrying={mesh.isFetching} />
      </div>
    );
  }
  const data = mesh.data;
  return (
    <div className="flex flex-col gap-6">
      <title>{`${data.name} · Meshes · ${missionName} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs(data.name)} />
      <div className="flex flex-col gap-1">
        <h1 className="text-2xl font-semibold">{data.name}</h1>
        <p className="text-sm text-ink-soft">
          {data.triangleCount.toLocaleString('en-GB')} triangles in {data.groups.length} group{data.groups.length === 1 ? '' : 's'}, body frame, metres.
        </p>
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="flex flex-col gap-4">
          <section aria-labelledby="mesh-summary-heading" className="flex flex-col gap-2">
            <h2 id="mesh-summary-heading" className="text-lg font-semibold">
              Summary
            </h2>
            <MeshFacts mesh={data} />
          </section>
          <section aria-labelledby="mesh-groups-heading" className="flex flex-col gap-2">
            <h2 id="mesh-groups-heading" className="text-lg font-semibold">
              Groups <span className="font-mono text-sm font-normal text-ink-soft">{data.groups.length}</span>
            </h2>
            <MeshGroupsTable mesh={data} />
          </section>
        </div>
        <section aria-labelledby="mesh-view-heading" className="flex flex-col gap-2">
          <h2 id="mesh-view-heading" className="text-lg font-semibold">
            Lit and shadowed facets
          </h2>
          <Suspense fallback={<LoadingState label="Loading the 3D view…" className="h-[24rem] items-start" />}>
            <MeshView missionId={missionId} meshId={meshId} />
          </Suspense>
        </section>
      </div>
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">{cautionText}</p>
    </div>
  );
}

function MeshNotFound() {
  return (
    <>
      <title>Mesh not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Mesh not found" message="There is no mesh at this address, or you are not a member of its mission." />
    </>
  );
}
