/** Where a user lands after sign-in when nothing else was asked for. */
export const defaultAfterSignIn = '/missions';

/**
 * The path to return to after sign-in, from the `next` search parameter: a path on this site only
 * (no scheme, no `//host`), so that the sign-in page cannot be used to send people elsewhere.
 */
export function safeNextPath(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return defaultAfterSignIn;
  if (next === '/sign-in' || next.startsWith('/sign-in?') || next.startsWith('/sign-in#')) return defaultAfterSignIn;
  return next;
}

/** The sign-in page's address, remembering `location` as the place to return to. */
export function signInPath(location: { pathname: string; search: string; hash: string }): string {
  const here = `${location.pathname}${location.search}${location.hash}`;
  if (here === '/' || here === defaultAfterSignIn) return '/sign-in';
  return `/sign-in?${new URLSearchParams({ next: here }).toString()}`;
}
