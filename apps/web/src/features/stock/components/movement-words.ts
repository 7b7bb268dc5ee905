import type { MovementKind } from '../api/types';

export const movementKindLabels: Record<MovementKind, string> = {
  receipt: 'Receipt',
  transfer: 'Transfer',
  issue: 'Issue to job',
  return: 'Return from job',
  adjustment: 'Adjustment',
  'write-off': 'Write-off',
};

export const lotEventLabels: Record<string, string> = {
  quarantined: 'Quarantined',
  released: 'Released',
  flagged: 'Flagged "check before use"',
  'flag-cleared': 'Flag cleared',
  'written-off': 'Written off',
};
