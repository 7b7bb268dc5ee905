import type { Role } from '../../src/common/roles';

/** Who may call each foundation route (see ../route-roles.ts). */
export const FOUNDATION_ROUTES: Record<string, Role[] | 'public'> = {
  'GET /api/health': 'public',
  'POST /api/auth/register': 'public',
  'POST /api/auth/login': 'public',
  'GET /api/auth/me': ['owner', 'estimator', 'storeman'],
  'GET /api/auth/invitations/{token}': 'public',
  'POST /api/auth/invitations/{token}/accept': 'public',
  'GET /api/users': ['owner'],
  'GET /api/users/estimators': ['owner', 'estimator', 'storeman'],
  'POST /api/users/invitations': ['owner'],
  'PATCH /api/users/{id}': ['owner'],
  'GET /api/mail/messages': ['owner'],
  'GET /api/mail/messages/{id}': ['owner'],
  'GET /api/mail/messages/{id}/attachments/{index}': ['owner'],
};
