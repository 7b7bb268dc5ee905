import type { Role } from '../../src/common/roles';

/** Who may call each suppliers route (see ../route-roles.ts). */
export const SUPPLIERS_ROUTES: Record<string, Role[] | 'public'> = {};
