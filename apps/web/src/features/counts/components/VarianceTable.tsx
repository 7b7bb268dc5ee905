import { Group, Stack, Text } from '@mantine/core';
import { DataTable } from 'mantine-datatable';
import {
  compareDecimals,
  formatQuantity,
  formatSignedMoney,
  formatSignedQuantity,
} from '../../../lib/amounts';
import { useClientTable } from '../../../lib/use-client-table';
import { SearchInput } from '../../../components/SearchInput';
import type { CountLine } from '../api/types';
import { VarianceBadge } from './badges';

/** Each lot at each location: expected, counted, the difference and what it is worth. */
export function VarianceTable({ lines }: { lines: CountLine[] }) {
  const table = useClientTable<CountLine>(lines, {
    searchText: (l) => `${l.materialCode} ${l.materialName} ${l.batchNumber ?? ''} ${l.locationName}`,
    compare: (column, a, b) =>
      ['expectedQuantity', 'countedQuantity', 'varianceQuantity', 'varianceValue'].includes(column)
        ? compareDecimals(a as string | null, b as string | null)
        : undefined,
    initialSort: { columnAccessor: 'varianceValue', direction: 'asc' },
  });
  return (
    <Stack gap="sm">
      <SearchInput
        label="Filter lines"
        placeholder="Filter by material, batch or location"
        value={table.query}
        onChange={table.setQuery}
      />
      <DataTable<CountLine>
        withTableBorder
        borderRadius="md"
        verticalSpacing="xs"
        minHeight={table.records.length === 0 ? 160 : undefined}
        records={table.records}
        noRecordsText={lines.length === 0 ? 'The count has no lines.' : 'No line matches. Clear the filter.'}
        recordsPerPageLabel="Lines per page"
        {...table.tableProps}
        rowBackgroundColor={(line) =>
          line.varianceKind === 'loss'
            ? { light: 'var(--mantine-color-red-0)', dark: 'var(--mantine-color-red-9)' }
            : undefined
        }
        columns={[
          {
            accessor: 'materialName',
            title: 'Lot',
            sortable: true,
            render: (l) => (
              <Stack gap={0}>
                <Text size="sm" fw={600}>
                  {l.materialName}
                </Text>
                <Text size="xs" c="dimmed">
                  {l.materialCode}
                  {l.batchNumber ? ` · batch ${l.batchNumber}` : ''}
                  {l.foundDuringCount ? ' · found during the count' : ''}
                </Text>
              </Stack>
            ),
          },
          { accessor: 'locationName', title: 'Location', sortable: true },
          {
            accessor: 'expectedQuantity',
            title: 'Expected',
            sortable: true,
            textAlign: 'right',
            render: (l) => formatQuantity(l.expectedQuantity, l.stockUnit),
          },
          {
            accessor: 'countedQuantity',
            title: 'Counted',
            sortable: true,
            textAlign: 'right',
            render: (l) => formatQuantity(l.countedQuantity, l.stockUnit),
          },
          {
            accessor: 'varianceQuantity',
            title: 'Difference',
            sortable: true,
            textAlign: 'right',
            render: (l) => (
              <Group gap={6} justify="flex-end" wrap="nowrap">
                <Text size="sm" fw={600}>
                  {l.varianceKind === 'match' ? '0' : formatSignedQuantity(l.varianceQuantity, l.stockUnit)}
                </Text>
                {l.varianceKind ? <VarianceBadge kind={l.varianceKind} /> : null}
              </Group>
            ),
          },
          {
            accessor: 'varianceValue',
            title: 'Value',
            sortable: true,
            textAlign: 'right',
            render: (l) => (l.varianceValue === null ? '—' : formatSignedMoney(l.varianceValue)),
          },
        ]}
      />
    </Stack>
  );
}
