import { useMutation } from '@tanstack/react-query';
import { apiGetBlob, saveBlob } from '../../../lib/api-client';

/** The storeman's printable pick list, with the cautions for what is on it. */
export async function downloadPickList({ jobId, reference }: { jobId: string; reference: string }) {
  const blob = await apiGetBlob(`/jobs/${encodeURIComponent(jobId)}/pick-list.pdf`);
  saveBlob(blob, `${reference}-pick-list.pdf`);
}

export function useDownloadPickList() {
  return useMutation({
    mutationFn: downloadPickList,
    meta: { errorTitle: 'The pick list was not downloaded' },
  });
}
