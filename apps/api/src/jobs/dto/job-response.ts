import type { JobStatus } from '@potlife/domain';
import type { Substrate } from '../entities/job.entity';
import type { RoofSummary } from '@potlife/domain';
import type { StoredRoof } from '@potlife/domain';

export interface Named {
  id: string;
  name: string;
}

/** What the stock side of a job looks like, for the list and calendar. */
export type MaterialState = 'no-estimate' | 'not-reserved' | 'reserved' | 'short' | 'issued';

/** A job in the list. `value` (the accepted estimate's net, £) is left out for a storeman. */
export interface JobResponse {
  id: string;
  reference: string;
  number: number;
  title: string;
  status: JobStatus;
  nextStatuses: readonly JobStatus[];
  statusChangedAt: string;
  customer: Named;
  siteAddress: string;
  substrate: Substrate;
  scheduledOn: string | null;
  estimator: Named | null;
  crew: string | null;
  topcoatColour: string | null;
  buildUp: Named | null;
  hasRoof: boolean;
  roofUpdatedAt: string | null;
  acceptedEstimate: { id: string; version: number } | null;
  value?: string | null;
  materialState: MaterialState;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface StatusChangeResponse {
  from: JobStatus | null;
  to: JobStatus;
  reason: string | null;
  changedBy: Named | null;
  changedAt: string;
}

export interface JobDetailResponse extends JobResponse {
  customerContact: { contactName: string | null; phone: string | null; email: string | null };
  statusHistory: StatusChangeResponse[];
}

export interface JobPage {
  items: JobResponse[];
  total: number;
  page: number;
  pageSize: number;
}

export interface RoofResponse {
  jobId: string;
  updatedAt: string | null;
  /** the roof as measured (null: not measured yet) */
  roof: StoredRoof | null;
  /** worked out by the domain from the roof and the job's build-up (defaults when it has none) */
  summary: RoofSummary | null;
}

export interface CalendarEntry {
  id: string;
  reference: string;
  title: string;
  status: JobStatus;
  scheduledOn: string;
  customer: Named;
  siteAddress: string;
  crew: string | null;
  materialState: MaterialState;
  /** materials short for the job date (0 when all reserved) */
  shortfalls: number;
}

export interface JobSettingsResponse {
  reservationMarginDays: number;
  quoteValidityDays: number;
  updatedAt: string | null;
}
