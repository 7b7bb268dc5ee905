import { useMutation } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import type { LayingCheckResult } from './types';

export interface LayingCheckBody {
  airC: string;
  surfaceC: string;
  relativeHumidityPct: string;
  raining: boolean;
}

export function layingCheck(body: LayingCheckBody): Promise<LayingCheckResult> {
  return apiPost<LayingCheckResult>('/laying-check', body);
}

export function useLayingCheck() {
  return useMutation({
    mutationFn: layingCheck,
    meta: { errorTitle: 'The laying check did not run' },
  });
}
