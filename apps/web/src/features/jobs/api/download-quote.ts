import { useMutation } from '@tanstack/react-query';
import { apiGetBlob, saveBlob } from '../../../lib/api-client';

/** The customer's quote for one estimate version, as a PDF. */
export async function downloadQuote({
  jobId,
  version,
  reference,
}: {
  jobId: string;
  version: number;
  reference: string;
}) {
  const blob = await apiGetBlob(`/jobs/${encodeURIComponent(jobId)}/estimates/${version}/quote.pdf`);
  saveBlob(blob, `${reference}-quote-v${version}.pdf`);
}

export function useDownloadQuote() {
  return useMutation({
    mutationFn: downloadQuote,
    meta: { errorTitle: 'The quote was not downloaded' },
  });
}
