import type { Role } from '../../src/common/roles';

const ALL: Role[] = ['owner', 'estimator', 'storeman'];
const EDITORS: Role[] = ['owner', 'estimator'];

/** Who may call each jobs route (see ../route-roles.ts). Storemen never see prices or margins. */
export const JOBS_ROUTES: Record<string, Role[] | 'public'> = {
  'GET /api/customers': EDITORS,
  'POST /api/customers': EDITORS,
  'GET /api/customers/{id}': EDITORS,
  'PATCH /api/customers/{id}': EDITORS,
  'GET /api/build-ups': EDITORS,
  'POST /api/build-ups': ['owner'],
  'GET /api/build-ups/{id}': EDITORS,
  'PATCH /api/build-ups/{id}': ['owner'],
  'GET /api/jobs': ALL,
  'POST /api/jobs': EDITORS,
  'GET /api/jobs/calendar': ALL,
  'GET /api/jobs/{id}': ALL,
  'PATCH /api/jobs/{id}': EDITORS,
  'POST /api/jobs/{id}/status': EDITORS,
  'GET /api/jobs/{id}/roof': ALL,
  'PUT /api/jobs/{id}/roof': EDITORS,
  'GET /api/settings/jobs': EDITORS,
  'PATCH /api/settings/jobs': ['owner'],
  'POST /api/jobs/{id}/estimates': EDITORS,
  'GET /api/jobs/{id}/estimates': EDITORS,
  'GET /api/jobs/{id}/estimates/{n}': EDITORS,
  'POST /api/jobs/{id}/estimates/{n}/accept': EDITORS,
  'GET /api/jobs/{id}/estimates/{n}/quote.pdf': EDITORS,
  'POST /api/laying-check': ALL,
  'GET /api/jobs/{id}/reservations': ALL,
  'POST /api/jobs/{id}/reservations': EDITORS,
  'DELETE /api/jobs/{id}/reservations': EDITORS,
  'GET /api/jobs/{id}/pick-list': ALL,
  'GET /api/jobs/{id}/pick-list.pdf': ALL,
  'POST /api/jobs/{id}/issues': ['owner', 'storeman'],
  'POST /api/jobs/{id}/returns': ['owner', 'storeman'],
  'GET /api/jobs/{id}/reconciliation': EDITORS,
  'GET /api/jobs/{id}/labour': ALL,
  'POST /api/jobs/{id}/labour': EDITORS,
  'DELETE /api/jobs/{id}/labour/{entryId}': EDITORS,
};
