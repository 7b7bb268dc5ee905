import type { JobStatus } from '@potlife/domain';

// A job's status in words and colour, for every screen that lists jobs (jobs, calendar, customers).
export const statusLabels: Record<JobStatus, string> = {
  enquiry: 'Enquiry',
  quoted: 'Quoted',
  won: 'Won',
  scheduled: 'Scheduled',
  'in-progress': 'In progress',
  complete: 'Complete',
  invoiced: 'Invoiced',
  lost: 'Lost',
  cancelled: 'Cancelled',
};

export const statusColors: Record<JobStatus, string> = {
  enquiry: 'gray',
  quoted: 'blue',
  won: 'teal',
  scheduled: 'indigo',
  'in-progress': 'resin',
  complete: 'green',
  invoiced: 'dark',
  lost: 'red',
  cancelled: 'red',
};
