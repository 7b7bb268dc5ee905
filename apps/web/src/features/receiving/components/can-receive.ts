import type { Role } from '../../../lib/roles';

/** The owner and the storeman book deliveries in (as the API allows). */
export function canReceive(role: Role): boolean {
  return role === 'owner' || role === 'storeman';
}
