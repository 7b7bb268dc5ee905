import { customersKey } from '../../../lib/customers';
import type { CustomerListQuery } from './types';

// Under ['customers'], the prefix the jobs screens also refresh when they add a customer.
export const customersKeys = {
  all: customersKey,
  lists: () => [...customersKeys.all, 'list'] as const,
  list: (query: CustomerListQuery) => [...customersKeys.lists(), query] as const,
  detail: (id: string) => [...customersKeys.all, 'detail', id] as const,
  /** A customer's jobs sit with the jobs lists (['jobs', 'list', …]), so any change to a job refreshes them. */
  jobs: (id: string, query: { sort: string; page: number; pageSize: number }) =>
    ['jobs', 'list', { customerId: id, ...query }] as const,
};
