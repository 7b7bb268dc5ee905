import { Badge } from '@mantine/core';
import {
  IconCheck,
  IconClipboardCheck,
  IconEqual,
  IconMinus,
  IconPencil,
  IconPlus,
  IconX,
} from '@tabler/icons-react';
import type { CountStatus, VarianceKind } from '../api/types';

const statusLooks: Record<CountStatus, { color: string; label: string; icon: typeof IconPencil }> = {
  open: { color: 'blue', label: 'Being counted', icon: IconPencil },
  submitted: { color: 'orange', label: 'Awaiting approval', icon: IconClipboardCheck },
  approved: { color: 'green', label: 'Approved', icon: IconCheck },
  cancelled: { color: 'gray', label: 'Cancelled', icon: IconX },
};

export const countStatusLabels: Record<CountStatus, string> = {
  open: 'Being counted',
  submitted: 'Awaiting approval',
  approved: 'Approved',
  cancelled: 'Cancelled',
};

export function CountStatusBadge({ status }: { status: CountStatus }) {
  const look = statusLooks[status];
  const Icon = look.icon;
  return (
    <Badge
      color={look.color}
      leftSection={<Icon size={12} aria-hidden />}
      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
    >
      {look.label}
    </Badge>
  );
}

const varianceLooks: Record<VarianceKind, { color: string; label: string; icon: typeof IconPlus }> = {
  match: { color: 'gray', label: 'Matches', icon: IconEqual },
  surplus: { color: 'blue', label: 'More than expected', icon: IconPlus },
  loss: { color: 'red', label: 'Less than expected', icon: IconMinus },
};

export function VarianceBadge({ kind }: { kind: VarianceKind }) {
  const look = varianceLooks[kind];
  const Icon = look.icon;
  return (
    <Badge
      color={look.color}
      variant="light"
      leftSection={<Icon size={12} aria-hidden />}
      styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
    >
      {look.label}
    </Badge>
  );
}
