import { useState, type ReactNode } from 'react';
import { flushSync } from 'react-dom';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/loading-state';
import { setSessionUser, useMe } from '../../features/auth/api/get-me';
import { useLogout } from '../../features/auth/api/logout';
import { AppShell } from '../app-shell';
import { signInPath } from '../sign-in-redirect';

/** The guard and frame of every signed-in page: without a session it sends the user to sign in, remembering the page. */
export function AppLayoutRoute() {
  const me = useMe();
  const location = useLocation();
  const queryClient = useQueryClient();
  const logout = useLogout();
  const [signedOut, setSignedOut] = useState(false);

  async function signOut() {
    try {
      await logout.mutateAsync();
    } catch {
      return; // logout.error is shown in the header
    }
    // Committed before the session is cleared, so the guard goes to a plain /sign-in instead of remembering this page.
    flushSync(() => setSignedOut(true));
    setSessionUser(queryClient, null);
  }

  if (me.data) {
    return (
      <AppShell user={me.data} onSignOut={() => void signOut()} signingOut={logout.isPending} signOutError={logout.error}>
        <Outlet />
      </AppShell>
    );
  }
  if (me.data === null) return <Navigate to={signedOut ? '/sign-in' : signInPath(location)} replace />;
  if (me.isPending) {
    return (
      <FullPage>
        <LoadingState label="Checking your session…" />
      </FullPage>
    );
  }
  return (
    <FullPage>
      <ErrorState
        title="Could not check your session"
        error={me.error}
        onRetry={() => void me.refetch()}
        retrying={me.isFetching}
      />
    </FullPage>
  );
}

function FullPage({ children }: { children: ReactNode }) {
  return <div className="mx-auto flex min-h-dvh max-w-md flex-col justify-center px-4">{children}</div>;
}
