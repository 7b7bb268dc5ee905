import type { Role } from '../../src/common/roles';

/** Who may call each catalogue route (see ../route-roles.ts). */
export const CATALOGUE_ROUTES: Record<string, Role[] | 'public'> = {
  'GET /api/materials': ['owner', 'estimator', 'storeman'],
  'POST /api/materials': ['owner', 'estimator'],
  'GET /api/materials/export.csv': ['owner', 'estimator', 'storeman'],
  'POST /api/materials/import': ['owner', 'estimator'],
  'GET /api/materials/{id}': ['owner', 'estimator', 'storeman'],
  'PATCH /api/materials/{id}': ['owner', 'estimator'],
};
