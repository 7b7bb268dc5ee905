import type { Role } from '../../../lib/roles';

/** One sentence per role, shown where an owner chooses someone's role. */
export const roleDuties: Record<Role, string> = {
  owner: 'Approves purchase orders, sets rates, manages users and compares quoted against actual.',
  estimator: 'Measures roofs, prices estimates, reserves stock for jobs and drafts purchase orders.',
  storeman: 'Books in deliveries, keeps stock and temperatures, counts the shelves and issues packs to jobs.',
};
