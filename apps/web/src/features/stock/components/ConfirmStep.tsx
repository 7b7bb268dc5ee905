import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import type { ReactNode } from 'react';

/** The second step of a stock change: what will happen, in words, before it is posted. */
export function ConfirmStep({
  summary,
  confirmLabel,
  danger = false,
  busy,
  error,
  onBack,
  onConfirm,
}: {
  summary: ReactNode;
  confirmLabel: string;
  danger?: boolean;
  busy: boolean;
  error: string | null;
  onBack: () => void;
  onConfirm: () => void;
}) {
  return (
    <Stack gap="md">
      <Alert
        color={danger ? 'red' : 'blue'}
        variant="light"
        icon={<IconAlertTriangle size={20} />}
        title="Check before you confirm"
      >
        <Text size="sm">{summary}</Text>
      </Alert>
      {error ? (
        <Alert color="red" variant="light" role="alert" title="Nothing was changed">
          {error}
        </Alert>
      ) : null}
      <Group justify="flex-end">
        <Button variant="default" onClick={onBack} disabled={busy}>
          Back
        </Button>
        <Button color={danger ? 'red' : undefined} loading={busy} onClick={onConfirm} data-autofocus>
          {confirmLabel}
        </Button>
      </Group>
    </Stack>
  );
}
