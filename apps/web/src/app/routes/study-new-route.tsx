import { useNavigate, useParams } from 'react-router-dom';
import { missionParamsSchema } from '@photon-ledger/shared';
import { Breadcrumbs } from '../../components/ui/breadcrumbs';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { NotFound } from '../../components/ui/not-found';
import { useMe } from '../../features/auth/api/get-me';
import { useMission } from '../../features/missions/api/get-mission';
import { useScenarios } from '../../features/scenarios/api/list-scenarios';
import { studyPagePath } from '../../features/studies/api/study-path';
import { StudyForm } from '../../features/studies/components/study-form';

/** `/missions/:missionId/studies/new`: define a trade study (engineers and leads). */
export function StudyNewRoute() {
  const parsed = missionParamsSchema.safeParse(useParams());
  if (!parsed.success) return <NotFound title="Mission not found" message="There is no mission at this address." />;
  return <StudyNewPage missionId={parsed.data.missionId} />;
}

function StudyNewPage({ missionId }: { missionId: string }) {
  const navigate = useNavigate();
  const mission = useMission(missionId);
  const scenarios = useScenarios(missionId);
  const me = useMe();
  const canEdit = me.data?.role === 'engineer' || me.data?.role === 'lead';
  const crumbs = [{ label: 'Missions', to: '/missions' }, { label: mission.data?.name ?? 'Mission', to: `/missions/${missionId}` }, { label: 'New trade study' }];
  return (
    <div className="flex flex-col gap-6">
      <title>New trade study · Photon Ledger</title>
      <Breadcrumbs items={crumbs} />
      <h1 className="text-2xl font-semibold">New trade study</h1>
      <p className="max-w-3xl text-sm text-ink-soft">
        Vary numeric fields of the base vehicle revision and scenario by path, as a full grid of lists and ranges or as a seeded Monte Carlo
        dispersion. Every case is checked before anything is queued; each case then runs as its own job. A dispersed optical fraction names a
        companion fraction that takes the rest, so absorbed + specular + diffuse stays 1; a drift per year is applied as the value at mid-mission.
      </p>
      {me.isPending || scenarios.isPending ? (
        <LoadingState label="Loading scenarios…" />
      ) : scenarios.isError ? (
        <ErrorState title="Could not load the scenarios" error={scenarios.error} onRetry={() => void scenarios.refetch()} retrying={scenarios.isFetching} />
      ) : !canEdit ? (
        <p className="text-sm text-ink-soft">Only engineers and leads of this mission define studies.</p>
      ) : scenarios.data.scenarios.length === 0 ? (
        <p className="text-sm text-ink-soft">This mission has no scenario yet: a study starts from one.</p>
      ) : (
        <StudyForm
          missionId={missionId}
          scenarios={scenarios.data.scenarios.map((s) => ({ id: s.id, name: s.name }))}
          onCreated={(study) => void navigate(studyPagePath(missionId, study.id))}
        />
      )}
    </div>
  );
}
