import { NotFound } from '../../components/ui/not-found';

/** Any address no route knows. */
export function NotFoundRoute() {
  return (
    <>
      <title>Page not found · Photon Ledger</title>
      <NotFound title="Page not found" message="There is no page at this address." />
    </>
  );
}
