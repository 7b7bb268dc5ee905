import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiGet, apiPatch } from '../../../lib/api-client';

/** The company's rules for reserving and quoting (GET/PATCH /api/settings/jobs). */
export interface JobSettings {
  reservationMarginDays: number;
  quoteValidityDays: number;
  updatedAt: string | null;
}

const key = ['settings', 'jobs'] as const;

export function getJobSettings(signal?: AbortSignal): Promise<JobSettings> {
  return apiGet<JobSettings>('/settings/jobs', { signal });
}

export function jobSettingsQueryOptions() {
  return queryOptions({ queryKey: key, queryFn: ({ signal }) => getJobSettings(signal) });
}

export function useJobSettings() {
  return useQuery(jobSettingsQueryOptions());
}

export function useUpdateJobSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<Pick<JobSettings, 'reservationMarginDays' | 'quoteValidityDays'>>) =>
      apiPatch<JobSettings>('/settings/jobs', body),
    meta: { errorTitle: 'The settings were not saved' },
    onSuccess: (saved) => {
      queryClient.setQueryData(key, saved);
      // Reservations read the margin.
      return queryClient.invalidateQueries({ queryKey: ['jobs'] });
    },
  });
}
