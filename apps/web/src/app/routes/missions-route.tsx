import { useSearchParams } from 'react-router-dom';
import { missionRegimeSchema, type MissionRegime } from '@photon-ledger/shared';
import { Button } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { useMissions } from '../../features/missions/api/list-missions';
import { MissionFilters } from '../../features/missions/components/mission-filters';
import { MissionList } from '../../features/missions/components/mission-list';

/** `/missions`: the user's missions, filtered by regime and a search text kept in the URL (`?regime=&q=`). */
export function MissionsRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const parsedRegime = missionRegimeSchema.safeParse(searchParams.get('regime'));
  const regime = parsedRegime.success ? parsedRegime.data : undefined;
  const search = searchParams.get('q') ?? '';
  const filtered = regime !== undefined || search.trim() !== '';
  const missions = useMissions({ regime, q: search });

  function setParams(changes: Record<'regime' | 'q', string | undefined>, replace: boolean) {
    setSearchParams(
      (previous) => {
        const params = new URLSearchParams(previous);
        for (const [key, value] of Object.entries(changes)) {
          if (value) params.set(key, value);
          else params.delete(key);
        }
        return params;
      },
      { replace },
    );
  }

  const count = missions.data?.missions.length;

  return (
    <div className="flex flex-col gap-5">
      <title>Missions · Photon Ledger</title>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-2xl font-semibold">Missions</h1>
        {count !== undefined && (
          <p className="text-sm text-ink-soft">
            <span className="font-mono text-ink">{count}</span> {count === 1 ? 'mission' : 'missions'}
            {filtered ? ' match' : ''}
          </p>
        )}
      </div>
      <MissionFilters
        regime={regime}
        search={search}
        onRegimeChange={(value: MissionRegime | undefined) => setParams({ regime: value, q: search }, false)}
        onSearchChange={(value) => setParams({ regime, q: value.trim() === '' ? undefined : value }, true)}
      />
      <div aria-busy={missions.isFetching} className={missions.isPlaceholderData ? 'opacity-60' : undefined}>
        {missions.isPending ? (
          <LoadingState label="Loading missions…" />
        ) : (
          <div className="flex flex-col gap-4">
            {missions.isError && (
              <ErrorState
                title="Could not load missions"
                error={missions.error}
                onRetry={() => void missions.refetch()}
                retrying={missions.isFetching}
              />
            )}
            {missions.data &&
              (missions.data.missions.length > 0 ? (
                <MissionList missions={missions.data.missions} />
              ) : filtered ? (
                <div className="rounded-lg border border-dashed border-rule-strong px-4 py-8 text-center text-sm">
                  <p>No missions match these filters.</p>
                  <Button size="sm" className="mt-3" onClick={() => setParams({ regime: undefined, q: undefined }, false)}>
                    Clear filters
                  </Button>
                </div>
              ) : (
                <p className="rounded-lg border border-dashed border-rule-strong px-4 py-8 text-center text-sm text-ink-soft">
                  You are not a member of any mission yet. An administrator adds people to missions.
                </p>
              ))}
          </div>
        )}
      </div>
    </div>
  );
}
