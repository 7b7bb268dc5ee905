import type { Role } from '../../src/common/roles';

const ALL: Role[] = ['owner', 'estimator', 'storeman'];
const STORE: Role[] = ['owner', 'storeman'];

/** Who may call each stock route, and the files routes it serves (see ../route-roles.ts). */
export const STOCK_ROUTES: Record<string, Role[] | 'public'> = {
  'GET /api/stock': ALL,
  'GET /api/stock/overview': ALL,
  'GET /api/locations': ALL,
  'GET /api/locations/{id}': ALL,
  'POST /api/locations': STORE,
  'PATCH /api/locations/{id}': STORE,
  'DELETE /api/locations/{id}': STORE,
  'GET /api/lots': ALL,
  'GET /api/lots/{id}': ALL,
  'GET /api/lots/{id}/label.pdf': ALL,
  'POST /api/lots/{id}/quarantine': STORE,
  'POST /api/lots/{id}/release': STORE,
  'POST /api/lots/{id}/clear-flag': STORE,
  'GET /api/stock-movements': ALL,
  'POST /api/stock-movements': STORE,
  'POST /api/stock-movements/{id}/reverse': STORE,
  'GET /api/receipts': ALL,
  'GET /api/receipts/{id}': ALL,
  'POST /api/receipts': STORE,
  'POST /api/receipts/{id}/delivery-note': STORE,
  'GET /api/receipts/{id}/delivery-note': ALL,
  'GET /api/receipts/{id}/labels.pdf': ALL,
  'GET /api/stock-counts': ALL,
  'GET /api/stock-counts/{id}': ALL,
  'POST /api/stock-counts': STORE,
  'PATCH /api/stock-counts/{id}': STORE,
  'POST /api/stock-counts/{id}/submit': STORE,
  'POST /api/stock-counts/{id}/approve': ['owner'],
  'POST /api/stock-counts/{id}/reject': ['owner'],
  'GET /api/temperature-readings': ALL,
  'POST /api/temperature-readings': STORE,
  'POST /api/temperature-readings/import': STORE,
};
