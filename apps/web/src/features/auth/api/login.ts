import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponseSchema, type LoginRequest, type User } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { setSessionUser } from './get-me';

/** `POST /api/auth/login`: signs in (the API sets the session cookie) and returns the user. */
export async function login(credentials: LoginRequest): Promise<User> {
  const { user } = await apiRequest('/api/auth/login', meResponseSchema, { method: 'POST', body: credentials });
  return user;
}

/** Signs in; on success the session query holds the new user. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (user) => setSessionUser(queryClient, user),
  });
}
