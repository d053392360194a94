import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import type { User } from '@photon-ledger/shared';
import { Button } from '../components/ui/button';
import { CautionFooter } from '../components/ui/caution-footer';
import { LogoMark } from '../components/ui/logo-mark';
import { cx } from '../lib/cx';
import { roleLabels } from '../lib/role-labels';

/** Props of AppShell. */
export interface AppShellProps {
  /** The signed-in user. */
  user: User;
  onSignOut: () => void;
  /** True while signing out. */
  signingOut: boolean;
  /** Why signing out failed, if it did. */
  signOutError: Error | null;
  children: ReactNode;
}

/** The frame of every signed-in page: header with navigation and user, main content, caution footer. */
export function AppShell({ user, onSignOut, signingOut, signOutError, children }: AppShellProps) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-10 rounded-md bg-ink px-3 py-2 text-sm text-paper focus:not-sr-only focus:absolute focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2 sm:px-6">
          <Link to="/missions" className="flex items-center gap-2.5 rounded-md">
            <LogoMark className="size-7" />
            <span className="font-display text-lg font-semibold tracking-tight">Photon Ledger</span>
          </Link>
          <nav aria-label="Main">
            <ul className="flex items-center gap-1 text-sm">
              <li>
                <NavLink
                  to="/missions"
                  className={({ isActive }) =>
                    cx(
                      'rounded-md px-2.5 py-1.5 font-medium',
                      isActive ? 'bg-ink-wash text-ink' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                    )
                  }
                >
                  Missions
                </NavLink>
              </li>
              {user.role === 'admin' && (
                <li>
                  <NavLink
                    to="/admin/mail"
                    className={({ isActive }) =>
                      cx(
                        'rounded-md px-2.5 py-1.5 font-medium',
                        isActive ? 'bg-ink-wash text-ink' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                      )
                    }
                  >
                    Mail
                  </NavLink>
                </li>
              )}
            </ul>
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <p className="text-right text-sm leading-tight">
              <span className="sr-only">Signed in as </span>
              <span className="font-medium">{user.displayName}</span>
              <span className="sr-only">, </span>
              <span className="block text-xs text-ink-soft">{roleLabels[user.role]}</span>
            </p>
            <Button size="sm" onClick={onSignOut} disabled={signingOut}>
              Sign out
            </Button>
          </div>
        </div>
        {signOutError && (
          <p role="alert" className="border-t border-alarm/30 bg-alarm-wash px-4 py-2 text-center text-sm text-alarm">
            Could not sign out: {signOutError.message}
          </p>
        )}
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 outline-none sm:px-6">
        {children}
      </main>
      <CautionFooter />
    </div>
  );
}
