import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiJson } from '../../../lib/api-client';
import type { MailList, MailNoticeDetail } from '../../../types/mail';

/** GET /api/admin/mail: where notices go, and the newest ones (organisation admins). */
export function mailQueryOptions() {
  return queryOptions({
    queryKey: ['admin-mail'] as const,
    queryFn: ({ signal }) => apiJson<MailList>('/admin/mail', { signal }),
  });
}

export function useMail() {
  return useQuery(mailQueryOptions());
}

/** GET /api/admin/mail/:id: one notice with its text and the raw message the catcher received. */
export function useMailNotice(id: string | null) {
  return useQuery({
    queryKey: ['admin-mail', id] as const,
    queryFn: ({ signal }) => apiJson<MailNoticeDetail>(`/admin/mail/${id}`, { signal }),
    enabled: id !== null,
  });
}
