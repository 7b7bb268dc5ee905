import { Badge, type BadgeProps } from '@mantine/core';
import { roleColors, roleLabels, type Role } from '../lib/roles';

interface RoleBadgeProps extends Omit<BadgeProps, 'color' | 'children'> {
  role: Role;
}

export function RoleBadge({ role, ...props }: RoleBadgeProps) {
  return (
    <Badge color={roleColors[role]} {...props}>
      {roleLabels[role]}
    </Badge>
  );
}
