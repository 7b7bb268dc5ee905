import type { Role } from '../../../lib/roles';

/** The owner and the storeman open and count; only the owner approves or sends back (as the API allows). */
export const canCount = (role: Role) => role === 'owner' || role === 'storeman';
export const canApprove = (role: Role) => role === 'owner';
