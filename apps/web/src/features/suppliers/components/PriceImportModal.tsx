import { Code, Modal, Stack, Text, TextInput } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { useState } from 'react';
import { CsvImportFlow } from '../../../components/csv-import/CsvImportFlow';
import { formatMoney } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { useImportPrices, type PriceImportRow } from '../api/price-csv';

interface PriceImportModalProps {
  supplierId: string;
  supplierName: string;
  opened: boolean;
  onClose: () => void;
}

const validDate = (value: string) => /^\d{4}-\d{2}-\d{2}$/.test(value);

export function PriceImportModal({ supplierId, supplierName, opened, onClose }: PriceImportModalProps) {
  const phone = useMediaQuery('(max-width: 36em)');
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={`Import ${supplierName}'s price list`}
      size="90rem"
      fullScreen={phone}
    >
      {opened ? <PriceImport supplierId={supplierId} /> : null}
    </Modal>
  );
}

function PriceImport({ supplierId }: { supplierId: string }) {
  const [validFrom, setValidFrom] = useState('');
  const send = useImportPrices(supplierId, validDate(validFrom) ? validFrom : null);
  return (
    <Stack gap="md">
      <Text size="sm" c="dimmed">
        One row per pack: <Code>material_code</Code> (or <Code>supplier_code</Code>), <Code>pack_size</Code>,{' '}
        <Code>pack_price</Code> (pounds net of VAT) and <Code>valid_from</Code>. Each row is a new price from
        its date; earlier prices stay as history. Every row is written, or none. &quot;Export CSV&quot; writes
        the same columns.
      </Text>
      <TextInput
        label="Valid from, for rows without a date"
        description="Leave empty when every row has its valid_from"
        type="date"
        value={validFrom}
        onChange={(event) => setValidFrom(event.currentTarget.value)}
        maw={280}
      />
      {/* A changed date needs a fresh check, so the import starts again with it. */}
      <CsvImportFlow<PriceImportRow>
        key={validFrom}
        what="the price list CSV"
        send={send}
        actionLabels={{ create: 'New price', update: 'Changes', unchanged: 'Already held' }}
        commitLabel={(summary) => `Import ${summary.created} price${summary.created === 1 ? '' : 's'}`}
        columns={[
          {
            accessor: 'code',
            title: 'Material',
            sortable: true,
            render: (row) => (
              <Text size="sm">
                <Text span ff="monospace" fw={600}>
                  {row.code || '—'}
                </Text>{' '}
                {row.name}
              </Text>
            ),
          },
          { accessor: 'packSize', title: 'Pack size', render: (row) => row.packSize ?? '—' },
          {
            accessor: 'packPrice',
            title: 'Price',
            render: (row) => (
              <Text size="sm">
                {formatMoney(row.packPrice)}
                {row.previousPrice ? (
                  <Text span size="xs" c="dimmed">
                    {' '}
                    (was {formatMoney(row.previousPrice)})
                  </Text>
                ) : null}
              </Text>
            ),
          },
          {
            accessor: 'validFrom',
            title: 'From',
            render: (row) => (row.validFrom ? formatDate(row.validFrom) : '—'),
          },
        ]}
      />
    </Stack>
  );
}
