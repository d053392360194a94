import { useMutation } from '@tanstack/react-query';
import { apiRequestNoContent } from '../../../lib/api-client';

/** `POST /api/auth/logout`: ends the session (the API clears the cookie). */
export function logout(): Promise<void> {
  return apiRequestNoContent('/api/auth/logout', { method: 'POST' });
}

/**
 * Signs out. The caller clears the session with `setSessionUser(queryClient, null)` once it has
 * decided where to go, so that the guard does not redirect first.
 */
export function useLogout() {
  return useMutation({ mutationFn: logout });
}
