import { DomainError } from './errors';

/**
 * Where a job stands (GLOSSARY "job"): enquiry → quoted → won → scheduled → in-progress →
 * complete → invoiced, or lost (the customer said no) or cancelled (the work will not happen).
 */
export type JobStatus =
  'enquiry' | 'quoted' | 'won' | 'scheduled' | 'in-progress' | 'complete' | 'invoiced' | 'lost' | 'cancelled';

export const JOB_STATUSES: readonly JobStatus[] = Object.freeze([
  'enquiry',
  'quoted',
  'won',
  'scheduled',
  'in-progress',
  'complete',
  'invoiced',
  'lost',
  'cancelled',
]);

/**
 * The states a job may move to from each state. Potlife's own workflow, no source: a quote can be
 * lost or withdrawn; won work can be cancelled until a crew starts; once started, the job runs to
 * complete and invoiced. lost, cancelled and invoiced are final.
 */
export const JOB_TRANSITIONS: Readonly<Record<JobStatus, readonly JobStatus[]>> = Object.freeze({
  enquiry: Object.freeze(['quoted', 'lost', 'cancelled'] as JobStatus[]),
  quoted: Object.freeze(['won', 'lost', 'cancelled'] as JobStatus[]),
  won: Object.freeze(['scheduled', 'cancelled'] as JobStatus[]),
  scheduled: Object.freeze(['in-progress', 'won', 'cancelled'] as JobStatus[]),
  'in-progress': Object.freeze(['complete'] as JobStatus[]),
  complete: Object.freeze(['invoiced'] as JobStatus[]),
  invoiced: Object.freeze([] as JobStatus[]),
  lost: Object.freeze([] as JobStatus[]),
  cancelled: Object.freeze([] as JobStatus[]),
});

/** What a transition needs to know of the job besides its state. */
export interface JobFacts {
  /** an estimate has been accepted: the price the quote gives */
  hasAcceptedEstimate: boolean;
  /** the job has a scheduled date */
  hasScheduledDate: boolean;
}

/** The states a job may move to next (empty for a final state). */
export function nextJobStatuses(from: JobStatus): readonly JobStatus[] {
  const next = JOB_TRANSITIONS[from];
  if (next === undefined) {
    throw new DomainError(`Unknown job status: ${JSON.stringify(from)}.`);
  }
  return next;
}

/**
 * Whether a job in this state may hold stock for its date. Once it is complete (what is left comes
 * back as returns), invoiced, lost or cancelled, its reservations are released.
 */
export function jobHoldsStock(status: JobStatus): boolean {
  return status !== 'complete' && status !== 'invoiced' && status !== 'lost' && status !== 'cancelled';
}

function list(states: readonly JobStatus[]): string {
  return states.length === 0 ? 'none: it is final' : states.join(', ');
}

/**
 * Checks a change of state: refuses (DomainError `not-allowed`) a move the table does not allow,
 * naming the states and the allowed next ones; quoting needs an accepted estimate and scheduling
 * a date.
 */
export function checkJobTransition(from: JobStatus, to: JobStatus, facts: JobFacts): void {
  const allowed = nextJobStatuses(from);
  if (!JOB_STATUSES.includes(to)) {
    throw new DomainError(
      `Unknown job status: ${JSON.stringify(to)}. A job's status is one of ${JOB_STATUSES.join(', ')}.`,
    );
  }
  if (!allowed.includes(to)) {
    throw new DomainError(
      `A job cannot go from ${from} to ${to}. From ${from} it may go to: ${list(allowed)}.`,
      'not-allowed',
    );
  }
  if (to === 'quoted' && !facts.hasAcceptedEstimate) {
    throw new DomainError(
      'Accept an estimate before marking the job quoted: the quote gives its price.',
      'not-allowed',
    );
  }
  if (to === 'scheduled' && !facts.hasScheduledDate) {
    throw new DomainError('Give the job a scheduled date before marking it scheduled.', 'not-allowed');
  }
}
