import { Alert, Button, Group, Text } from '@mantine/core';
import { IconAlertTriangle, IconRefresh } from '@tabler/icons-react';
import { errorMessage } from '../lib/api-client';

interface QueryErrorProps {
  /** What could not be loaded, e.g. "the users". */
  what: string;
  error: unknown;
  onRetry?: () => void;
  retrying?: boolean;
}

/** What a screen shows when its data could not be loaded: the server's message and a retry. */
export function QueryError({ what, error, onRetry, retrying = false }: QueryErrorProps) {
  return (
    <Alert
      color="red"
      variant="light"
      icon={<IconAlertTriangle size={20} />}
      title={`Potlife could not load ${what}`}
    >
      <Text size="sm">{errorMessage(error)}</Text>
      {onRetry ? (
        <Group mt="sm">
          <Button
            size="xs"
            variant="white"
            color="red"
            leftSection={<IconRefresh size={14} />}
            loading={retrying}
            onClick={onRetry}
          >
            Try again
          </Button>
        </Group>
      ) : null}
    </Alert>
  );
}
