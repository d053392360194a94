import { cx } from '../../../lib/cx';

/** Percent text of a fraction 0..1, e.g. `42 %`; clamped. */
export function formatProgress(fraction: number): string {
  const clamped = Math.min(1, Math.max(0, Number.isFinite(fraction) ? fraction : 0));
  const percent = clamped * 100;
  // Whole percents, but never "100 %" before the run is really done.
  const shown = percent > 99 && percent < 100 ? 99 : Math.floor(percent);
  return `${shown} %`;
}

/** Props of RunProgressBar. */
export interface RunProgressBarProps {
  /** Fraction done, 0..1. */
  progress: number;
  /** Accessible name, e.g. "Run progress". */
  label?: string;
  /** Shows the percentage beside the bar. */
  showText?: boolean;
  /** Thin (table cell) or thick (run page). */
  size?: 'sm' | 'lg';
  /** True while queued: the bar is shown as waiting. */
  waiting?: boolean;
  className?: string;
}

/** A progressbar with its percentage; announced with aria-valuenow. */
export function RunProgressBar({ progress, label = 'Run progress', showText = true, size = 'sm', waiting = false, className }: RunProgressBarProps) {
  const clamped = Math.min(1, Math.max(0, Number.isFinite(progress) ? progress : 0));
  const text = waiting ? 'Waiting for a worker' : formatProgress(clamped);
  return (
    <div className={cx('flex items-center gap-2', className)}>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={waiting ? undefined : Math.round(clamped * 100)}
        aria-valuetext={text}
        className={cx('relative grow overflow-hidden rounded-full bg-paper-sunk', size === 'lg' ? 'h-3' : 'h-1.5')}
      >
        <div
          className={cx(
            'h-full rounded-full transition-[width] duration-500 motion-reduce:transition-none',
            waiting ? 'w-full animate-pulse bg-rule motion-reduce:animate-none' : 'bg-sodium',
          )}
          style={waiting ? undefined : { width: `${clamped * 100}%` }}
        />
      </div>
      {showText && (
        <span className={cx('shrink-0 font-mono tabular-nums text-ink-soft', size === 'lg' ? 'min-w-12 text-right text-sm' : 'w-10 text-right text-xs')}>
          {text}
        </span>
      )}
    </div>
  );
}
