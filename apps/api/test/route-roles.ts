import type { Role } from '../src/common/roles';
import { CATALOGUE_ROUTES } from './routes/catalogue';
import { FOUNDATION_ROUTES } from './routes/foundation';
import { JOBS_ROUTES } from './routes/jobs';
import { STOCK_ROUTES } from './routes/stock';
import { SUPPLIERS_ROUTES } from './routes/suppliers';

/**
 * Who may call each route, one file per module under routes/. The role-matrix test checks this
 * table against every route the API really has (from its OpenAPI document), so a new route
 * without a line here fails the suite.
 */
export const ROUTE_ROLES: Record<string, Role[] | 'public'> = {
  ...FOUNDATION_ROUTES,
  ...CATALOGUE_ROUTES,
  ...SUPPLIERS_ROUTES,
  ...STOCK_ROUTES,
  ...JOBS_ROUTES,
};
