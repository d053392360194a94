import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cx } from '../../lib/cx';

/** Props of TextField: a native input with its label and message. */
export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  /** The visible label, which is also the input's accessible name. */
  label: string;
  /** A message about a wrong value, shown under the input and announced with it. */
  error?: string | undefined;
  /** A short help text under the input. */
  hint?: string | undefined;
  /** Ref to the input, e.g. to focus it after a failed submit. */
  ref?: Ref<HTMLInputElement>;
}

/** A labelled text input with its validation message tied to it by `aria-describedby`. */
export function TextField({ label, error, hint, className, ref, ...rest }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          'h-10 rounded-md border bg-paper-raised px-3 text-sm text-ink placeholder:text-ink-soft/70',
          'focus-visible:border-sodium',
          error ? 'border-alarm' : 'border-rule-strong',
        )}
        {...rest}
      />
      {hint && (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-sm text-alarm">
          {error}
        </p>
      )}
    </div>
  );
}
