import { Button, type ButtonProps } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconPrinter } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { openFileInNewTab } from '../../../lib/open-file';
import { getReceiptLabels } from '../api/delivery-note';

/** The receipt's labels, one per pack with its lot's QR code, opened as a PDF for printing. */
export function PrintLabelsButton({
  receiptId,
  number,
  ...props
}: { receiptId: string; number: number } & ButtonProps) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      leftSection={<IconPrinter size={18} />}
      loading={busy}
      {...props}
      onClick={() => {
        setBusy(true);
        openFileInNewTab(() => getReceiptLabels(receiptId), `receipt-${number}-labels.pdf`)
          .catch((error: unknown) =>
            notifications.show({
              color: 'red',
              title: 'The labels were not made',
              message: errorMessage(error),
            }),
          )
          .finally(() => setBusy(false));
      }}
    >
      Print labels
    </Button>
  );
}
