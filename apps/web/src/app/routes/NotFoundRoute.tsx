import { Button, Card, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <Card maw={560} mx="auto" mt="xl">
      <Stack align="flex-start" gap="sm">
        <Title order={1} fz="xl">
          No such page
        </Title>
        <Text size="sm" c="dimmed">
          The address may be mistyped, or the page may have moved.
        </Text>
        <Button component={Link} to={paths.home} variant="light">
          Back to Home
        </Button>
      </Stack>
    </Card>
  );
}
