import { Badge } from '@mantine/core';
import { IconArrowDownRight } from '@tabler/icons-react';

export function BelowReorderBadge() {
  return (
    <Badge
      color="orange"
      variant="outline"
      leftSection={<IconArrowDownRight size={12} aria-hidden />}
      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
    >
      Below reorder level
    </Badge>
  );
}
