import { useNavigate } from 'react-router-dom';
import type { Run } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { useCancelRun } from '../api/cancel-run';
import { useRerunRun } from '../api/rerun-run';
import { isRunActive } from '../api/list-runs';
import { runPagePath } from '../api/run-path';

/** Cancel (queued or running) or Re-run (finished) for those who may edit; the API's refusal is shown. */
export function RunActions({ run }: { run: Run }) {
  const navigate = useNavigate();
  const cancel = useCancelRun(run.missionId, run.id);
  const rerun = useRerunRun(run.missionId, run.id);
  const active = isRunActive(run);
  const error = cancel.error ?? rerun.error;
  return (
    <div className="flex flex-col items-end gap-2">
      <div className="flex gap-2">
        {active ? (
          <Button onClick={() => cancel.mutate()} disabled={cancel.isPending || run.cancelRequested}>
            {run.cancelRequested ? 'Cancelling…' : 'Cancel run'}
          </Button>
        ) : (
          <Button
            variant={run.status === 'succeeded' ? 'secondary' : 'primary'}
            onClick={() => rerun.mutate(undefined, { onSuccess: (next) => void navigate(runPagePath(run.missionId, next.id)) })}
            disabled={rerun.isPending}
          >
            {rerun.isPending ? 'Queuing…' : 'Re-run'}
          </Button>
        )}
      </div>
      {error && (
        <p role="alert" className="max-w-sm text-right text-sm text-alarm">
          {active ? 'Could not cancel' : 'Could not re-run'}: {error.message}
        </p>
      )}
    </div>
  );
}
