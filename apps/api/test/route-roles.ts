import type { Role } from '../src/common/roles';

/**
 * Who may call each route. The role-matrix test checks this table against every route the API
 * really has (from its OpenAPI document), so a new route without a line here fails the suite.
 */
export const ROUTE_ROLES: Record<string, Role[] | 'public'> = {
  'GET /api/health': 'public',
  'POST /api/auth/register': 'public',
  'POST /api/auth/login': 'public',
  'GET /api/auth/me': ['owner', 'estimator', 'storeman'],
  'GET /api/auth/invitations/{token}': 'public',
  'POST /api/auth/invitations/{token}/accept': 'public',
  'GET /api/users': ['owner'],
  'POST /api/users/invitations': ['owner'],
  'PATCH /api/users/{id}': ['owner'],
  'GET /api/mail/messages': ['owner'],
  'GET /api/mail/messages/{id}': ['owner'],
  'GET /api/mail/messages/{id}/attachments/{index}': ['owner'],
};
