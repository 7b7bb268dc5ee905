import type { JobStatus } from '@potlife/domain';
import { labourClosedReason } from './labour.service';

describe('labourClosedReason: when a job’s hours may change', () => {
  // From the issue: hours are recorded from scheduled through in progress to complete; an
  // invoiced job's are read only; before scheduling there is no crew on site (common trade practice, no source).
  it.each<[JobStatus, string | null]>([
    ['enquiry', 'Hours are recorded once a job is scheduled, until it is complete; J-0007 is enquiry'],
    ['quoted', 'Hours are recorded once a job is scheduled, until it is complete; J-0007 is quoted'],
    ['won', 'Hours are recorded once a job is scheduled, until it is complete; J-0007 is won'],
    ['scheduled', null],
    ['in-progress', null],
    ['complete', null],
    ['invoiced', 'J-0007 is invoiced: its hours are closed and can only be read'],
    ['lost', 'Hours are recorded once a job is scheduled, until it is complete; J-0007 is lost'],
    ['cancelled', 'Hours are recorded once a job is scheduled, until it is complete; J-0007 is cancelled'],
  ])('%s → %s', (status, reason) => {
    expect(labourClosedReason({ status, number: 7 })).toBe(reason);
  });
});
