import { Button, Group, Modal, Select, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { formatQuantity } from '../../../lib/amounts';
import { unitLabel } from '../../../lib/material-words';
import { newIdempotencyKey } from '../../../lib/upload';
import { useLocations } from '../api/get-locations';
import { usePostMovement } from '../api/post-movement';
import type { Lot } from '../api/types';
import { ConfirmStep } from './ConfirmStep';
import { plainQuantity, quantityProblem } from './quantity-rules';

type Values = { fromLocationId: string; toLocationId: string; quantity: string; note: string };

export function TransferModal({ lot, opened, onClose }: { lot: Lot; opened: boolean; onClose: () => void }) {
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={`Move ${lot.materialName}${lot.batchNumber ? ` ${lot.batchNumber}` : ''}`}
      size="lg"
    >
      {opened ? <TransferForm lot={lot} onClose={onClose} /> : null}
    </Modal>
  );
}

function TransferForm({ lot, onClose }: { lot: Lot; onClose: () => void }) {
  const locations = useLocations();
  const post = usePostMovement();
  const [key] = useState(newIdempotencyKey);
  const [step, setStep] = useState<'form' | 'confirm'>('form');
  const [error, setError] = useState<string | null>(null);
  const first = lot.places[0];
  const unit = unitLabel(lot.stockUnit);
  const form = useForm<Values>({
    initialValues: {
      fromLocationId: first?.locationId ?? '',
      toLocationId: '',
      quantity: lot.places.length === 1 && first ? plainQuantity(first.quantity) : '',
      note: '',
    },
    validate: {
      fromLocationId: (value) => (value ? null : 'Choose where it is now'),
      toLocationId: (value, values) =>
        !value ? 'Choose where it goes' : value === values.fromLocationId ? 'Choose another location' : null,
      quantity: (value, values) =>
        quantityProblem(
          value,
          lot.places.find((p) => p.locationId === values.fromLocationId)?.quantity ?? null,
          unit,
        ),
      note: (value) => (value.length > 2000 ? 'Keep it to 2000 characters' : null),
    },
  });
  const from = lot.places.find((place) => place.locationId === form.values.fromLocationId);
  const to = locations.data?.find((location) => location.id === form.values.toLocationId);

  if (step === 'confirm') {
    return (
      <ConfirmStep
        summary={`Move ${formatQuantity(form.values.quantity, lot.stockUnit)} of ${lot.materialName}${lot.batchNumber ? ` (batch ${lot.batchNumber})` : ''} from ${from?.locationName ?? '?'} to ${to?.path ?? '?'}.`}
        confirmLabel="Move it"
        busy={post.isPending}
        error={error}
        onBack={() => setStep('form')}
        onConfirm={() =>
          post.mutate(
            {
              key,
              body: {
                kind: 'transfer',
                lotId: lot.id,
                fromLocationId: form.values.fromLocationId,
                toLocationId: form.values.toLocationId,
                quantity: form.values.quantity.trim(),
                ...(form.values.note.trim() ? { note: form.values.note.trim() } : {}),
              },
            },
            {
              onSuccess: (result) => {
                notifications.show({
                  color: 'green',
                  message: `Moved to ${to?.path ?? 'the new location'}.`,
                });
                for (const warning of result.warnings) {
                  notifications.show({ color: 'yellow', title: 'Note', message: warning, autoClose: false });
                }
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
    <form
      noValidate
      aria-label="Move stock"
      onSubmit={form.onSubmit(() => {
        setError(null);
        setStep('confirm');
      })}
    >
      <Stack gap="md">
        <Select
          size="md"
          label="From"
          data={lot.places.map((place) => ({
            value: place.locationId,
            label: `${place.locationName} (${formatQuantity(place.quantity, lot.stockUnit)})`,
          }))}
          {...form.getInputProps('fromLocationId')}
        />
        <Select
          size="md"
          label="To"
          placeholder={locations.isPending ? 'Loading locations…' : 'Choose a location'}
          searchable
          data={(locations.data ?? [])
            .filter((location) => location.active && location.id !== form.values.fromLocationId)
            .map((location) => ({ value: location.id, label: location.path }))}
          nothingFoundMessage="No location by that name"
          {...form.getInputProps('toLocationId')}
        />
        <TextInput label={`Quantity (${unit})`} inputMode="decimal" {...form.getInputProps('quantity')} />
        <Textarea
          label="Note"
          description="Optional: why it moves"
          autosize
          minRows={2}
          {...form.getInputProps('note')}
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit">Next</Button>
        </Group>
      </Stack>
    </form>
  );
}
