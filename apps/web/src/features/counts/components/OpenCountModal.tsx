import { Alert, Button, Group, Modal, Select, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { newIdempotencyKey } from '../../../lib/upload';
import { useOpenCount } from '../api/count-actions';
import { useCountLocations } from '../api/get-choices';

export function OpenCountModal({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  return (
    <Modal opened={opened} onClose={onClose} title="Open a count">
      {opened ? <OpenCountForm onClose={onClose} /> : null}
    </Modal>
  );
}

function OpenCountForm({ onClose }: { onClose: () => void }) {
  const locations = useCountLocations();
  const open = useOpenCount();
  const navigate = useNavigate();
  const [key] = useState(newIdempotencyKey);
  const [error, setError] = useState<string | null>(null);
  const form = useForm({
    initialValues: { locationId: '', note: '' },
    validate: { note: (value) => (value.length > 2000 ? 'Keep it to 2000 characters' : null) },
  });
  return (
    <form
      noValidate
      aria-label="Open a count"
      onSubmit={form.onSubmit((values) => {
        setError(null);
        open.mutate(
          {
            key,
            body: {
              ...(values.locationId ? { locationId: values.locationId } : {}),
              ...(values.note.trim() ? { note: values.note.trim() } : {}),
            },
          },
          {
            onSuccess: (count) => {
              notifications.show({
                color: 'green',
                message: `Count ${count.number} is open: ${count.lineCount} lines to count.`,
              });
              onClose();
              void navigate(hrefs.count(count.id));
            },
            onError: (failure) => setError(errorMessage(failure)),
          },
        );
      })}
    >
      <Stack gap="md">
        <Text size="sm" c="dimmed">
          Potlife notes what the ledger says is there now. Whoever counts types what is on the shelf without
          seeing those figures; the differences show once the count is submitted. Nothing can move in or out
          of the counted locations until the count is approved or cancelled.
        </Text>
        <Select
          size="md"
          label="What to count"
          data={[
            { value: '', label: 'Everything, every location' },
            ...(locations.data ?? [])
              .filter((l) => l.active)
              .map((l) => ({ value: l.id, label: `${l.path} (and what is inside it)` })),
          ]}
          searchable
          placeholder={locations.isPending ? 'Loading locations…' : undefined}
          {...form.getInputProps('locationId')}
        />
        <Textarea label="Note" description="Optional" autosize minRows={2} {...form.getInputProps('note')} />
        {error ? (
          <Alert color="red" variant="light" role="alert" title="The count was not opened">
            {error}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={open.isPending}>
            Open the count
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
