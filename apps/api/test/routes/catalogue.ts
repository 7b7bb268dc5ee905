import type { Role } from '../../src/common/roles';

/** Who may call each catalogue route (see ../route-roles.ts). */
export const CATALOGUE_ROUTES: Record<string, Role[] | 'public'> = {};
