import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { FileDrop } from '../../../components/FileDrop';
import { ImportProgress } from '../../../components/csv-import/ImportProgress';
import { errorMessage } from '../../../lib/api-client';
import { useUploadDeliveryNote } from '../api/delivery-note';
import { DELIVERY_NOTE_ACCEPT, DELIVERY_NOTE_MAX_BYTES } from '../api/types';

/** Adds the delivery note to a receipt already booked in (it failed, or was not at hand then). */
export function DeliveryNoteUpload({ receiptId }: { receiptId: string }) {
  const upload = useUploadDeliveryNote();
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<{ step: 'sending' | 'checking'; fraction: number | null } | null>(
    null,
  );
  const [error, setError] = useState<string | null>(null);
  const send = async () => {
    if (!file) {
      return;
    }
    setError(null);
    setProgress({ step: 'sending', fraction: 0 });
    try {
      await upload(receiptId, file, (p) =>
        setProgress({ step: p.phase === 'waiting' ? 'checking' : 'sending', fraction: p.fraction }),
      );
      notifications.show({ color: 'green', message: 'The delivery note is kept with the receipt.' });
      setFile(null);
    } catch (failure) {
      setError(errorMessage(failure));
    } finally {
      setProgress(null);
    }
  };
  return (
    <Stack gap="sm">
      <Text size="sm" c="dimmed">
        No delivery note is kept with this receipt yet. A photo or scan will do.
      </Text>
      <FileDrop
        what="the delivery note"
        accept={DELIVERY_NOTE_ACCEPT}
        typesText="PDF, JPEG or PNG"
        maxBytes={DELIVERY_NOTE_MAX_BYTES}
        file={file}
        onFile={(chosen) => {
          setFile(chosen);
          setError(null);
        }}
        disabled={progress !== null}
        inputName="deliveryNote"
      />
      {progress ? (
        <ImportProgress stage={progress.step} fraction={progress.fraction} label="Checking the file" />
      ) : null}
      {error ? (
        <Alert color="red" variant="light" role="alert" title="The delivery note was not kept">
          {error}
        </Alert>
      ) : null}
      {file ? (
        <Group>
          <Button
            leftSection={<IconUpload size={18} />}
            loading={progress !== null}
            onClick={() => void send()}
          >
            Upload the delivery note
          </Button>
        </Group>
      ) : null}
    </Stack>
  );
}
