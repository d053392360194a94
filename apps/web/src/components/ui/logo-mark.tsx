import { cx } from '../../lib/cx';

/**
 * Photon Ledger's mark: sunlight striking a plate and reflecting, with the push it leaves behind.
 * Decorative: the product name always stands beside it.
 */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" focusable="false" className={cx('size-8 shrink-0', className)}>
      <rect x="1" y="1" width="30" height="30" rx="6" className="fill-ink" />
      <circle cx="8.5" cy="9" r="3.5" className="fill-sodium" />
      <path
        d="M12 11.2 21 16.5M21 16.5 12.5 22"
        fill="none"
        strokeWidth="1.6"
        strokeLinecap="round"
        className="stroke-sodium"
      />
      <path d="M22.5 7v19" strokeWidth="2.4" strokeLinecap="round" className="stroke-paper" />
      <path
        d="M25 16.5h3.5m-1.6-1.8 1.8 1.8-1.8 1.8"
        fill="none"
        strokeWidth="1.4"
        strokeLinecap="round"
        strokeLinejoin="round"
        className="stroke-sage"
      />
    </svg>
  );
}
