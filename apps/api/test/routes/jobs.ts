import type { Role } from '../../src/common/roles';

/** Who may call each jobs route (see ../route-roles.ts). */
export const JOBS_ROUTES: Record<string, Role[] | 'public'> = {};
