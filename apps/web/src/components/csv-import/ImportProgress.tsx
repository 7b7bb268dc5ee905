import { Group, Progress, Stack, Text } from '@mantine/core';

export type ImportStage = 'reading' | 'sending' | 'checking';

const stageWords: Record<ImportStage, string> = {
  reading: 'Reading the file',
  sending: 'Sending it to Potlife',
  checking: 'Checking every row',
};

/**
 * How far a long import has gone: reading the file, sending it, then the server checking (or
 * writing) the rows. The last stage has no measure, so its bar moves without a number.
 */
export function ImportProgress({
  stage,
  fraction,
  label,
  showSteps = false,
}: {
  stage: ImportStage;
  fraction: number | null;
  label?: string;
  /** "Step 2 of 3", for a CSV import that reads the file first. */
  showSteps?: boolean;
}) {
  const known = stage !== 'checking' && fraction !== null;
  const percent = known ? Math.round((fraction ?? 0) * 100) : 100;
  const words = label && stage === 'checking' ? label : stageWords[stage];
  return (
    <Stack gap={6} role="status" aria-live="polite">
      <Group justify="space-between" gap="xs">
        <Text size="sm" fw={600}>
          {words}…
        </Text>
        {known ? (
          <Text size="sm" c="dimmed">
            {percent} %
          </Text>
        ) : null}
      </Group>
      <Progress
        value={percent}
        animated={!known}
        striped={!known}
        size="lg"
        radius="xl"
        aria-label={words}
        transitionDuration={150}
      />
      {showSteps ? (
        <Text size="xs" c="dimmed">
          Step {stage === 'reading' ? 1 : stage === 'sending' ? 2 : 3} of 3
        </Text>
      ) : null}
    </Stack>
  );
}
