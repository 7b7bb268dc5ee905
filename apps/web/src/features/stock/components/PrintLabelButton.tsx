import { Button, Group, NumberInput } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconPrinter } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { openFileInNewTab } from '../../../lib/open-file';
import { getLotLabel } from '../api/lot-action';
import type { Lot } from '../api/types';

/** One lot's label (with its QR code) as a PDF, opened for printing; copies for several packs. */
export function PrintLabelButton({ lot }: { lot: Lot }) {
  const [copies, setCopies] = useState<number | string>(1);
  const [busy, setBusy] = useState(false);
  const count = typeof copies === 'number' ? copies : Number(copies);
  const valid = Number.isInteger(count) && count >= 1 && count <= 100;
  return (
    <Group gap="xs" wrap="nowrap" align="flex-end">
      <NumberInput
        label="Copies"
        value={copies}
        onChange={setCopies}
        min={1}
        max={100}
        allowDecimal={false}
        w={90}
        size="sm"
        error={valid ? undefined : '1 to 100'}
      />
      <Button
        variant="default"
        leftSection={<IconPrinter size={18} />}
        loading={busy}
        disabled={!valid}
        onClick={() => {
          setBusy(true);
          openFileInNewTab(() => getLotLabel(lot.id, count), `lot-${lot.batchNumber ?? lot.id}-label.pdf`)
            .catch((error: unknown) =>
              notifications.show({
                color: 'red',
                title: 'The label was not made',
                message: errorMessage(error),
              }),
            )
            .finally(() => setBusy(false));
        }}
      >
        Print label
      </Button>
    </Group>
  );
}
