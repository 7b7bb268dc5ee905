import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { newIdempotencyKey } from '../../../lib/upload';
import { useLotAction, type LotAction } from '../api/lot-action';
import type { Lot } from '../api/types';
import { ConfirmStep } from './ConfirmStep';

const words: Record<
  LotAction,
  { title: string; intro: string; placeholder: string; confirm: string; done: string; danger: boolean }
> = {
  quarantine: {
    title: 'Quarantine',
    intro: 'A quarantined lot stays in the store but is not offered for jobs until it is released.',
    placeholder: 'Drum dented at the rim; kept aside for the supplier to see',
    confirm: 'Quarantine it',
    done: 'is quarantined',
    danger: true,
  },
  release: {
    title: 'Release',
    intro: 'The lot becomes available for jobs again.',
    placeholder: 'Supplier checked it; fine to use',
    confirm: 'Release it',
    done: 'is available again',
    danger: false,
  },
  'clear-flag': {
    title: 'Clear "check before use" on',
    intro:
      'Say what you checked: the lot was stored outside its temperature range and becomes usable again once cleared.',
    placeholder: 'Resin checked: clear, no gel, viscosity normal',
    confirm: 'Clear the flag',
    done: 'is cleared for use',
    danger: false,
  },
};

export function LotNoteActionModal({
  lot,
  action,
  onClose,
}: {
  lot: Lot;
  action: LotAction | null;
  onClose: () => void;
}) {
  const name = `${lot.materialName}${lot.batchNumber ? ` ${lot.batchNumber}` : ''}`;
  return (
    <Modal
      opened={action !== null}
      onClose={onClose}
      title={action ? `${words[action].title} ${name}` : ''}
      size="lg"
    >
      {action ? <LotNoteForm key={action} lot={lot} action={action} name={name} onClose={onClose} /> : null}
    </Modal>
  );
}

function LotNoteForm({
  lot,
  action,
  name,
  onClose,
}: {
  lot: Lot;
  action: LotAction;
  name: string;
  onClose: () => void;
}) {
  const act = useLotAction();
  const [key] = useState(newIdempotencyKey);
  const [step, setStep] = useState<'form' | 'confirm'>('form');
  const [error, setError] = useState<string | null>(null);
  const w = words[action];
  const form = useForm({
    initialValues: { note: '' },
    validate: {
      note: (value) =>
        value.trim() === ''
          ? 'Say why: it is kept with the lot'
          : value.length > 2000
            ? 'Keep it to 2000 characters'
            : null,
    },
  });

  if (step === 'confirm') {
    return (
      <ConfirmStep
        danger={w.danger}
        summary={`${w.confirm.replace(' it', '')}: ${name}. Note: “${form.values.note.trim()}”`}
        confirmLabel={w.confirm}
        busy={act.isPending}
        error={error}
        onBack={() => setStep('form')}
        onConfirm={() =>
          act.mutate(
            { lotId: lot.id, action, note: form.values.note.trim(), key },
            {
              onSuccess: () => {
                notifications.show({ color: 'green', message: `${name} ${w.done}.` });
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
    <form noValidate aria-label={`${w.title} the lot`} onSubmit={form.onSubmit(() => setStep('confirm'))}>
      <Stack gap="md">
        <Text size="sm">{w.intro}</Text>
        {action === 'clear-flag' && lot.exposureReason ? (
          <Text size="sm" c="dimmed">
            Flagged because: {lot.exposureReason}
          </Text>
        ) : null}
        <Textarea
          label="Note"
          placeholder={w.placeholder}
          autosize
          minRows={2}
          data-autofocus
          {...form.getInputProps('note')}
        />
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" color={w.danger ? 'red' : undefined}>
            Next
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
