import type { CustomerListQuery } from './types';

// Under ['customers'], the prefix the jobs screens also refresh when they add a customer.
export const customersKeys = {
  all: ['customers'] as const,
  lists: () => [...customersKeys.all, 'list'] as const,
  list: (query: CustomerListQuery) => [...customersKeys.lists(), query] as const,
  detail: (id: string) => [...customersKeys.all, 'detail', id] as const,
  jobs: (id: string, query: { sort: string; page: number; pageSize: number }) =>
    [...customersKeys.detail(id), 'jobs', query] as const,
};
