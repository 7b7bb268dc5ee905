import { Badge } from '@mantine/core';
import type { UserStatus } from '../api/get-users';

const statusLook: Record<UserStatus, { label: string; color: string }> = {
  active: { label: 'Active', color: 'green' },
  invited: { label: 'Invited', color: 'resin' },
  inactive: { label: 'Inactive', color: 'gray' },
};

export const statusLabels: Record<UserStatus, string> = {
  active: statusLook.active.label,
  invited: statusLook.invited.label,
  inactive: statusLook.inactive.label,
};

export function UserStatusBadge({ status }: { status: UserStatus }) {
  const look = statusLook[status];
  return (
    <Badge color={look.color} variant={status === 'active' ? 'light' : 'outline'}>
      {look.label}
    </Badge>
  );
}
