import type { ReactNode } from 'react';
import type { Role } from '../../lib/roles';
import { useSessionUser } from '../../lib/session';
import { NeedsRole } from '../routes/NeedsRole';

/** A screen the user's role may not see says so, with the role it needs. */
export function RequireRole({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const user = useSessionUser();
  if (!roles.includes(user.role)) {
    return <NeedsRole roles={roles} current={user.role} />;
  }
  return children;
}
