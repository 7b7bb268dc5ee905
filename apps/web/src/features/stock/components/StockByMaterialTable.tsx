import { Group, Select, Stack, Text } from '@mantine/core';
import { MATERIAL_KINDS, type MaterialKind } from '@potlife/domain';
import { DataTable } from 'mantine-datatable';
import { useNavigate } from 'react-router-dom';
import { ExpiryBadge } from '../../../components/LotBadges';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { formatMoney, formatQuantity } from '../../../lib/amounts';
import { materialKindLabel, materialKindLabels } from '../../../lib/material-words';
import { useClientTable } from '../../../lib/use-client-table';
import { useMaterialBalances } from '../api/get-balances';
import type { MaterialBalanceRow } from '../api/types';
import { BelowReorderBadge } from './BelowReorderBadge';
import { decimalColumns } from './compare';

const kindOptions = [
  { value: '', label: 'Every kind' },
  ...MATERIAL_KINDS.map((kind) => ({ value: kind, label: materialKindLabels[kind] })),
];

export function StockByMaterialTable({
  kind,
  onKindChange,
}: {
  kind?: MaterialKind;
  onKindChange: (kind?: MaterialKind) => void;
}) {
  const balances = useMaterialBalances(kind);
  const navigate = useNavigate();
  const table = useClientTable<MaterialBalanceRow>(balances.data?.rows ?? [], {
    searchText: (row) => `${row.materialCode} ${row.materialName} ${materialKindLabel(row.materialKind)}`,
    sortValue: (row, column) =>
      column === 'nextExpiry'
        ? (row.nextExpiry?.expiresOn ?? '9999')
        : (row as unknown as Record<string, unknown>)[column],
    compare: decimalColumns(['quantity', 'usableQuantity', 'value']),
    initialSort: { columnAccessor: 'materialCode', direction: 'asc' },
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
      ? kind
        ? `No ${materialKindLabel(kind).toLowerCase()} in stock. Choose "Every kind", or receive a delivery.`
        : 'Nothing in stock yet. Book in a delivery with "Receive a delivery".'
      : `Nothing matches "${table.query.trim()}". Clear the filter.`;

  return (
    <Stack gap="sm">
      <Group gap="sm" wrap="wrap" align="flex-end">
        <SearchInput
          label="Filter materials"
          placeholder="Filter by code, name or kind"
          value={table.query}
          onChange={table.setQuery}
        />
        <Select
          aria-label="Kind"
          data={kindOptions}
          value={kind ?? ''}
          onChange={(value) => onKindChange(value ? (value as MaterialKind) : undefined)}
          w={{ base: '100%', sm: 200 }}
          size="sm"
        />
        {balances.data ? (
          <Text size="sm" c="dimmed">
            Value of what is listed: <b>{formatMoney(balances.data.totalValue)}</b>
          </Text>
        ) : null}
      </Group>
      <DataTable<MaterialBalanceRow>
        withTableBorder
        borderRadius="lg"
        highlightOnHover
        verticalSpacing="sm"
        minHeight={table.records.length === 0 ? 200 : undefined}
        fetching={balances.isPending}
        records={table.records}
        idAccessor="materialId"
        noRecordsText={balances.isPending ? 'Loading…' : empty}
        recordsPerPageLabel="Materials per page"
        {...table.tableProps}
        onRowClick={({ record }) => void navigate(hrefs.stockView('lot', { material: record.materialId }))}
        columns={[
          {
            accessor: 'materialCode',
            title: 'Code',
            sortable: true,
            noWrap: true,
            render: (row) => (
              <Text size="sm" ff="monospace" fw={700}>
                {row.materialCode}
              </Text>
            ),
          },
          {
            accessor: 'materialName',
            title: 'Material',
            sortable: true,
            render: (row) => (
              <Stack gap={2}>
                <Text size="sm">{row.materialName}</Text>
                {row.belowReorder ? <BelowReorderBadge /> : null}
              </Stack>
            ),
          },
          {
            accessor: 'quantity',
            title: 'In stock',
            sortable: true,
            textAlign: 'right',
            render: (row) => formatQuantity(row.quantity, row.stockUnit),
          },
          {
            accessor: 'usableQuantity',
            title: 'Usable',
            sortable: true,
            visibleMediaQuery: '(min-width: 48em)',
            textAlign: 'right',
            render: (row) => formatQuantity(row.usableQuantity, row.stockUnit),
          },
          {
            accessor: 'lotCount',
            title: 'Lots',
            sortable: true,
            textAlign: 'right',
            visibleMediaQuery: '(min-width: 48em)',
          },
          {
            accessor: 'nextExpiry',
            title: 'Next expiry',
            sortable: true,
            render: (row) =>
              row.nextExpiry ? (
                <ExpiryBadge expiry={row.nextExpiry} />
              ) : (
                <Text size="sm" c="dimmed">
                  —
                </Text>
              ),
          },
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
