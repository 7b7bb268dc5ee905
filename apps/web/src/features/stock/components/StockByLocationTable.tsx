import { Group, Stack, Text } from '@mantine/core';
import { DataTable } from 'mantine-datatable';
import { useNavigate } from 'react-router-dom';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { formatMoney, formatQuantity } from '../../../lib/amounts';
import { locationKindLabel } from '../../../lib/material-words';
import { useClientTable } from '../../../lib/use-client-table';
import { useLocationBalances } from '../api/get-balances';
import type { LocationBalanceRow } from '../api/types';
import { decimalColumns } from './compare';

export function StockByLocationTable() {
  const balances = useLocationBalances();
  const navigate = useNavigate();
  const table = useClientTable<LocationBalanceRow>(balances.data?.rows ?? [], {
    searchText: (row) =>
      `${row.locationName} ${locationKindLabel(row.locationKind)} ${row.materialCode} ${row.materialName}`,
    compare: decimalColumns(['quantity', 'value']),
    initialSort: { columnAccessor: 'locationName', direction: 'asc' },
  });
  if (balances.isError) {
    return (
      <QueryError
        what="the stock"
        error={balances.error}
        onRetry={() => void balances.refetch()}
        retrying={balances.isFetching}
      />
    );
  }
  const empty =
    (balances.data?.rows.length ?? 0) === 0
      ? 'No location holds stock yet. Book in a delivery with "Receive a delivery".'
      : `Nothing matches "${table.query.trim()}". Clear the filter.`;
  return (
    <Stack gap="sm">
      <Group gap="sm" wrap="wrap" align="flex-end">
        <SearchInput
          label="Filter locations"
          placeholder="Filter by location or material"
          value={table.query}
          onChange={table.setQuery}
        />
        {balances.data ? (
          <Text size="sm" c="dimmed">
            Value of what is listed: <b>{formatMoney(balances.data.totalValue)}</b>
          </Text>
        ) : null}
      </Group>
      <DataTable<LocationBalanceRow>
        withTableBorder
        borderRadius="lg"
        highlightOnHover
        verticalSpacing="sm"
        minHeight={table.records.length === 0 ? 200 : undefined}
        fetching={balances.isPending}
        records={table.records}
        idAccessor={(row) => `${row.locationId}:${row.materialId}`}
        noRecordsText={balances.isPending ? 'Loading…' : empty}
        recordsPerPageLabel="Rows per page"
        {...table.tableProps}
        onRowClick={({ record }) =>
          void navigate(hrefs.stockView('lot', { location: record.locationId, material: record.materialId }))
        }
        columns={[
          {
            accessor: 'locationName',
            title: 'Location',
            sortable: true,
            render: (row) => (
              <Stack gap={0}>
                <Text size="sm" fw={600}>
                  {row.locationName}
                </Text>
                <Text size="xs" c="dimmed">
                  {locationKindLabel(row.locationKind)}
                </Text>
              </Stack>
            ),
          },
          {
            accessor: 'materialName',
            title: 'Material',
            sortable: true,
            render: (row) => (
              <Text size="sm">
                <Text span ff="monospace" fw={700}>
                  {row.materialCode}
                </Text>{' '}
                {row.materialName}
              </Text>
            ),
          },
          {
            accessor: 'quantity',
            title: 'Quantity',
            sortable: true,
            textAlign: 'right',
            render: (row) => formatQuantity(row.quantity, row.stockUnit),
          },
          { accessor: 'lotCount', title: 'Lots', sortable: true, textAlign: 'right' },
          {
            accessor: 'value',
            title: 'Value',
            sortable: true,
            textAlign: 'right',
            visibleMediaQuery: '(min-width: 48em)',
            render: (row) => formatMoney(row.value),
          },
        ]}
      />
    </Stack>
  );
}
