import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Button } from '../../components/ui/button';

/** Shown when a route fails to render: the reason and a way to start again. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error.';
  return (
    <div role="alert" className="mx-auto max-w-xl px-4 py-10">
      <h1 className="text-xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-sm text-ink-soft">This page failed to show. Reloading usually helps; if not, report:</p>
      <pre className="mt-3 overflow-x-auto rounded-md bg-paper-sunk p-3 font-mono text-xs">{message}</pre>
      <Button variant="primary" className="mt-4" onClick={() => window.location.reload()}>
        Reload
      </Button>
    </div>
  );
}
