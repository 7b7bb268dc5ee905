import { describe, expect, it } from 'vitest';
import { DomainError } from './errors';
import {
  checkJobTransition,
  JOB_STATUSES,
  JOB_TRANSITIONS,
  jobHoldsStock,
  JobStatus,
  nextJobStatuses,
} from './job-status';

// The job workflow is Potlife's own (issue 5), no source.
const ready = { hasAcceptedEstimate: true, hasScheduledDate: true };

describe('job status machine (Potlife’s own workflow, no source)', () => {
  const allowed: [JobStatus, JobStatus][] = [
    ['enquiry', 'quoted'],
    ['enquiry', 'lost'],
    ['enquiry', 'cancelled'],
    ['quoted', 'won'],
    ['quoted', 'lost'],
    ['quoted', 'cancelled'],
    ['won', 'scheduled'],
    ['won', 'cancelled'],
    ['scheduled', 'in-progress'],
    ['scheduled', 'won'],
    ['scheduled', 'cancelled'],
    ['in-progress', 'complete'],
    ['complete', 'invoiced'],
  ];

  it.each(allowed)('%s → %s is allowed', (from, to) => {
    expect(() => checkJobTransition(from, to, ready)).not.toThrow();
  });

  // Every other pair of states is refused, naming both and the allowed next states.
  const refused = JOB_STATUSES.flatMap((from) =>
    JOB_STATUSES.filter((to) => !allowed.some(([f, t]) => f === from && t === to)).map(
      (to) => [from, to] as [JobStatus, JobStatus],
    ),
  );

  it.each(refused)('%s → %s is refused', (from, to) => {
    let error: unknown;
    try {
      checkJobTransition(from, to, ready);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(DomainError);
    expect((error as DomainError).code).toBe('not-allowed');
    expect((error as DomainError).message).toContain(`from ${from} to ${to}`);
    const next = JOB_TRANSITIONS[from];
    expect((error as DomainError).message).toContain(next.length === 0 ? 'it is final' : next.join(', '));
  });

  it('the table and the allowed list agree', () => {
    expect(refused.length + allowed.length).toBe(JOB_STATUSES.length ** 2);
    for (const s of JOB_STATUSES) {
      expect(nextJobStatuses(s)).toEqual(allowed.filter(([f]) => f === s).map(([, t]) => t));
    }
  });

  it.each([
    ['enquiry', 'quoted', { hasAcceptedEstimate: false, hasScheduledDate: true }, /Accept an estimate/],
    ['won', 'scheduled', { hasAcceptedEstimate: true, hasScheduledDate: false }, /scheduled date/],
  ] as const)('%s → %s needs its facts', (from, to, facts, message) => {
    expect(() => checkJobTransition(from, to, facts)).toThrow(message);
  });

  it.each([
    ['unknown from', 'nonsense', 'quoted'],
    ['unknown to', 'enquiry', 'nonsense'],
  ])('refuses an %s state', (_what, from, to) => {
    expect(() => checkJobTransition(from as JobStatus, to as JobStatus, ready)).toThrow(/Unknown job status/);
  });

  it.each<[JobStatus, boolean]>([
    ['enquiry', true],
    ['scheduled', true],
    ['in-progress', true],
    ['complete', false],
    ['invoiced', false],
    ['lost', false],
    ['cancelled', false],
  ])('a %s job holds stock: %s', (status, holds) => {
    expect(jobHoldsStock(status)).toBe(holds);
  });
});
