import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';

/*
 * The scenario form's inputs. Each takes the dot path of its value in the request body
 * (`fieldKey`): its id is derived from it (so a failed submit can focus the first wrong field) and
 * its message is tied to it with aria-describedby. The unit stands beside the input and is part of
 * the accessible name ("Semi-major axis (km)").
 */

/** The id of the input holding `fieldKey`. */
export function fieldId(fieldKey: string, part?: number): string {
  const base = `scenario-${fieldKey.replace(/[^a-zA-Z0-9]+/g, '-')}`;
  return part === undefined ? base : `${base}-${part}`;
}

const inputClasses = (error: boolean) =>
  cx(
    'h-9 w-full min-w-0 rounded-md border bg-paper-raised px-2.5 font-mono text-sm text-ink',
    'focus-visible:border-sodium disabled:cursor-default disabled:border-rule disabled:bg-paper-sunk/50 disabled:text-ink',
    error ? 'border-alarm' : 'border-rule-strong',
  );

function FieldMessage({ id, error, hint }: { id: string; error?: string | undefined; hint?: string | undefined }) {
  return (
    <>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-xs font-medium text-alarm">
          {error}
        </p>
      )}
    </>
  );
}

function describedBy(id: string, error?: string, hint?: string): string | undefined {
  return [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
}

/** A unit as shown beside an input; '-' is shown as "–" (dimensionless). */
function UnitTag({ unit }: { unit: string }) {
  return (
    <span
      aria-hidden="true"
      className="flex h-9 min-w-10 shrink-0 items-center justify-center rounded-md bg-paper-sunk px-2 font-mono text-xs text-ink-soft"
      title={unit === '-' ? 'dimensionless' : unit}
    >
      {unit === '-' ? '–' : unit}
    </span>
  );
}

/** Props of NumberField. */
export interface NumberFieldProps {
  fieldKey: string;
  /** The visible label, without the unit. */
  label: string;
  /** The unit, shown beside the input and read with the label; '-' for a dimensionless number. */
  unit: string;
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: string | undefined;
  hint?: string | undefined;
  placeholder?: string;
  className?: string;
}

/**
 * A number typed as text (so `1e-10` stays as typed), with its unit beside it. The accessible name
 * is "label (unit)"; a dimensionless number is named by its label alone.
 */
export function NumberField({ fieldKey, label, unit, value, onChange, onBlur, error, hint, placeholder, className }: NumberFieldProps) {
  const id = fieldId(fieldKey);
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
        {unit !== '-' && <span className="sr-only"> ({unit})</span>}
      </label>
      <div className="flex items-center gap-1.5">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={value}
          placeholder={placeholder}
          onChange={(event) => onChange(event.target.value)}
          onBlur={onBlur}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, hint)}
          className={inputClasses(Boolean(error))}
        />
        <UnitTag unit={unit} />
      </div>
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** Props of TextInputField. */
export interface TextInputFieldProps {
  fieldKey: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: string | undefined;
  hint?: string | undefined;
  placeholder?: string;
  /** Monospaced for identifiers and instants. */
  mono?: boolean;
  maxLength?: number;
  className?: string;
}

/** A labelled text input with its message. */
export function TextInputField({ fieldKey, label, value, onChange, onBlur, error, hint, placeholder, mono, maxLength, className }: TextInputFieldProps) {
  const id = fieldId(fieldKey);
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={id}
        type="text"
        autoComplete="off"
        value={value}
        placeholder={placeholder}
        maxLength={maxLength}
        onChange={(event) => onChange(event.target.value)}
        onBlur={onBlur}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={cx(inputClasses(Boolean(error)), !mono && 'font-sans')}
      />
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** Props of TextAreaField. */
export interface TextAreaFieldProps {
  fieldKey: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string | undefined;
  maxLength?: number;
}

/** A labelled multi-line text input. */
export function TextAreaField({ fieldKey, label, value, onChange, error, maxLength }: TextAreaFieldProps) {
  const id = fieldId(fieldKey);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <textarea
        id={id}
        rows={2}
        value={value}
        maxLength={maxLength}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error)}
        className={cx(inputClasses(Boolean(error)), 'h-auto min-h-16 py-2 font-sans')}
      />
      <FieldMessage id={id} error={error} />
    </div>
  );
}

/** One choice of a SelectField. */
export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

