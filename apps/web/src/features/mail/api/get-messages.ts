import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';

/** One message the local mail catcher received, as the list shows it. */
export interface MailMessageSummary {
  id: string;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
  attachmentCount: number;
}

export const mailKeys = {
  all: ['mail'] as const,
  messages: () => [...mailKeys.all, 'messages'] as const,
  list: () => [...mailKeys.messages(), 'list'] as const,
  detail: (id: string) => [...mailKeys.messages(), 'detail', id] as const,
};

export function getMailMessages(signal?: AbortSignal): Promise<MailMessageSummary[]> {
  return apiGet<MailMessageSummary[]>('/mail/messages', { signal });
}

export function mailMessagesQueryOptions() {
  return queryOptions({
    queryKey: mailKeys.list(),
    queryFn: ({ signal }) => getMailMessages(signal),
  });
}

export function useMailMessages() {
  return useQuery(mailMessagesQueryOptions());
}
