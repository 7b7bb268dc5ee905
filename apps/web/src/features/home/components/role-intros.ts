import type { Role } from '../../../lib/roles';

export interface RoleIntro {
  summary: string;
  duties: string[];
}

// What each role will do in Potlife, as the home page tells them.
export const roleIntros: Record<Role, RoleIntro> = {
  owner: {
    summary:
      'You run the company side of Potlife: who may sign in, what is bought and what each job really cost.',
    duties: [
      'Approve purchase orders before they go to suppliers.',
      'Set the labour and material rates that estimates are priced with.',
      'Invite your estimators and storemen and decide each one’s role.',
      'Compare what each job was quoted against the materials and labour it actually took.',
    ],
  },
  estimator: {
    summary:
      'You turn roofs into numbers: measured areas and edges, take-offs, priced estimates and the stock to lay them.',
    duties: [
      'Measure each roof area by area, with its edges, upstands, pipes and outlets.',
      'Price take-offs from a build-up into numbered estimates.',
      'Reserve the packs a job needs for its date and see any shortfall early.',
      'Draft purchase orders for what the store cannot cover.',
    ],
  },
  storeman: {
    summary:
      'You keep the store honest: every lot booked in, in date, stored right and traceable to the job it went to.',
    duties: [
      'Book in deliveries lot by lot, with batch numbers and expiry dates.',
      'Record store temperatures and flag lots kept outside their range.',
      'Count the shelves and settle the differences.',
      'Issue packs to jobs from pick lists, oldest first, and take back what returns.',
    ],
  },
};
