import { Badge, Group } from '@mantine/core';
import {
  IconCalendarCheck,
  IconCalendarExclamation,
  IconCalendarOff,
  IconCalendarX,
  IconCircleCheck,
  IconCircleOff,
  IconLock,
  IconTemperatureSun,
  type Icon,
} from '@tabler/icons-react';
import { formatDate } from '../lib/format';

// A lot's state as badges: each has a colour, an icon and words, so none relies on colour alone.

export type LotStatusValue = 'available' | 'quarantined' | 'expired' | 'written-off';

interface Look {
  color: string;
  icon: Icon;
  label: string;
}

const statusLooks: Record<LotStatusValue, Look> = {
  available: { color: 'green', icon: IconCircleCheck, label: 'Available' },
  quarantined: { color: 'orange', icon: IconLock, label: 'Quarantined' },
  expired: { color: 'red', icon: IconCalendarX, label: 'Expired' },
  'written-off': { color: 'gray', icon: IconCircleOff, label: 'Written off' },
};

export const lotStatusLabels: Record<LotStatusValue, string> = {
  available: 'Available',
  quarantined: 'Quarantined',
  expired: 'Expired',
  'written-off': 'Written off',
};

function LookBadge({ look, title }: { look: Look; title?: string }) {
  const IconComponent = look.icon;
  return (
    <Badge
      color={look.color}
      variant="light"
      leftSection={<IconComponent size={13} stroke={2} aria-hidden />}
      title={title}
      styles={{ label: { textTransform: 'none', fontWeight: 700, overflow: 'visible' } }}
    >
      {look.label}
    </Badge>
  );
}

export function LotStatusBadge({ status }: { status: string }) {
  const look = statusLooks[status as LotStatusValue] ?? { color: 'gray', icon: IconCircleOff, label: status };
  return <LookBadge look={look} />;
}

/** "Check before use": the lot was stored outside its temperature range. */
export function ExposureBadge({ reason }: { reason?: string | null }) {
  return (
    <LookBadge
      look={{ color: 'yellow', icon: IconTemperatureSun, label: 'Check before use' }}
      title={reason ?? 'Stored outside its temperature range'}
    />
  );
}

export interface ExpiryValue {
  expiresOn: string | null;
  daysToExpiry: number | null;
  badge: 'expired' | 'expiring' | 'ok' | 'none';
}

/** The words of an expiry: "Expired 3 days ago", "Expires today", "Expires in 12 days", "Use by 30 Sep 2025". */
export function expiryText(expiry: ExpiryValue): string {
  const days = expiry.daysToExpiry;
  switch (expiry.badge) {
    case 'none':
      return 'No expiry';
    case 'expired':
      if (days === null) {
        return 'Expired';
      }
      return days === -1 ? 'Expired yesterday' : `Expired ${Math.abs(days)} days ago`;
    case 'expiring':
      if (days === 0) {
        return 'Expires today';
      }
      return days === 1 ? 'Expires tomorrow' : `Expires in ${days ?? '?'} days`;
    case 'ok':
      return expiry.expiresOn ? `Use by ${formatDate(expiry.expiresOn)}` : 'In date';
  }
}

const expiryLooks: Record<ExpiryValue['badge'], Omit<Look, 'label'>> = {
  expired: { color: 'red', icon: IconCalendarX },
  expiring: { color: 'orange', icon: IconCalendarExclamation },
  ok: { color: 'teal', icon: IconCalendarCheck },
  none: { color: 'gray', icon: IconCalendarOff },
};

export function ExpiryBadge({ expiry }: { expiry: ExpiryValue }) {
  const look = expiryLooks[expiry.badge];
  return (
    <LookBadge
      look={{ ...look, label: expiryText(expiry) }}
      title={expiry.expiresOn ? `Expiry date ${formatDate(expiry.expiresOn)}` : undefined}
    />
  );
}

/** Status, plus "Check before use" when flagged. Expired is shown once (the expiry badge says it). */
export function LotBadges({
  status,
  exposureFlagged,
  exposureReason,
}: {
  status: string;
  exposureFlagged: boolean;
  exposureReason?: string | null;
}) {
  return (
    <Group gap={6} wrap="wrap">
      <LotStatusBadge status={status} />
      {exposureFlagged ? <ExposureBadge reason={exposureReason} /> : null}
    </Group>
  );
}
