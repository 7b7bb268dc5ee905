import '@mantine/dropzone/styles.css';
import { Alert, Button, Group, Paper, Stack, Text, ThemeIcon } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { IconFile, IconUpload, IconX } from '@tabler/icons-react';
import { useState } from 'react';
import { formatBytes } from '../lib/format';

// One file chosen by dropping it or picking it, with the rules (types and size) said beforehand
// and a clear sentence when a file breaks them.

interface FileDropProps {
  /** What the file is, for the words: "the delivery note", "the CSV file". */
  what: string;
  /** MIME types with their extensions, as react-dropzone takes them. */
  accept: Record<string, string[]>;
  /** The types in words, to finish "not a … file": "PDF, JPEG or PNG", "CSV". */
  typesText: string;
  /** More about the file, shown with the types: "a photo or scan", "comma-separated, UTF-8". */
  typesHint?: string;
  maxBytes: number;
  file: File | null;
  onFile: (file: File | null) => void;
  disabled?: boolean;
  /** The name of the hidden file input, for tests and browser journeys. */
  inputName?: string;
}

function rejectionText(rejection: FileRejection, typesText: string, maxBytes: number): string {
  const name = rejection.file.name;
  const codes = rejection.errors.map((error) => error.code);
  if (codes.includes('file-too-large')) {
    return `${name} is ${formatBytes(rejection.file.size)}: the most is ${formatBytes(maxBytes)}.`;
  }
  if (codes.includes('file-invalid-type')) {
    return `${name} is not a ${typesText} file.`;
  }
  if (codes.includes('too-many-files')) {
    return 'Choose one file at a time.';
  }
  return `${name} cannot be used: ${rejection.errors[0]?.message ?? 'unknown reason'}.`;
}

export function FileDrop({
  what,
  accept,
  typesText,
  typesHint,
  maxBytes,
  file,
  onFile,
  disabled = false,
  inputName,
}: FileDropProps) {
  const [rejected, setRejected] = useState<string | null>(null);

  if (file) {
    return (
      <Paper withBorder p="sm" radius="md">
        <Group justify="space-between" wrap="nowrap" gap="sm">
          <Group gap="sm" wrap="nowrap" style={{ minWidth: 0 }}>
            <ThemeIcon variant="light" size="lg" radius="md">
              <IconFile size={20} />
            </ThemeIcon>
            <div style={{ minWidth: 0 }}>
              <Text size="sm" fw={600} truncate>
                {file.name}
              </Text>
              <Text size="xs" c="dimmed">
                {formatBytes(file.size)}
              </Text>
            </div>
          </Group>
          <Button
            variant="subtle"
            color="gray"
            size="xs"
            leftSection={<IconX size={14} />}
            onClick={() => onFile(null)}
            disabled={disabled}
            aria-label={`Remove ${file.name}`}
          >
            Remove
          </Button>
        </Group>
      </Paper>
    );
  }

  return (
    <Stack gap="xs">
      <Dropzone
        onDrop={(files) => {
          setRejected(null);
          onFile(files[0] ?? null);
        }}
        onReject={(rejections) => {
          const first = rejections[0];
          setRejected(first ? rejectionText(first, typesText, maxBytes) : null);
        }}
        accept={accept}
        maxSize={maxBytes}
        multiple={false}
        disabled={disabled}
        name={inputName}
        inputProps={{ 'aria-label': `Choose ${what}` }}
        radius="md"
        p="md"
      >
        <Group justify="center" gap="md" mih={72} style={{ pointerEvents: 'none' }} wrap="nowrap">
          <Dropzone.Accept>
            <IconUpload size={32} stroke={1.5} />
          </Dropzone.Accept>
          <Dropzone.Reject>
            <IconX size={32} stroke={1.5} />
          </Dropzone.Reject>
          <Dropzone.Idle>
            <IconUpload size={32} stroke={1.5} />
          </Dropzone.Idle>
          <div>
            <Text size="sm" fw={600}>
              Drop {what} here, or tap to choose it
            </Text>
            <Text size="xs" c="dimmed">
              A {typesText} file{typesHint ? ` (${typesHint})` : ''}, at most {formatBytes(maxBytes)}
            </Text>
          </div>
        </Group>
      </Dropzone>
      {rejected ? (
        <Alert color="red" variant="light" p="xs" role="alert">
          <Text size="sm">{rejected}</Text>
        </Alert>
      ) : null}
    </Stack>
  );
}
