import {
  Button,
  Group,
  Modal,
  SegmentedControl,
  Select,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { formatMoney, formatQuantity } from '../../../lib/amounts';
import { unitLabel } from '../../../lib/material-words';
import { newIdempotencyKey } from '../../../lib/upload';
import { usePostMovement, type WriteOffReason } from '../api/post-movement';
import type { Lot } from '../api/types';
import { ConfirmStep } from './ConfirmStep';
import { plainQuantity, quantityProblem } from './quantity-rules';

const reasonLabels: Record<WriteOffReason, string> = {
  expired: 'Expired',
  damaged: 'Damaged',
  temperature: 'Temperature',
};

type Values = { locationId: string; quantity: string; reason: WriteOffReason; note: string };

export function WriteOffModal({ lot, opened, onClose }: { lot: Lot; opened: boolean; onClose: () => void }) {
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={`Write off ${lot.materialName}${lot.batchNumber ? ` ${lot.batchNumber}` : ''}`}
      size="lg"
    >
      {opened ? <WriteOffForm lot={lot} onClose={onClose} /> : null}
    </Modal>
  );
}

function WriteOffForm({ lot, onClose }: { lot: Lot; onClose: () => void }) {
  const post = usePostMovement();
  const [key] = useState(newIdempotencyKey);
  const [step, setStep] = useState<'form' | 'confirm'>('form');
  const [error, setError] = useState<string | null>(null);
  const first = lot.places[0];
  const unit = unitLabel(lot.stockUnit);
  const form = useForm<Values>({
    initialValues: {
      locationId: first?.locationId ?? '',
      quantity: lot.places.length === 1 && first ? plainQuantity(first.quantity) : '',
      reason: lot.expiry.badge === 'expired' ? 'expired' : lot.exposureFlagged ? 'temperature' : 'damaged',
      note: '',
    },
    validate: {
      locationId: (value) => (value ? null : 'Choose where it is'),
      quantity: (value, values) =>
        quantityProblem(
          value,
          lot.places.find((p) => p.locationId === values.locationId)?.quantity ?? null,
          unit,
        ),
      note: (value) => (value.length > 2000 ? 'Keep it to 2000 characters' : null),
    },
  });
  const place = lot.places.find((p) => p.locationId === form.values.locationId);

  if (step === 'confirm') {
    return (
      <ConfirmStep
        danger
        summary={
          <>
            Write off {formatQuantity(form.values.quantity, lot.stockUnit)} of {lot.materialName}
            {lot.batchNumber ? ` (batch ${lot.batchNumber})` : ''} at {place?.locationName ?? '?'}, as{' '}
            {reasonLabels[form.values.reason].toLowerCase()}. At {formatMoney(lot.unitCost)} per {unit}. It
            leaves the stock for good; only a reversal in the ledger brings it back.
          </>
        }
        confirmLabel="Write it off"
        busy={post.isPending}
        error={error}
        onBack={() => setStep('form')}
        onConfirm={() =>
          post.mutate(
            {
              key,
              body: {
                kind: 'write-off',
                lotId: lot.id,
                locationId: form.values.locationId,
                quantity: form.values.quantity.trim(),
                reason: form.values.reason,
                ...(form.values.note.trim() ? { note: form.values.note.trim() } : {}),
              },
            },
            {
              onSuccess: () => {
                notifications.show({
                  color: 'green',
                  message: `${formatQuantity(form.values.quantity, lot.stockUnit)} written off.`,
                });
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
      aria-label="Write off stock"
      onSubmit={form.onSubmit(() => {
        setError(null);
        setStep('confirm');
      })}
    >
      <Stack gap="md">
        <Select
          size="md"
          label="Where"
          data={lot.places.map((p) => ({
            value: p.locationId,
            label: `${p.locationName} (${formatQuantity(p.quantity, lot.stockUnit)})`,
          }))}
          {...form.getInputProps('locationId')}
        />
        <TextInput label={`Quantity (${unit})`} inputMode="decimal" {...form.getInputProps('quantity')} />
        <Stack gap={4}>
          <Text size="sm" fw={500}>
            Why
          </Text>
          <SegmentedControl
            aria-label="Why"
            data={(Object.keys(reasonLabels) as WriteOffReason[]).map((value) => ({
              value,
              label: reasonLabels[value],
            }))}
            {...form.getInputProps('reason')}
          />
        </Stack>
        <Textarea
          label="Note"
          description="Optional: what happened"
          autosize
          minRows={2}
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
