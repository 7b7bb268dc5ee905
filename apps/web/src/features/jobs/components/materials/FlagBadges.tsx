import { Badge, Group, Tooltip } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import type { PickListLotFlagCode, ReservationFlagCode } from '../../api/types';

const FLAG_LABELS: Record<ReservationFlagCode | PickListLotFlagCode, string> = {
  'expires-before-job': 'Expires before the job',
  'expires-within-margin': 'Expires within the margin',
  quarantined: 'Quarantined',
  'exposure-flagged': 'Check before use',
  'not-in-stock': 'No longer in stock',
  'held-for-other-jobs': 'Reserved for another job',
};

/** What is wrong with a lot for the job date, each with the API's sentence on hover. */
export function FlagBadges({
  flags,
}: {
  flags: { code: ReservationFlagCode | PickListLotFlagCode; message: string }[];
}) {
  if (flags.length === 0) {
    return null;
  }
  return (
    <Group gap={4}>
      {flags.map((f) => (
        <Tooltip key={f.code} label={f.message} multiline w={260} withinPortal>
          <Badge
            color="red"
            variant="light"
            size="sm"
            leftSection={<IconAlertTriangle size={11} />}
            title={f.message}
          >
            {FLAG_LABELS[f.code] ?? f.code}
          </Badge>
        </Tooltip>
      ))}
    </Group>
  );
}

export function lotLabel(lot: { batchNumber: string | null; expiresOn: string | null }): string {
  return lot.batchNumber ? `Lot ${lot.batchNumber}` : 'Lot without a batch number';
}
