import { Badge } from '@mantine/core';
import { materialKindLabel } from '../../../lib/material-words';

const kindColors: Record<string, string> = {
  mat: 'blue',
  bandage: 'blue',
  'base-resin': 'resin',
  topcoat: 'teal',
  catalyst: 'red',
  trim: 'grape',
  outlet: 'grape',
  acetone: 'orange',
  adhesive: 'cyan',
  batten: 'lime',
  fixing: 'gray',
  other: 'gray',
};

export function MaterialKindBadge({ kind }: { kind: string }) {
  return (
    <Badge
      color={kindColors[kind] ?? 'gray'}
      variant="light"
      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
    >
      {materialKindLabel(kind)}
    </Badge>
  );
}
