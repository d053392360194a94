import { Link, useParams } from 'react-router-dom';
import { missionParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { TableSkeleton } from '../../features/missions/components/table-skeleton';
import { useMeshes } from '../../features/meshes/api/list-meshes';
import { MeshImportForm } from '../../features/meshes/components/mesh-import-form';
import { MeshList } from '../../features/meshes/components/mesh-list';
import { ApiRequestError } from '../../lib/api-client';

/** `/missions/:missionId/meshes`: imported meshes and, for engineers and leads, the import form. */
export function MeshListRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <MissionNotFound />;
  return <MeshListPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function MeshListPage({ missionId }: { missionId: string }) {
  const mission = useMission(missionId);
  const me = useMe();
  const meshes = useMeshes(missionId);
  const role = me.data?.role;
  const canImport = role === 'engineer' || role === 'lead';
  const missionName = mission.data?.name ?? 'Mission';
  if (meshes.isError && meshes.error instanceof ApiRequestError && meshes.error.status === 404) return <MissionNotFound />;

  return (
    <div className="flex flex-col gap-6">
      <title>{`Meshes · ${missionName} · Photon Ledger`}</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: missionName, to: `/missions/${missionId}` }, { label: 'Meshes' }]} />
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-col gap-1">
          <h1 className="text-2xl font-semibold">
            Meshes {meshes.data && <span className="font-mono text-base font-normal text-ink-soft">{meshes.data.meshes.length}</span>}
          </h1>
          <p className="max-w-3xl text-sm text-ink-soft">
            Triangle meshes of the spacecraft in the body frame, for mesh vehicles: SRP with self-shadowing from a coefficient table over Sun directions.
          </p>
        </div>
        {canImport && (
          <Link to={`/missions/${missionId}/vehicles/new`} className={buttonClasses('secondary', 'sm')}>
            New vehicle
          </Link>
        )}
      </div>
      <section aria-label="Imported meshes">
        {meshes.isPending ? (
          <TableSkeleton label="Loading meshes…" rows={2} />
        ) : meshes.isError ? (
          <ErrorState title="Could not load the meshes" error={meshes.error} onRetry={() => void meshes.refetch()} retrying={meshes.isFetching} />
        ) : (
          <MeshList missionId={missionId} meshes={meshes.data.meshes} canImport={canImport} />
        )}
      </section>
      {role === undefined ? null : canImport ? (
        <MeshImportForm missionId={missionId} />
      ) : (
        <p className="rounded-md border border-rule bg-paper-sunk/60 px-3 py-2 text-sm text-ink-soft">
          Read-only: engineers and leads import meshes; your role sees them as they are.
        </p>
      )}
    </div>
  );
}

function MissionNotFound() {
  return (
    <>
      <title>Mission not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Mission not found" message="There is no mission at this address, or you are not a member of it." />
    </>
  );
}
