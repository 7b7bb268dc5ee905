import { Anchor, Badge, Card, Group, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import type { Icon } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

interface PanelProps {
  title: string;
  icon: Icon;
  color: string;
  count: number;
  /** What the empty panel says (what is fine, or what to do). */
  empty: string;
  /** "See all" link to the screen that acts on the items. */
  more?: { to: string; label: string };
  children: ReactNode;
}

/** One list on the home page, with its count and a link to the screen that acts on it. */
export function Panel({ title, icon: IconComponent, color, count, empty, more, children }: PanelProps) {
  return (
    <Card component="section" aria-label={title}>
      <Group justify="space-between" mb="sm" wrap="nowrap">
        <Group gap="sm" wrap="nowrap">
          <ThemeIcon variant="light" color={count > 0 ? color : 'gray'} radius="md" size="lg">
            <IconComponent size={20} />
          </ThemeIcon>
          <Title order={2} fz="md">
            {title}
          </Title>
        </Group>
        <Badge
          color={count > 0 ? color : 'gray'}
          variant={count > 0 ? 'filled' : 'light'}
          size="lg"
          circle={count < 10}
          aria-label={`${count} items`}
        >
          {count}
        </Badge>
      </Group>
      {count === 0 ? (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      ) : (
        <Stack gap="xs">{children}</Stack>
      )}
      {more ? (
        <Anchor component={Link} to={more.to} size="sm" fw={600} mt="sm" display="block">
          {more.label}
        </Anchor>
      ) : null}
    </Card>
  );
}

/** One item of a panel: a link with a line under it. */
export function PanelItem({
  to,
  title,
  detail,
  badge,
}: {
  to: string;
  title: string;
  detail?: ReactNode;
  badge?: ReactNode;
}) {
  return (
    <Group justify="space-between" wrap="wrap" gap="xs" align="flex-start">
      <Stack gap={0} style={{ minWidth: 0 }}>
        <Anchor component={Link} to={to} size="sm" fw={600}>
          {title}
        </Anchor>
        {detail ? (
          <Text size="xs" c="dimmed">
            {detail}
          </Text>
        ) : null}
      </Stack>
      {badge}
    </Group>
  );
}
