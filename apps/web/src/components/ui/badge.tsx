import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

/** The colour of a badge. */
export type BadgeTone = 'sodium' | 'sage' | 'ink';

const toneClasses: Record<BadgeTone, string> = {
  sodium: 'bg-sodium-wash text-sodium-deep',
  sage: 'bg-sage-wash text-sage-deep',
  ink: 'bg-ink-wash text-ink',
};

/** A small label for a category, such as a role or a regime. */
export function Badge({ tone = 'ink', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span className={cx('inline-flex items-center rounded px-1.5 py-0.5 text-xs font-medium', toneClasses[tone])}>
      {children}
    </span>
  );
}
