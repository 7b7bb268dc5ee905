import type { Customer, CustomerJob } from './api/types';

// Invented customers of a fictional roofing firm, for the customers screens' tests.

export function customer(overrides: Partial<Customer> = {}): Customer {
  return {
    id: 'cust-1',
    name: 'Harrow Lane Surgery',
    contactName: 'Priya Lennox',
    email: 'practice@harrowlane.test',
    phone: '01632 960 118',
    billingAddress: '3 Harrow Lane, Hollowmere HM2 7PD',
    notes: null,
    jobCount: 2,
    createdAt: '2026-04-02T09:00:00Z',
    updatedAt: '2026-04-02T09:00:00Z',
    ...overrides,
  };
}

export function customerJob(overrides: Partial<CustomerJob> = {}): CustomerJob {
  return {
    id: 'job-1',
    reference: 'J-0012',
    title: 'Rear extension flat roof',
    status: 'won',
    siteAddress: '3 Harrow Lane, Hollowmere HM2 7PD',
    scheduledOn: '2026-06-15',
    estimator: { id: 'user-estimator', name: 'Ravi Okafor' },
    value: '2417.33',
    ...overrides,
  };
}
