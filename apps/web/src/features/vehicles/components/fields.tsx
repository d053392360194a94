import { useId, type ReactNode, type SelectHTMLAttributes } from 'react';
import { cx } from '../../../lib/cx';

/*
 * The editor's inputs. Every input has an accessible name that says the unit; a read-only editor
 * renders them disabled and styled as plain text, so reviewers see the same layout with nothing to change.
 */

const inputBase =
  'h-8 rounded-md border bg-paper-raised px-2 text-sm text-ink focus-visible:border-sodium ' +
  'disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:text-ink disabled:opacity-100';

/** Props of CellInput. */
export interface CellInputProps {
  /** Accessible name, e.g. "Plate 2 area (m²)". */
  label: string;
  value: string;
  onChange: (value: string) => void;
  /** Called when the field loses focus (marks it as visited). */
  onBlur?: () => void;
  /** Shows the field as wrong and ties it to `describedBy`. */
  invalid?: boolean;
  /** Id of the message that explains the problem. */
  describedBy?: string | undefined;
  readOnly?: boolean;
  /** Number fields are right-aligned and in the mono face. */
  numeric?: boolean;
  className?: string;
}

/** A compact input for a table cell; its name is in `aria-label` (the column header shows it visually). */
export function CellInput({ label, value, onChange, onBlur, invalid, describedBy, readOnly, numeric = true, className }: CellInputProps) {
  return (
    <input
      type="text"
      inputMode={numeric ? 'decimal' : undefined}
      aria-label={label}
      value={value}
      disabled={readOnly}
      onChange={(e) => onChange(e.target.value)}
      onBlur={onBlur}
      aria-invalid={invalid ? true : undefined}
      aria-describedby={invalid ? describedBy : undefined}
      spellCheck={false}
      autoComplete="off"
      className={cx(
        inputBase,
        numeric && 'text-right font-mono tabular-nums',
        invalid ? 'border-alarm bg-alarm-wash/50' : 'border-rule-strong',
        className,
      )}
    />
  );
}

/** Props of Field. */
export interface FieldProps {
  /** The visible label and accessible name (with the unit, e.g. "Mass (kg)"). */
  label: string;
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  /** The message at this field. */
  error?: string | undefined;
  /** A unit shown inside the field, at its right edge. */
  unit?: string;
  hint?: ReactNode;
  readOnly?: boolean;
  numeric?: boolean;
  className?: string;
  /** The input's width (classes). */
  inputClassName?: string;
}

/** A labelled input with its unit beside the value and its message under it. */
export function Field({ label, value, onChange, onBlur, error, unit, hint, readOnly, numeric, className, inputClassName }: FieldProps) {
  const id = useId();
  const messageId = `${id}-message`;
  const hintId = `${id}-hint`;
  const describedBy = [hint ? hintId : null, error ? messageId : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <div className="flex items-center gap-1.5">
        <input
          id={id}
          type="text"
          inputMode={numeric ? 'decimal' : undefined}
          value={value}
          disabled={readOnly}
          onChange={(e) => onChange(e.target.value)}
          onBlur={onBlur}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          spellCheck={numeric ? false : undefined}
          autoComplete="off"
          className={cx(
            inputBase,
            'h-9',
            numeric && 'text-right font-mono tabular-nums disabled:text-left',
            error ? 'border-alarm' : 'border-rule-strong',
            inputClassName ?? 'w-full',
          )}
        />
        {unit && (
          <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
            {unit}
          </span>
        )}
      </div>
      {hint && (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={messageId} className="text-sm text-alarm">
          {error}
        </p>
      )}
    </div>
  );
}

/** Props of VectorField. */
export interface VectorFieldProps {
  /** The group's name, e.g. "Centre of mass". */
  legend: string;
  /** Unit of the components, e.g. "m"; empty for a direction. */
  unit: string;
  value: readonly [string, string, string];
  onChange: (axis: 0 | 1 | 2, value: string) => void;
  onBlur?: (axis: 0 | 1 | 2) => void;
  /** Message for each component, or for the whole vector at index 3. */
  errors: readonly [string | undefined, string | undefined, string | undefined, string | undefined];
  readOnly?: boolean;
  hint?: ReactNode;
}

const axes = ['x', 'y', 'z'] as const;

/** Three labelled components of a body-frame vector ("Centre of mass x (m)"...). */
export function VectorField({ legend, unit, value, onChange, onBlur, errors, readOnly, hint }: VectorFieldProps) {
  const id = useId();
  const messages = [...new Set(errors.filter((m): m is string => Boolean(m)))];
  const unitText = unit ? ` (${unit})` : '';
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-medium">
        {legend}
        {unitText && <span className="font-normal text-ink-soft">{unitText}</span>}
      </legend>
      <div className="grid grid-cols-3 gap-2">
        {axes.map((axis, i) => {
          const k = i as 0 | 1 | 2;
          const invalid = Boolean(errors[k] ?? errors[3]);
          return (
            <label key={axis} className="flex items-center gap-1.5">
              <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
                {axis}
              </span>
              <CellInput
                label={`${legend} ${axis}${unitText}`}
                value={value[k]}
                onChange={(v) => onChange(k, v)}
                onBlur={onBlur ? () => onBlur(k) : undefined}
                invalid={invalid}
                describedBy={`${id}-message`}
                readOnly={readOnly}
                className="h-9 w-full min-w-0 disabled:text-left"
              />
            </label>
          );
        })}
      </div>
      {hint && <p className="text-xs text-ink-soft">{hint}</p>}
      {messages.length > 0 && (
        <p id={`${id}-message`} className="text-sm text-alarm">
          {messages.join(' · ')}
        </p>
      )}
    </fieldset>
  );
}

/** Props of CellSelect. */
export interface CellSelectProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'onChange' | 'value'> {
  label: string;
  value: string;
  onChange: (value: string) => void;
  invalid?: boolean;
  describedBy?: string | undefined;
  readOnly?: boolean;
}

/** A compact select for a table cell, named by `aria-label`. */
export function CellSelect({ label, value, onChange, invalid, describedBy, readOnly, className, children, ...rest }: CellSelectProps) {
  return (
    <select
      aria-label={label}
      value={value}
      disabled={readOnly}
      onChange={(e) => onChange(e.target.value)}
      aria-invalid={invalid ? true : undefined}
      aria-describedby={invalid ? describedBy : undefined}
      className={cx(
        'h-8 rounded-md border bg-paper-raised px-1.5 text-sm text-ink focus-visible:border-sodium',
        'disabled:appearance-none disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:opacity-100',
        invalid ? 'border-alarm' : 'border-rule-strong',
        className,
      )}
      {...rest}
    >
      {children}
    </select>
  );
}
