import { queryOptions, useQuery } from '@tanstack/react-query';
import dayjs from 'dayjs';
import { apiGet } from '../../../lib/api-client';

export type MaterialState = 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';

export interface UpcomingJob {
  id: string;
  reference: string;
  title: string;
  scheduledOn: string;
  customer: { id: string; name: string };
  materialState: MaterialState;
  shortfalls: number;
}

export interface EstimatorOverview {
  upcoming: UpcomingJob[];
  enquiries: number;
}

export const UPCOMING_DAYS = 30;

/** The next month's scheduled jobs (GET /api/jobs/calendar) and how many enquiries wait for an estimate. */
export async function getEstimatorOverview(signal?: AbortSignal): Promise<EstimatorOverview> {
  const from = dayjs().format('YYYY-MM-DD');
  const to = dayjs().add(UPCOMING_DAYS, 'day').format('YYYY-MM-DD');
  const [upcoming, enquiries] = await Promise.all([
    apiGet<UpcomingJob[]>(`/jobs/calendar?from=${from}&to=${to}`, { signal }),
    apiGet<{ total: number }>('/jobs?status=enquiry&pageSize=1', { signal }),
  ]);
  return { upcoming, enquiries: enquiries.total };
}

export function estimatorOverviewQueryOptions() {
  return queryOptions({
    // Under ['jobs'], so a change to any job refreshes it.
    queryKey: ['jobs', 'home-overview'] as const,
    queryFn: ({ signal }) => getEstimatorOverview(signal),
  });
}

export function useEstimatorOverview() {
  return useQuery(estimatorOverviewQueryOptions());
}
