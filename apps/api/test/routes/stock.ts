import type { Role } from '../../src/common/roles';

/** Who may call each stock route (see ../route-roles.ts). */
export const STOCK_ROUTES: Record<string, Role[] | 'public'> = {};
