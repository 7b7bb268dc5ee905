import type { Role } from '../lib/roles';
import type { SessionUser } from '../lib/session-types';

export function sessionUser(role: Role, overrides: Partial<SessionUser> = {}): SessionUser {
  const names: Record<Role, string> = {
    owner: 'Dana Whitlow',
    estimator: 'Ravi Okafor',
    storeman: 'Col Brennan',
  };
  return {
    id: `user-${role}`,
    email: `${role}@ridgeline.test`,
    name: names[role],
    role,
    companyId: 'company-1',
    companyName: 'Ridgeline Flat Roofing',
    ...overrides,
  };
}
