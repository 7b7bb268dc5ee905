import { Badge } from '@mantine/core';
import type { JobStatus } from '@potlife/domain';
import {
  IconAlertTriangle,
  IconCircleCheck,
  IconCircleDashed,
  IconPackage,
  IconTruckDelivery,
} from '@tabler/icons-react';
import type { MaterialState } from '../api/types';
import { materialStateColors, materialStateLabels, statusColors, statusLabels } from '../utils/labels';

export function JobStatusBadge({ status, size = 'sm' }: { status: JobStatus; size?: 'sm' | 'md' | 'lg' }) {
  return (
    <Badge
      color={statusColors[status]}
      variant={status === 'lost' || status === 'cancelled' ? 'outline' : 'light'}
      size={size}
    >
      {statusLabels[status]}
    </Badge>
  );
}

const stateIcons: Record<MaterialState, typeof IconPackage> = {
  'no-estimate': IconCircleDashed,
  'not-reserved': IconPackage,
  reserved: IconCircleCheck,
  short: IconAlertTriangle,
  issued: IconTruckDelivery,
};

/** The stock side of a job: an icon and a word, so it reads without colour. */
export function MaterialStateBadge({ state }: { state: MaterialState }) {
  const Icon = stateIcons[state];
  return (
    <Badge color={materialStateColors[state]} variant="light" size="sm" leftSection={<Icon size={12} />}>
      {materialStateLabels[state]}
    </Badge>
  );
}
