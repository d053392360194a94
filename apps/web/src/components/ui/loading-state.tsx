import { cx } from '../../lib/cx';

/** Props of LoadingState. */
export interface LoadingStateProps {
  /** What is loading, read out by screen readers, e.g. "Loading missions…". */
  label: string;
  className?: string;
}

/** An announced loading indicator (`role="status"`). */
export function LoadingState({ label, className }: LoadingStateProps) {
  return (
    <div role="status" className={cx('flex items-center gap-3 py-6 text-sm text-ink-soft', className)}>
      <span
        aria-hidden="true"
        className="size-4 animate-spin rounded-full border-2 border-rule-strong border-t-sodium motion-reduce:animate-none"
      />
      <span>{label}</span>
    </div>
  );
}
