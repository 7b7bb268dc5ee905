import { useMutation } from '@tanstack/react-query';
import { apiGetBlob, saveBlob } from '../../../lib/api-client';

export interface AttachmentRef {
  messageId: string;
  index: number;
  filename: string;
}

/** Fetches one attachment with the bearer token (a plain link would go without it). */
export function downloadAttachment({ messageId, index }: AttachmentRef): Promise<Blob> {
  return apiGetBlob(`/mail/messages/${encodeURIComponent(messageId)}/attachments/${index}`);
}

export function useDownloadAttachment() {
  return useMutation({
    mutationFn: async (ref: AttachmentRef) => {
      const blob = await downloadAttachment(ref);
      saveBlob(blob, ref.filename || `attachment-${ref.index + 1}`);
    },
    meta: { errorTitle: 'The attachment was not downloaded' },
  });
}
