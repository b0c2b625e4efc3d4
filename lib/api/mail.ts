import { useQuery } from '@tanstack/react-query';
import { useSessionPending } from '@/lib/api/session-gate';
import type { MailMessage } from '@/shared/api/team';
import { api } from '@/lib/api/client';

export const mailKeys = {
  all: ['dev-mail'] as const,
  list: () => [...mailKeys.all, 'list'] as const,
};

/** The mailbox is a development aid: look again often so a just-sent invitation shows up quickly. */
export const MAIL_STALE_MS = 0;
export const MAIL_REFETCH_MS = 5_000;

export function useDevMail(options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: mailKeys.list(),
    queryFn: () => api.get<{ messages: MailMessage[] }>('/api/dev/mail'),
    select: (data) => data.messages,
    staleTime: MAIL_STALE_MS,
    refetchInterval: MAIL_REFETCH_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}
