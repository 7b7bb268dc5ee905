import { LINE_ROLE_KINDS, type LineRole, type MaterialKind } from '@potlife/domain';
import type { Estimate } from '../../api/types';

// What the estimator may choose before a run: the material of each line role. The roles come from
// the last version (or, with none yet, every role of the domain's LINE_ROLE_KINDS); the choices are
// the company's active catalogue materials of the role's kind (../../api/get-run-materials.ts).

/** A line role in plain words. */
export const roleLabels: Record<LineRole, string> = {
  mat: 'Mat',
  'base-resin': 'Deck resin',
  'bandage-resin': 'Resin for the bandage',
  topcoat: 'Topcoat',
  catalyst: 'Catalyst',
  'trim:drip': 'Drip trim',
  'trim:kerb': 'Kerb trim',
  'trim:wall': 'Wall trim',
  'trim:angle': 'Angle trim',
  'corner:external': 'External corner pieces',
  'corner:internal': 'Internal corner pieces',
  outlet: 'Outlet pieces',
  bandage: 'Bandage',
  acetone: 'Acetone',
  adhesive: 'Trim adhesive',
  battens: 'Battens',
  nails: 'Clout nails',
};

export interface RunRole {
  role: LineRole;
  kind: MaterialKind;
  /** what the last version used for it, if anything */
  used: { id: string; name: string } | null;
}

/** The roles to choose for: those of the last version, or every role when there is none. */
export function runRoles(last: Estimate | undefined): RunRole[] {
  if (!last) {
    return (Object.entries(LINE_ROLE_KINDS) as [LineRole, MaterialKind][]).map(([role, kind]) => ({
      role,
      kind,
      used: null,
    }));
  }
  return last.lines.map((l) => ({ role: l.role, kind: l.materialKind, used: l.material }));
}
