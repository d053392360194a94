import { useParams } from 'react-router-dom';
import { missionParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { TableSkeleton } from '../../features/missions/components/table-skeleton';
import { useRequirements } from '../../features/requirements/api/list-requirements';
import { RequirementsTable } from '../../features/requirements/components/requirements-table';
import { ApiRequestError } from '../../lib/api-client';

/** `/missions/:missionId/requirements`: the mission's requirements on budget lines (leads edit). */
export function RequirementsRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <RequirementsNotFound />;
  return <RequirementsPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function RequirementsPage({ missionId }: { missionId: string }) {
  const mission = useMission(missionId);
  const requirements = useRequirements(missionId);
  const me = useMe();
  const isLead = me.data?.role === 'lead';
  const crumbs = [
    { label: 'Missions', to: '/missions' },
    { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` },
    { label: 'Requirements' },
  ];

  if (mission.error instanceof ApiRequestError && mission.error.status === 404) return <RequirementsNotFound />;
  if (mission.isError) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load this mission" error={mission.error} onRetry={() => void mission.refetch()} retrying={mission.isFetching} />
      </div>
    );
  }
  if (mission.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading mission…" />
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-6">
      <title>{`Requirements · ${mission.data.name} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs} />
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-semibold">Requirements</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          Each budget line of every run in {mission.data.name} is held to the requirement set here, in the line's own
          unit, with the margin it must keep. A change applies to every budget read after it, finished runs included.
        </p>
        <p className="text-xs text-ink-soft">
          {me.isPending ? '\u00a0' : isLead ? 'You are a systems lead: set, change or remove a requirement per line.' : 'Read only: systems leads set requirements.'}
        </p>
      </header>
      {requirements.isPending ? (
        <TableSkeleton label="Loading requirements…" rows={8} />
      ) : requirements.isError ? (
        <ErrorState
          title="Could not load the requirements"
          error={requirements.error}
          onRetry={() => void requirements.refetch()}
          retrying={requirements.isFetching}
        />
      ) : (
        <RequirementsTable missionId={missionId} requirements={requirements.data.requirements} canEdit={isLead} />
      )}
    </div>
  );
}

function RequirementsNotFound() {
  return (
    <>
      <title>Mission not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Mission not found" message="There is no mission at this address, or you are not a member of it." />
    </>
  );
}
