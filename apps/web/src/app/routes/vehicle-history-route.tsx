import { Link, useParams, useSearchParams } from 'react-router-dom';
import { vehicleRouteParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMission } from '../../features/missions/api/get-mission';
import { useVehicle } from '../../features/vehicles/api/get-vehicle';
import { RevisionCompare, RevisionHistory } from '../../features/vehicles/components/revision-history';
import { ApiRequestError } from '../../lib/api-client';

/** `/missions/:missionId/vehicles/:vehicleId/history — revisions of a vehicle, and what changed between two (`?from=&to=`). */
export function VehicleHistoryRoute() {
  const parsed = vehicleRouteParamsSchema.safeParse(useParams());
  if (!parsed.success) return <HistoryNotFound />;
  const { missionId, vehicleId } = parsed.data;
  return <HistoryPage key={`${missionId}/${vehicleId}`} missionId={missionId} vehicleId={vehicleId} />;
}

const revisionParam = (value: string | null): number | null => {
  const n = Number(value);
  return value !== null && Number.isInteger(n) && n >= 1 ? n : null;
};

function HistoryPage({ missionId, vehicleId }: { missionId: string; vehicleId: string }) {
  const mission = useMission(missionId);
  const vehicle = useVehicle(missionId, vehicleId);
  const [searchParams, setSearchParams] = useSearchParams();
  const missionName = mission.data?.name ?? 'Mission';
  const vehicleName = vehicle.data?.name ?? 'Vehicle';
  const crumbs = [
    { label: 'Missions', to: '/missions' },
    { label: missionName, to: `/missions/${missionId}` },
    { label: vehicleName, to: `/missions/${missionId}/vehicles/${vehicleId}` },
    { label: 'History' },
  ];

  if (vehicle.isPending) {
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <LoadingState label="Loading revisions…" />
      </div>
    );
  }
  if (vehicle.isError) {
    if (vehicle.error instanceof ApiRequestError && vehicle.error.status === 404) return <HistoryNotFound />;
    return (
      <div className="flex flex-col gap-4">
        <Breadcrumbs items={crumbs} />
        <ErrorState title="Could not load the revisions" error={vehicle.error} onRetry={() => void vehicle.refetch()} retrying={vehicle.isFetching} />
      </div>
    );
  }

  const { revisions } = vehicle.data;
  // Default: the latest revision against the one before it.
  const from = revisionParam(searchParams.get('from')) ?? revisions[1]?.revision ?? null;
  const to = revisionParam(searchParams.get('to')) ?? revisions[0]?.revision ?? null;

  return (
    <div className="flex flex-col gap-6">
      <title>{`History of ${vehicleName} · Photon Ledger`}</title>
      <Breadcrumbs items={crumbs} />
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-2xl font-semibold">
          Revision history <span className="font-normal text-ink-soft">· {vehicleName}</span>
        </h1>
        <Link to={`/missions/${missionId}/vehicles/${vehicleId}`} className={buttonClasses('secondary', 'sm')}>
          Back to the vehicle
        </Link>
      </div>
      <section aria-labelledby="revisions-heading" className="flex flex-col gap-3">
        <h2 id="revisions-heading" className="text-lg font-semibold">
          Revisions <span className="font-mono text-sm font-normal text-ink-soft">{revisions.length}</span>
        </h2>
        <RevisionHistory
          revisions={revisions}
          from={from}
          to={to}
          onPick={(which, revision) =>
            setSearchParams(
              (prev) => {
                const next = new URLSearchParams(prev);
                next.set('from', String(which === 'from' ? revision : (from ?? revision)));
                next.set('to', String(which === 'to' ? revision : (to ?? revision)));
                return next;
              },
              { replace: true },
            )
          }
        />
      </section>
      <section aria-labelledby="compare-heading" className="flex flex-col gap-3">
        <h2 id="compare-heading" className="text-lg font-semibold">
          {from !== null && to !== null ? `Changes from r${from} to r${to}` : 'Changes'}
        </h2>
        {revisions.length < 2 ? (
          <p className="text-sm text-ink-soft">Only one revision so far: nothing to compare yet.</p>
        ) : (
          <RevisionCompare missionId={missionId} vehicleId={vehicleId} from={from} to={to} />
        )}
      </section>
    </div>
  );
}

function HistoryNotFound() {
  return (
    <>
      <title>Vehicle not found · Photon Ledger</title>
      <Breadcrumbs items={[{ label: 'Missions', to: '/missions' }, { label: 'Not found' }]} />
      <NotFound title="Vehicle not found" message="There is no vehicle at this address, or you are not a member of its mission." />
    </>
  );
}
