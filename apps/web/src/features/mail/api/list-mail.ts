import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailListSchema, type MailList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/admin/mail`: messages the local capture SMTP server received (administrators). */
export function listMail(signal?: AbortSignal): Promise<MailList> {
  return apiRequest('/api/admin/mail', mailListSchema, { signal, query: { limit: '200' } });
}

/** Query options of the captured mail; the only place its key is written. */
export function mailQueryOptions() {
  return queryOptions({ queryKey: ['admin', 'mail'] as const, queryFn: ({ signal }) => listMail(signal), refetchInterval: 10_000 });
}

export function useMailList() {
  return useQuery(mailQueryOptions());
}
