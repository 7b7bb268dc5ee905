import { Badge, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { compareDecimals, formatNumber } from '../../../lib/amounts';
import { formatDateTime } from '../../../lib/format';
import { useClientTable } from '../../../lib/use-client-table';
import type { Reading } from '../api/types';

/** The chart's readings as a table: sortable, paged, and readable without the chart. */
export function ReadingsTable({ readings }: { readings: Reading[] }) {
  const table = useClientTable<Reading>(readings, {
    searchText: (r) => `${r.temperatureC} ${r.note ?? ''} ${r.source}`,
    compare: (column, a, b) =>
      column === 'temperatureC' ? compareDecimals(a as string, b as string) : undefined,
    initialSort: { columnAccessor: 'takenAt', direction: 'desc' },
    pageSizes: [10, 25, 100],
  });
  return (
    <DataTable<Reading>
      withTableBorder
      borderRadius="md"
      verticalSpacing={4}
      minHeight={table.records.length === 0 ? 120 : undefined}
      records={table.records}
      noRecordsText="No readings in this period. Record one above, or import the logger's file."
      recordsPerPageLabel="Readings per page"
      {...table.tableProps}
      columns={[
        { accessor: 'takenAt', title: 'When', sortable: true, render: (r) => formatDateTime(r.takenAt) },
        {
          accessor: 'temperatureC',
          title: 'Temperature',
          sortable: true,
          textAlign: 'right',
          render: (r) => (
            <Text size="sm" fw={r.outOfBand ? 700 : 400} c={r.outOfBand ? 'red.8' : undefined}>
              {formatNumber(r.temperatureC)} °C
            </Text>
          ),
        },
        {
          accessor: 'outOfBand',
          title: 'Band',
          sortable: true,
          render: (r) =>
            r.outOfBand === null ? (
              <Text size="sm" c="dimmed">
                —
              </Text>
            ) : r.outOfBand ? (
              <Badge
                color="red"
                leftSection={<IconAlertTriangle size={12} aria-hidden />}
                styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
              >
                Outside
              </Badge>
            ) : (
              <Badge
                color="teal"
                variant="light"
                styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
              >
                Inside
              </Badge>
            ),
        },
        {
          accessor: 'source',
          title: 'From',
          sortable: true,
          render: (r) => (r.source === 'import' ? 'Logger file' : 'Typed in'),
        },
        {
          accessor: 'note',
          title: 'Note',
          visibleMediaQuery: '(min-width: 48em)',
          render: (r) => r.note ?? '',
        },
      ]}
    />
  );
}
