import type { Role } from '../../../lib/roles';

/** The owner and the estimator edit the catalogue; the storeman reads it (as the API allows). */
export function canEditCatalogue(role: Role): boolean {
  return role === 'owner' || role === 'estimator';
}
