import type { Role } from '../../../lib/roles';

/** The owner and the estimator edit suppliers and prices; the storeman reads them (as the API allows). */
export function canEditSuppliers(role: Role): boolean {
  return role === 'owner' || role === 'estimator';
}
