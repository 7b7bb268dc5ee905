import { Alert, List, Stack, Text } from '@mantine/core';
import type { Caution } from '@potlife/domain';
import { IconAlertTriangle } from '@tabler/icons-react';

/** The trade's cautions for what a job uses, as the domain words them. */
export function CautionsList({
  cautions,
  title = 'Safety cautions',
}: {
  cautions: Caution[];
  title?: string;
}) {
  if (cautions.length === 0) {
    return null;
  }
  return (
    <Alert color="yellow" variant="light" icon={<IconAlertTriangle size={20} />} title={title}>
      <Stack gap="xs">
        <List size="sm" spacing={6}>
          {cautions.map((c) => (
            <List.Item key={c.id}>
              <Text span fw={700} size="sm">
                {c.title}.
              </Text>{' '}
              <Text span size="sm">
                {c.text}
              </Text>
            </List.Item>
          ))}
        </List>
      </Stack>
    </Alert>
  );
}