/** Props of SelectField. */
export interface SelectFieldProps {
  fieldKey: string;
  label: string;
  value: string;
  options: readonly SelectOption[];
  onChange: (value: string) => void;
  error?: string | undefined;
  hint?: string | undefined;
  /** Shown first with the value '' (e.g. "Choose a vehicle…"). */
  placeholder?: string;
  className?: string;
}

/** A labelled native select. */
export function SelectField({ fieldKey, label, value, options, onChange, error, hint, placeholder, className }: SelectFieldProps) {
  const id = fieldId(fieldKey);
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={cx(inputClasses(Boolean(error)), 'font-sans')}
      >
        {placeholder !== undefined && (
          <option value="" disabled>
            {placeholder}
          </option>
        )}
        {options.map((option) => (
          <option key={option.value} value={option.value} disabled={option.disabled}>
            {option.label}
          </option>
        ))}
      </select>
      <FieldMessage id={id} error={error} hint={hint} />
    </div>
  );
}

/** Props of CheckboxField. */
export interface CheckboxFieldProps {
  id: string;
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  hint?: string;
}

/** A labelled checkbox (a force switch, an option). */
export function CheckboxField({ id, label, checked, onChange, hint }: CheckboxFieldProps) {
  return (
    <div className="flex items-start gap-2">
      <input
        id={id}
        type="checkbox"
        checked={checked}
        onChange={(event) => onChange(event.target.checked)}
        aria-describedby={hint ? `${id}-hint` : undefined}
        className="mt-0.5 size-4 shrink-0 accent-sodium-strong"
      />
      <div className="flex flex-col">
        <label htmlFor={id} className="text-sm text-ink">
          {label}
        </label>
        {hint && (
          <span id={`${id}-hint`} className="text-xs text-ink-soft">
            {hint}
          </span>
        )}
      </div>
    </div>
  );
}

/** Props of VectorField. */
export interface VectorFieldProps<T extends readonly string[]> {
  fieldKey: string;
  /** The legend, e.g. "Position"; each input is named "<legend> <component> (<unit>)". */
  legend: string;
  unit: string;
  /** Component names, e.g. ['x', 'y', 'z'] or ['w', 'x', 'y', 'z']. */
  components: readonly string[];
  value: T;
  onChange: (value: T) => void;
  onBlur?: () => void;
  error?: string | undefined;
  hint?: string | undefined;
}

/** A vector or quaternion typed component by component, as a fieldset with one message. */
export function VectorField<T extends readonly string[]>({ fieldKey, legend, unit, components, value, onChange, onBlur, error, hint }: VectorFieldProps<T>) {
  const id = fieldId(fieldKey);
  const unitText = unit === '-' ? '' : ` (${unit})`;
  return (
    <fieldset className="flex min-w-0 flex-col gap-1" aria-describedby={describedBy(id, error, hint)}>
      <legend className="mb-1 text-sm font-medium text-ink">
        {legend}
        {unit !== '-' && <span className="sr-only">{unitText}</span>}
      </legend>
      <div className="flex items-center gap-1.5">
        {components.map((component, index) => (
          <div key={component} className="flex min-w-0 flex-1 items-center gap-1">
            <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
              {component}
            </span>
            <input
              id={fieldId(fieldKey, index)}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              spellCheck={false}
              aria-label={`${legend} ${component}${unitText}`}
              value={value[index] ?? ''}
              onChange={(event) => {
                const next = [...value] as unknown as T & string[];
                next[index] = event.target.value;
                onChange(next);
              }}
              onBlur={onBlur}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${id}-error` : undefined}
              className={inputClasses(Boolean(error))}
            />
          </div>
        ))}
        <UnitTag unit={unit} />
      </div>
      <FieldMessage id={id} error={error} hint={hint} />
    </fieldset>
  );
}

/**
 * A titled group of fields, one card of the form. Deliberately not a named region: its title
 * ("Vehicle") must not compete with a field's label for the same accessible name.
 */
export function FormSection({ title, description, children, id }: { title: string; description?: ReactNode; children: ReactNode; id: string }) {
  return (
    <section className="rounded-lg border border-rule bg-paper-raised p-4 sm:p-5">
      <div className="mb-4 flex flex-col gap-0.5">
        <h2 id={id} className="text-base font-semibold">
          {title}
        </h2>
        {description && <p className="text-xs text-ink-soft">{description}</p>}
      </div>
      <div className="flex flex-col gap-4">{children}</div>
    </section>
  );
}
