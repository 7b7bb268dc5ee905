import { Button, Card, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';
import { describeRoles, withArticle, type Role } from '../../lib/roles';

interface NeedsRoleProps {
  roles: readonly Role[];
  current: Role;
}

export function NeedsRole({ roles, current }: NeedsRoleProps) {
  const needed = describeRoles(roles);
  return (
    <Card maw={560} mx="auto" mt="xl" data-testid="needs-role">
      <Stack align="flex-start" gap="sm">
        <ThemeIcon size={44} radius="xl" variant="light" color="topcoat">
          <IconLock size={24} />
        </ThemeIcon>
        <Title order={1} fz="xl">
          This page needs {needed}
        </Title>
        <Text size="sm" c="dimmed">
          You are signed in as {withArticle(current)}. If your work needs this page, ask your company&apos;s
          owner to change your role.
        </Text>
        <Button component={Link} to={paths.home} variant="light" mt="xs">
          Back to Home
        </Button>
      </Stack>
    </Card>
  );
}
