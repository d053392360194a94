import { useParams } from 'react-router-dom';
import { missionParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMission } from '../../features/missions/api/get-mission';
import { MemberList } from '../../features/missions/components/member-list';
import { MissionOverview } from '../../features/missions/components/mission-overview';
import { ApiRequestError } from '../../lib/api-client';

/** `/missions/:missionId`: one mission with its members; a 404 page for an id that is malformed or not found. */
export function MissionRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <MissionNotFound />;
  return <MissionPage key={parsed.data.missionId} missionId={parsed.data.missionId} />;
}

function MissionPage({ missionId }: { missionId: string }) {
  const mission = useMission(missionId);

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
  return (
    <div className="flex flex-col gap-8">
      <title>{`${data.name} · Photon Ledger`}</title>
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: data.name }]} />
        <MissionOverview mission={data} />
      </div>
      <section aria-labelledby="members-heading" className="flex flex-col gap-3">
        <h2 id="members-heading" className="text-lg font-semibold">
          Members <span className="font-mono text-sm font-normal text-ink-soft">{data.members.length}</span>
        </h2>
        <MemberList members={data.members} />
      </section>
      <section aria-labelledby="vehicles-heading" className="flex flex-col gap-2">
        <h2 id="vehicles-heading" className="text-lg font-semibold">
          Vehicles
        </h2>
        <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
          No vehicles yet.
        </p>
      </section>
    </div>
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
