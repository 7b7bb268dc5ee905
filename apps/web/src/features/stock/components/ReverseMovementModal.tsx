import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { formatSignedQuantity } from '../../../lib/amounts';
import { newIdempotencyKey } from '../../../lib/upload';
import { useReverseMovement } from '../api/post-movement';
import type { Movement } from '../api/types';
import { ConfirmStep } from './ConfirmStep';
import { movementKindLabels } from './movement-words';

export function ReverseMovementModal({
  movement,
  onClose,
}: {
  movement: Movement | null;
  onClose: () => void;
}) {
  return (
    <Modal opened={movement !== null} onClose={onClose} title="Reverse a movement" size="lg">
      {movement ? <ReverseForm key={movement.id} movement={movement} onClose={onClose} /> : null}
    </Modal>
  );
}

function ReverseForm({ movement, onClose }: { movement: Movement; onClose: () => void }) {
  const reverse = useReverseMovement();
  const [key] = useState(newIdempotencyKey);
  const [step, setStep] = useState<'form' | 'confirm'>('form');
  const [error, setError] = useState<string | null>(null);
  const form = useForm({
    initialValues: { note: '' },
    validate: {
      note: (value) =>
        value.trim() === ''
          ? 'Say why it is reversed'
          : value.length > 2000
            ? 'Keep it to 2000 characters'
            : null,
    },
  });
  const what = `${movementKindLabels[movement.kind]} of ${formatSignedQuantity(movement.quantity, movement.stockUnit)} at ${movement.locationName}`;
  if (step === 'confirm') {
    return (
      <ConfirmStep
        danger
        summary={`A new movement undoes the ${what.toLowerCase()}. The original stays in the ledger, marked as reversed.`}
        confirmLabel="Reverse it"
        busy={reverse.isPending}
        error={error}
        onBack={() => setStep('form')}
        onConfirm={() =>
          reverse.mutate(
            { id: movement.id, note: form.values.note.trim(), key },
            {
              onSuccess: () => {
                notifications.show({ color: 'green', message: 'The movement is reversed.' });
                onClose();
              },
              onError: (failure) => setError(errorMessage(failure)),
            },
          )
        }
      />
    );
  }
  return (
    <form noValidate aria-label="Reverse a movement" onSubmit={form.onSubmit(() => setStep('confirm'))}>
      <Stack gap="md">
        <Text size="sm">
          The ledger is never edited: a mistake is put right by a new movement the other way. Reversing:{' '}
          {what}.
        </Text>
        <Textarea
          label="Why"
          placeholder="Booked to the wrong lot"
          autosize
          minRows={2}
          data-autofocus
          {...form.getInputProps('note')}
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" color="red">
            Next
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
