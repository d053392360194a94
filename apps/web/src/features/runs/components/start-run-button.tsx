import { useNavigate } from 'react-router-dom';
import { Button, type ButtonSize, type ButtonVariant } from '../../../components/ui/button';
import { useStartRun } from '../api/start-run';
import { runPagePath } from '../api/run-path';

/** Props of StartRunButton. */
export interface StartRunButtonProps {
  missionId: string;
  scenarioId: string;
  variant?: ButtonVariant;
  size?: ButtonSize;
}

/** Queues a run of the scenario and opens its page; shows the API's reason when it refuses. */
export function StartRunButton({ missionId, scenarioId, variant = 'primary', size = 'md' }: StartRunButtonProps) {
  const navigate = useNavigate();
  const start = useStartRun(missionId);
  return (
    <div className="flex flex-col items-start gap-2">
      <Button
        variant={variant}
        size={size}
        disabled={start.isPending}
        aria-busy={start.isPending || undefined}
        onClick={() =>
          start.mutate(scenarioId, {
            onSuccess: (run) => void navigate(runPagePath(missionId, run.id)),
          })
        }
      >
        Start run
      </Button>
      {start.isPending && (
        <p role="status" className="text-xs text-ink-soft">
          Queuing the run…
        </p>
      )}
      {start.isError && (
        <p role="alert" className="max-w-md text-sm text-alarm">
          Could not start the run: {start.error.message}
        </p>
      )}
    </div>
  );
}
