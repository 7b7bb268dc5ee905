import { Button, Group, Stack, Text, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconFileCheck, IconTruckDelivery } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs, paths } from '../../../config/paths';
import { formatMoney } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useReceipts } from '../api/get-receipts';
import type { ReceiptSummary } from '../api/types';
import { canReceive } from '../components/can-receive';

const PAGE_SIZES = [25, 50, 100];
const isDate = (value: string) => /^\d{4}-\d{2}-\d{2}$/.test(value);

export function ReceiptsRoute() {
  const user = useSessionUser();
  const navigate = useNavigate();
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query, 300);
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(PAGE_SIZES[0] ?? 25);
  const receipts = useReceipts({
    q: debounced,
    from: isDate(from) ? from : undefined,
    to: isDate(to) ? to : undefined,
    limit: pageSize,
    offset: (page - 1) * pageSize,
  });
  const filtered = debounced.trim() !== '' || isDate(from) || isDate(to);

  return (
    <>
      <PageHeader
        title="Receipts"
        description="Every delivery booked in, newest first, with its lots, delivery note and labels."
        actions={
          canReceive(user.role) ? (
            <Button component={Link} to={paths.receiptNew} leftSection={<IconTruckDelivery size={18} />}>
              Receive a delivery
            </Button>
          ) : null
        }
      />
      <Stack gap="sm">
        <Group gap="sm" wrap="wrap" align="flex-end">
          <SearchInput
            label="Search receipts"
            placeholder="Supplier, delivery note or batch"
            value={query}
            onChange={(value) => {
              setQuery(value);
              setPage(1);
            }}
          />
          <TextInput
            label="From"
            type="date"
            size="sm"
            value={from}
            onChange={(e) => {
              setFrom(e.currentTarget.value);
              setPage(1);
            }}
            w={160}
          />
          <TextInput
            label="To"
            type="date"
            size="sm"
            value={to}
            onChange={(e) => {
              setTo(e.currentTarget.value);
              setPage(1);
            }}
            w={160}
          />
        </Group>
        {receipts.isError ? (
          <QueryError
            what="the receipts"
            error={receipts.error}
            onRetry={() => void receipts.refetch()}
            retrying={receipts.isFetching}
          />
        ) : (
          <DataTable<ReceiptSummary>
            withTableBorder
            borderRadius="lg"
            highlightOnHover
            verticalSpacing="sm"
            minHeight={(receipts.data?.items.length ?? 0) === 0 ? 220 : undefined}
            fetching={receipts.isPending || (receipts.isFetching && receipts.isPlaceholderData)}
            records={receipts.data?.items ?? []}
            noRecordsText={
              receipts.isPending
                ? 'Loading…'
                : filtered
                  ? 'No receipt matches. Clear the search or the dates.'
                  : canReceive(user.role)
                    ? 'No deliveries booked in yet. When one arrives, use "Receive a delivery".'
                    : 'No deliveries booked in yet.'
            }
            totalRecords={receipts.data?.total ?? 0}
            recordsPerPage={pageSize}
            page={page}
            onPageChange={setPage}
            recordsPerPageOptions={PAGE_SIZES}
            onRecordsPerPageChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
            recordsPerPageLabel="Receipts per page"
            paginationText={({ from: a, to: b, totalRecords }) => `${a}–${b} of ${totalRecords}`}
            onRowClick={({ record }) => void navigate(hrefs.receipt(record.id))}
            columns={[
              { accessor: 'number', title: 'No.', width: 70 },
              { accessor: 'receivedOn', title: 'Received', render: (r) => formatDate(r.receivedOn) },
              { accessor: 'supplierName', title: 'Supplier', render: (r) => r.supplierName ?? '—' },
              {
                accessor: 'deliveryNoteNumber',
                title: 'Delivery note',
                render: (r) => r.deliveryNoteNumber ?? '—',
              },
              {
                accessor: 'packsReceived',
                title: 'Packs',
                textAlign: 'right',
                render: (r) => (
                  <Text size="sm">
                    {r.packsReceived}
                    {r.packsRefused > 0 ? (
                      <Text span size="xs" c="red.8">
                        {' '}
                        ({r.packsRefused} refused)
                      </Text>
                    ) : null}
                  </Text>
                ),
              },
              {
                accessor: 'totalValue',
                title: 'Value',
                textAlign: 'right',
                render: (r) => formatMoney(r.totalValue),
              },
              {
                accessor: 'hasDeliveryNote',
                title: 'Note file',
                visibleMediaQuery: '(min-width: 48em)',
                render: (r) =>
                  r.hasDeliveryNote ? (
                    <Group gap={4} wrap="nowrap">
                      <IconFileCheck size={16} aria-hidden />
                      <Text size="sm">Kept</Text>
                    </Group>
                  ) : (
                    <Text size="sm" c="dimmed">
                      None
                    </Text>
                  ),
              },
              { accessor: 'receivedByName', title: 'By', visibleMediaQuery: '(min-width: 62em)' },
            ]}
          />
        )}
      </Stack>
    </>
  );
}
