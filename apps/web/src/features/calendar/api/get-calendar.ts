import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { JobStatus } from '@potlife/domain';
import { apiGet } from '../../../lib/api-client';

export type MaterialState = 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';

/** A scheduled job as GET /api/jobs/calendar gives it. */
export interface CalendarEntry {
  id: string;
  reference: string;
  title: string;
  status: JobStatus;
  scheduledOn: string;
  customer: { id: string; name: string };
  siteAddress: string;
  crew: string | null;
  materialState: MaterialState;
  shortfalls: number;
}

export function getCalendar(from: string, to: string, signal?: AbortSignal): Promise<CalendarEntry[]> {
  const params = new URLSearchParams({ from, to });
  return apiGet<CalendarEntry[]>(`/jobs/calendar?${params.toString()}`, { signal });
}

export function calendarQueryOptions(from: string, to: string) {
  return queryOptions({
    // Under ['jobs'], so anything that changes a job refreshes the calendar too.
    queryKey: ['jobs', 'calendar', from, to] as const,
    queryFn: ({ signal }) => getCalendar(from, to, signal),
    placeholderData: keepPreviousData,
  });
}

export function useCalendar(from: string, to: string) {
  return useQuery(calendarQueryOptions(from, to));
}
