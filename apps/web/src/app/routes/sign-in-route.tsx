import { useState } from 'react';
import { Navigate, useSearchParams } from 'react-router-dom';
import type { LoginRequest } from '@photon-ledger/shared';
import { CautionFooter } from '../../components/ui/caution-footer';
import { LoadingState } from '../../components/ui/loading-state';
import { LogoMark } from '../../components/ui/logo-mark';
import { useMe } from '../../features/auth/api/get-me';
import { usePublicConfig } from '../../features/auth/api/get-public-config';
import { DemoAccounts } from '../../features/auth/components/demo-accounts';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNextPath } from '../sign-in-redirect';

/** `/sign-in`: the sign-in form, and the demo accounts in demo mode; once signed in, back to where the user was going. */
export function SignInRoute() {
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));
  const me = useMe();
  const config = usePublicConfig();
  // A new serial remounts the form with the chosen account filled in and its old messages gone.
  const [filled, setFilled] = useState<{ values: LoginRequest; serial: number } | null>(null);

  if (me.data) return <Navigate to={next} replace />;

  const demoAccounts = config.data?.demoMode ? config.data.demoAccounts : [];

  return (
    <div className="flex min-h-dvh flex-col">
      <title>Sign in · Photon Ledger</title>
      <header className="border-b border-rule bg-paper-raised">
        <div className="mx-auto flex max-w-6xl items-center gap-2.5 px-4 py-2.5 sm:px-6">
          <LogoMark className="size-7" />
          <span className="font-display text-lg font-semibold tracking-tight">Photon Ledger</span>
        </div>
      </header>
      <main id="main" className="flex-1">
        <div className="mx-auto grid max-w-6xl items-start gap-6 px-4 py-10 sm:px-6 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)] lg:gap-10">
          <section aria-labelledby="sign-in-heading" className="rounded-lg border border-rule bg-paper-raised p-6">
            <h1 id="sign-in-heading" className="text-xl font-semibold">
              Sign in to Photon Ledger
            </h1>
            <p className="mt-1 mb-5 text-sm text-ink-soft">
              Solar radiation pressure budgets for spacecraft and solar sails.
            </p>
            {me.isPending ? (
              <LoadingState label="Checking your session…" />
            ) : (
              <SignInForm
                key={filled?.serial ?? 0}
                {...(filled ? { initialValues: filled.values, focusSubmit: true } : {})}
              />
            )}
          </section>
          {demoAccounts.length > 0 && (
            <DemoAccounts
              accounts={demoAccounts}
              onUse={(account) =>
                setFilled((previous) => ({
                  values: { email: account.email, password: account.password },
                  serial: (previous?.serial ?? 0) + 1,
                }))
              }
            />
          )}
        </div>
      </main>
      <CautionFooter />
    </div>
  );
}
