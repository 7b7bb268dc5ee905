import type { JobStatus } from '@potlife/domain';
import type { MaterialState, Substrate } from '../api/types';

export { statusColors, statusLabels } from '../../../lib/job-status';

/** The button that moves a job to a state, as a verb. */
export const statusActions: Record<JobStatus, string> = {
  enquiry: 'Back to enquiry',
  quoted: 'Mark quoted',
  won: 'Mark won',
  scheduled: 'Mark scheduled',
  'in-progress': 'Start the job',
  complete: 'Mark complete',
  invoiced: 'Mark invoiced',
  lost: 'Mark lost',
  cancelled: 'Cancel the job',
};

export const substrateLabels: Record<Substrate, string> = {
  'timber-deck': 'Timber deck',
  osb: 'OSB boards',
  'existing-felt': 'Existing felt',
  asphalt: 'Asphalt',
  concrete: 'Concrete',
  'old-grp': 'Old GRP',
};

export const materialStateLabels: Record<MaterialState, string> = {
  'no-estimate': 'No accepted estimate',
  'not-reserved': 'Not reserved',
  reserved: 'All reserved',
  short: 'Short',
  issued: 'Issued',
};

export const materialStateColors: Record<MaterialState, string> = {
  'no-estimate': 'gray',
  'not-reserved': 'yellow',
  reserved: 'green',
  short: 'red',
  issued: 'blue',
};

/** The roof, estimates and materials of these jobs can no longer change. */
export const CLOSED_STATUSES: readonly JobStatus[] = ['complete', 'invoiced', 'lost', 'cancelled'];
/** Estimates may be made and accepted in these. */
export const ESTIMATING_STATUSES: readonly JobStatus[] = ['enquiry', 'quoted', 'won', 'scheduled'];
