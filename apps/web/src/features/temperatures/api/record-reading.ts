import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import { apiSendWithProgress, type SendProgress } from '../../../lib/upload';
import { STOCK_KEY, temperatureKeys, type ImportReadingsResult, type RecordReadingResult } from './types';

export interface ReadingBody {
  locationId: string;
  temperatureC: string;
  takenAt: string;
  note?: string;
}

export function recordReading(body: ReadingBody, key: string): Promise<RecordReadingResult> {
  return apiPost<RecordReadingResult>('/temperature-readings', body, { headers: { 'Idempotency-Key': key } });
}

export function useRecordReading() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, key }: { body: ReadingBody; key: string }) => recordReading(body, key),
    meta: { notifyOnError: false },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: temperatureKeys.all }),
        queryClient.invalidateQueries({ queryKey: STOCK_KEY }),
      ]),
  });
}

/** A data logger's CSV for one location; `dryRun` checks it and saves nothing. */
export function importReadings(
  body: { locationId: string; csv: string; dryRun: boolean },
  key: string | null,
  onProgress?: (progress: SendProgress) => void,
): Promise<ImportReadingsResult> {
  return apiSendWithProgress<ImportReadingsResult>('/temperature-readings/import', {
    body,
    headers: key ? { 'Idempotency-Key': key } : {},
    onProgress,
  });
}
