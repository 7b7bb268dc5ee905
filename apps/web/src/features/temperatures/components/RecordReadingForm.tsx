import { Alert, Button, Group, List, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { formatNumber } from '../../../lib/amounts';
import { newIdempotencyKey } from '../../../lib/upload';
import { useRecordReading } from '../api/record-reading';
import type { FlaggedLot } from '../api/types';

function nowLocal(): string {
  const d = new Date();
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** Reads a reading typed on the thermometer in the store, for one location. */
export function RecordReadingForm({
  locationId,
  locationName,
}: {
  locationId: string;
  locationName: string;
}) {
  const record = useRecordReading();
  const [key, setKey] = useState(newIdempotencyKey);
  const [error, setError] = useState<string | null>(null);
  const [flagged, setFlagged] = useState<FlaggedLot[] | null>(null);
  const form = useForm({
    initialValues: { temperatureC: '', takenAt: nowLocal(), note: '' },
    validate: {
      temperatureC: (value) =>
        !/^-?\d{1,3}(\.\d{1,2})?$/.test(value.trim()) ? 'Enter the temperature in °C, like 18.5 or -2' : null,
      takenAt: (value) =>
        Number.isNaN(Date.parse(value))
          ? 'Choose when it was read'
          : Date.parse(value) > Date.now() + 5 * 60_000
            ? 'A reading cannot be in the future'
            : null,
      note: (value) => (value.length > 2000 ? 'Keep it to 2000 characters' : null),
    },
  });
  return (
    <form
      noValidate
      aria-label="Record a reading"
      onSubmit={form.onSubmit((values) => {
        setError(null);
        record.mutate(
          {
            key,
            body: {
              locationId,
              temperatureC: values.temperatureC.trim(),
              takenAt: new Date(values.takenAt).toISOString(),
              ...(values.note.trim() ? { note: values.note.trim() } : {}),
            },
          },
          {
            onSuccess: (result) => {
              setFlagged(result.flaggedLots);
              notifications.show({
                color: 'green',
                message: `${formatNumber(result.reading.temperatureC)} °C at ${locationName} is recorded.`,
              });
              form.setValues({ temperatureC: '', takenAt: nowLocal(), note: '' });
              setKey(newIdempotencyKey());
            },
            onError: (failure) => setError(errorMessage(failure)),
          },
        );
      })}
    >
      <Stack gap="sm">
        <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
          <TextInput label="Temperature (°C)" inputMode="decimal" {...form.getInputProps('temperatureC')} />
          <TextInput label="Read at" type="datetime-local" {...form.getInputProps('takenAt')} />
          <TextInput label="Note" description="Optional" {...form.getInputProps('note')} />
        </SimpleGrid>
        {error ? (
          <Alert color="red" variant="light" role="alert" title="The reading was not recorded">
            {error}
          </Alert>
        ) : null}
        {flagged && flagged.length > 0 ? (
          <Alert color="yellow" variant="light" title="Outside the range: check before use">
            <List size="sm" spacing={2}>
              {flagged.map((lot) => (
                <List.Item key={lot.lotId}>{lot.message}</List.Item>
              ))}
            </List>
            <Text size="sm" mt={4}>
              They are listed below under &quot;Check before use&quot;.
            </Text>
          </Alert>
        ) : null}
        <Group>
          <Button type="submit" loading={record.isPending}>
            Record the reading
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
