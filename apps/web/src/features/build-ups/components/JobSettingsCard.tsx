import { Button, Group, Paper, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useEffect } from 'react';
import { formatDateTime } from '../../../lib/format';
import { useJobSettings, useUpdateJobSettings } from '../api/job-settings';

const WHOLE = /^\d{1,3}$/;

function days(value: string, min: number): string | null {
  const v = value.trim();
  if (!WHOLE.test(v) || Number(v) < min || Number(v) > 365) {
    return `A whole number of days from ${min} to 365`;
  }
  return null;
}

/** How far beyond the job date reserved stock must stay in date, and how long a quote holds. */
export function JobSettingsCard({ canEdit }: { canEdit: boolean }) {
  const settings = useJobSettings();
  const save = useUpdateJobSettings();
  const form = useForm({
    initialValues: { reservationMarginDays: '', quoteValidityDays: '' },
    validate: {
      reservationMarginDays: (v) => days(v, 0),
      quoteValidityDays: (v) => days(v, 1),
    },
  });

  useEffect(() => {
    if (settings.data) {
      const v = {
        reservationMarginDays: String(settings.data.reservationMarginDays),
        quoteValidityDays: String(settings.data.quoteValidityDays),
      };
      form.setValues(v);
      form.resetDirty(v);
    }
    // Refill when the saved settings change.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [settings.data]);

  if (settings.isError) {
    return null;
  }
  const submit = form.onSubmit((v) =>
    save.mutate(
      {
        reservationMarginDays: Number(v.reservationMarginDays),
        quoteValidityDays: Number(v.quoteValidityDays),
      },
      {
        onSuccess: () =>
          notifications.show({ color: 'green', message: 'Reservation and quote settings saved.' }),
      },
    ),
  );

  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Reservations and quotes">
      <form onSubmit={submit} noValidate>
        <Stack gap="sm">
          <div>
            <Text fw={700}>Reservations and quotes</Text>
            <Text size="sm" c="dimmed">
              Reserved lots must still be in date this many days after the job date; a quote holds for its
              validity.
              {settings.data?.updatedAt ? ` Last changed ${formatDateTime(settings.data.updatedAt)}.` : ''}
            </Text>
          </div>
          <Group align="flex-start" gap="sm" wrap="wrap">
            <TextInput
              label="Expiry margin (days)"
              inputMode="numeric"
              w={180}
              disabled={!canEdit || settings.isPending}
              {...form.getInputProps('reservationMarginDays')}
            />
            <TextInput
              label="Quote holds for (days)"
              inputMode="numeric"
              w={180}
              disabled={!canEdit || settings.isPending}
              {...form.getInputProps('quoteValidityDays')}
            />
            {canEdit ? (
              <Button
                type="submit"
                mt={25}
                variant="light"
                loading={save.isPending}
                disabled={!form.isDirty()}
              >
                Save
              </Button>
            ) : null}
          </Group>
        </Stack>
      </form>
    </Paper>
  );
}
