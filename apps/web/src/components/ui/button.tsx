import type { ComponentProps } from 'react';
import { cx } from '../../lib/cx';

/** How a button ranks on its page. */
export type ButtonVariant = 'primary' | 'secondary' | 'quiet';
/** How much room a button takes. */
export type ButtonSize = 'sm' | 'md';

const variantClasses: Record<ButtonVariant, string> = {
  primary: 'bg-sodium-strong text-white hover:bg-sodium-deep active:bg-sodium-deep',
  secondary: 'border border-rule-strong bg-paper-raised text-ink hover:bg-paper-sunk',
  quiet: 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
};

const sizeClasses: Record<ButtonSize, string> = {
  sm: 'h-8 px-3 text-sm',
  md: 'h-10 px-4 text-sm',
};

/** The classes of a button, for links that must look like one. */
export function buttonClasses(variant: ButtonVariant = 'secondary', size: ButtonSize = 'md'): string {
  return cx(
    'inline-flex items-center justify-center gap-2 rounded-md font-medium whitespace-nowrap transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-60',
    variantClasses[variant],
    sizeClasses[size],
  );
}

/** Props of Button: a native button (ref included) plus its look. */
export interface ButtonProps extends ComponentProps<'button'> {
  /** How the button ranks; secondary unless given. */
  variant?: ButtonVariant;
  /** How much room it takes; md unless given. */
  size?: ButtonSize;
}

/** A native button in Photon Ledger's look; `type="button"` unless given. */
export function Button({ variant, size, className, type = 'button', ...rest }: ButtonProps) {
  return <button type={type} className={cx(buttonClasses(variant, size), className)} {...rest} />;
}
