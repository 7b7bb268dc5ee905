/**
 * The kinds of material a company stocks (GLOSSARY "material"), plus `outlet` for the pre-formed
 * outlet pieces dressed into a roof. A corner piece is a trim.
 */
export type MaterialKind =
  | 'mat'
  | 'bandage'
  | 'base-resin'
  | 'topcoat'
  | 'catalyst'
  | 'trim'
  | 'outlet'
  | 'acetone'
  | 'adhesive'
  | 'batten'
  | 'fixing'
  | 'other';

export const MATERIAL_KINDS: readonly MaterialKind[] = Object.freeze([
  'mat',
  'bandage',
  'base-resin',
  'topcoat',
  'catalyst',
  'trim',
  'outlet',
  'acetone',
  'adhesive',
  'batten',
  'fixing',
  'other',
]);
