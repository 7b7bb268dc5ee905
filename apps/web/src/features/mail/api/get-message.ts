import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import { mailKeys } from './get-messages';

export interface MailAttachment {
  index: number;
  filename: string;
  contentType: string;
  size: number;
}

export interface MailMessage {
  id: string;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
  /** Either may be missing: a message can be plain text only, or HTML only. */
  text: string | null;
  html: string | null;
  attachments: MailAttachment[];
}

export function getMailMessage(id: string, signal?: AbortSignal): Promise<MailMessage> {
  return apiGet<MailMessage>(`/mail/messages/${encodeURIComponent(id)}`, { signal });
}

export function mailMessageQueryOptions(id: string) {
  return queryOptions({
    queryKey: mailKeys.detail(id),
    queryFn: ({ signal }) => getMailMessage(id, signal),
    // A received message never changes.
    staleTime: Infinity,
  });
}

export function useMailMessage(id: string) {
  return useQuery(mailMessageQueryOptions(id));
}
