import type { JobStatus } from '@potlife/domain';

// The shapes the customers API answers with (apps/api/src/customers/dto), and the jobs list's
// rows as a customer's page shows them. Amounts are decimal strings, formatted for display only.

export type { Customer, CustomerBody } from '../../../lib/customers';

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A job of the customer, as GET /api/jobs?customerId= lists it. */
export interface CustomerJob {
  id: string;
  reference: string;
  title: string;
  status: JobStatus;
  siteAddress: string;
  scheduledOn: string | null;
  estimator: { id: string; name: string } | null;
  /** the accepted estimate's net, £ (null until one is accepted) */
  value?: string | null;
}

export interface CustomerListQuery {
  q: string;
  sort: string;
  page: number;
  pageSize: number;
}
