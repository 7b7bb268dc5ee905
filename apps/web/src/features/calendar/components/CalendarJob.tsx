import { Badge, Box, Text, UnstyledButton } from '@mantine/core';
import {
  IconAlertTriangle,
  IconCircleCheck,
  IconCircleDashed,
  IconPackage,
  IconTruckDelivery,
} from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import type { CalendarEntry, MaterialState } from '../api/get-calendar';

export const STATE_LABELS: Record<MaterialState, string> = {
  'no-estimate': 'No estimate',
  'not-reserved': 'Not reserved',
  reserved: 'All reserved',
  short: 'Short',
  issued: 'Issued',
};

const STATE_COLOURS: Record<MaterialState, string> = {
  'no-estimate': 'gray',
  'not-reserved': 'yellow',
  reserved: 'green',
  short: 'red',
  issued: 'blue',
};

const STATE_ICONS: Record<MaterialState, typeof IconPackage> = {
  'no-estimate': IconCircleDashed,
  'not-reserved': IconPackage,
  reserved: IconCircleCheck,
  short: IconAlertTriangle,
  issued: IconTruckDelivery,
};

export function StateBadge({ entry }: { entry: CalendarEntry }) {
  const Icon = STATE_ICONS[entry.materialState];
  return (
    <Badge
      size="xs"
      variant="light"
      color={STATE_COLOURS[entry.materialState]}
      leftSection={<Icon size={10} />}
    >
      {entry.materialState === 'short' && entry.shortfalls > 0
        ? `Short: ${entry.shortfalls} material${entry.shortfalls === 1 ? '' : 's'}`
        : STATE_LABELS[entry.materialState]}
    </Badge>
  );
}

/** One scheduled job in a day cell: reference, customer and its material state; opens the job. */
export function CalendarJob({ entry }: { entry: CalendarEntry }) {
  return (
    <UnstyledButton
      component={Link}
      to={hrefs.job(entry.id, 'materials')}
      aria-label={`${entry.reference} ${entry.title}, ${entry.customer.name}: ${STATE_LABELS[entry.materialState]}`}
      style={{ display: 'block', width: '100%' }}
    >
      <Box
        p={4}
        style={{
          borderRadius: 6,
          borderLeft: `3px ${entry.materialState === 'short' ? 'dashed' : 'solid'} var(--mantine-color-${STATE_COLOURS[entry.materialState]}-6)`,
          background: 'var(--mantine-color-topcoat-0)',
        }}
      >
        <Text size="xs" fw={700} lineClamp={1}>
          {entry.reference} · {entry.customer.name}
        </Text>
        <Text size="xs" c="dimmed" lineClamp={1}>
          {entry.title}
        </Text>
        <StateBadge entry={entry} />
      </Box>
    </UnstyledButton>
  );
}
