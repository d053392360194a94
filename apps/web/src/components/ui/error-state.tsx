import { cx } from '../../lib/cx';
import { Button } from './button';

/** Props of ErrorState. */
export interface ErrorStateProps {
  /** What failed, e.g. "Could not load missions". */
  title: string;
  /** The error; its message is shown. */
  error: unknown;
  /** Tries again; the retry button is left out without it. */
  onRetry?: () => void;
  /** True while the retry runs. */
  retrying?: boolean;
  className?: string;
}

/** A failure announced as an alert, with the reason and a retry button. */
export function ErrorState({ title, error, onRetry, retrying = false, className }: ErrorStateProps) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <div role="alert" className={cx('rounded-md border border-alarm/40 bg-alarm-wash px-4 py-3 text-sm', className)}>
      <p className="font-semibold text-alarm">{title}</p>
      <p className="mt-1 text-ink">{message}</p>
      {onRetry && (
        <Button size="sm" className="mt-3" onClick={onRetry} disabled={retrying}>
          {retrying ? 'Trying again…' : 'Try again'}
        </Button>
      )}
    </div>
  );
}
