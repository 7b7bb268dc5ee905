import type { Role } from '../../src/common/roles';

/** Who may call each suppliers route (see ../route-roles.ts). */
export const SUPPLIERS_ROUTES: Record<string, Role[] | 'public'> = {
  'GET /api/suppliers': ['owner', 'estimator', 'storeman'],
  'POST /api/suppliers': ['owner', 'estimator'],
  'GET /api/suppliers/{id}': ['owner', 'estimator', 'storeman'],
  'PATCH /api/suppliers/{id}': ['owner', 'estimator'],
  'POST /api/suppliers/{id}/contacts': ['owner', 'estimator'],
  'PATCH /api/suppliers/{id}/contacts/{contactId}': ['owner', 'estimator'],
  'DELETE /api/suppliers/{id}/contacts/{contactId}': ['owner', 'estimator'],
  'GET /api/suppliers/{id}/prices': ['owner', 'estimator', 'storeman'],
  'POST /api/suppliers/{id}/prices': ['owner', 'estimator'],
  'GET /api/suppliers/{id}/prices/export.csv': ['owner', 'estimator', 'storeman'],
  'POST /api/suppliers/{id}/prices/import': ['owner', 'estimator'],
  'GET /api/materials/{id}/prices': ['owner', 'estimator', 'storeman'],
};
