import { Center, Loader, Stack, Text } from '@mantine/core';

interface PageLoaderProps {
  label?: string;
  /** Fill the whole window (before the layout exists) rather than the content area. */
  fullScreen?: boolean;
}

export function PageLoader({ label = 'Loading…', fullScreen = false }: PageLoaderProps) {
  return (
    <Center mih={fullScreen ? '100dvh' : 240} role="status" aria-live="polite">
      <Stack align="center" gap="xs">
        <Loader size="md" />
        <Text size="sm" c="dimmed">
          {label}
        </Text>
      </Stack>
    </Center>
  );
}
