// Query keys of the jobs screens, hierarchical so a mutation can refresh by prefix: anything under
// ['jobs'] (lists, a job and its roof, estimates and materials, the calendar) or ['customers'].
import { customersKey } from '../../../lib/customers';

export interface JobFilters {
  statuses: string[];
  q: string;
  sort: string;
  page: number;
  pageSize: number;
}

export const jobsKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobsKeys.all, 'list'] as const,
  list: (filters: JobFilters) => [...jobsKeys.lists(), filters] as const,
  detail: (id: string) => [...jobsKeys.all, 'detail', id] as const,
  roof: (id: string) => [...jobsKeys.detail(id), 'roof'] as const,
  estimates: (id: string) => [...jobsKeys.detail(id), 'estimates'] as const,
  estimate: (id: string, version: number) => [...jobsKeys.estimates(id), version] as const,
  materials: (id: string) => [...jobsKeys.detail(id), 'materials'] as const,
};

export const customersKeys = {
  all: customersKey,
  search: (q: string) => [...customersKeys.all, 'search', q] as const,
};

export const buildUpsKeys = {
  all: ['build-ups'] as const,
  active: () => [...buildUpsKeys.all, 'active'] as const,
  detail: (id: string) => [...buildUpsKeys.all, 'detail', id] as const,
};
