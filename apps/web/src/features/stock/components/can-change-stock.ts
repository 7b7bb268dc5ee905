import type { Role } from '../../../lib/roles';

/** The owner and the storeman change stock and the store's layout; the estimator reads (as the API allows). */
export function canChangeStock(role: Role): boolean {
  return role === 'owner' || role === 'storeman';
}
