import { Badge, Checkbox, CloseButton, Group, Select, Stack, Text } from '@mantine/core';
import { DataTable } from 'mantine-datatable';
import { useNavigate } from 'react-router-dom';
import { ExpiryBadge, LotBadges, lotStatusLabels, type LotStatusValue } from '../../../components/LotBadges';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { formatMoney, formatQuantity } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { useClientTable } from '../../../lib/use-client-table';
import { useLocations } from '../api/get-locations';
import { useLots } from '../api/get-lots';
import type { Lot, LotFilters } from '../api/types';
import { decimalColumns } from './compare';

const statusOptions = [
  { value: '', label: 'Any status' },
  ...(Object.keys(lotStatusLabels) as LotStatusValue[]).map((status) => ({
    value: status,
    label: lotStatusLabels[status],
  })),
];

interface LotsTableProps {
  filters: LotFilters;
  onFiltersChange: (filters: LotFilters) => void;
  /** The material the list is narrowed to, by name, for the chip above the table. */
  materialLabel?: string;
}

export function LotsTable({ filters, onFiltersChange, materialLabel }: LotsTableProps) {
  const lots = useLots(filters);
  const locations = useLocations();
  const navigate = useNavigate();
  const table = useClientTable<Lot>(lots.data ?? [], {
    searchText: (lot) =>
      `${lot.materialCode} ${lot.materialName} ${lot.batchNumber ?? ''} ${lot.places.map((p) => p.locationName).join(' ')}`,
    sortValue: (lot, column) =>
      column === 'expiry'
        ? (lot.expiry.expiresOn ?? '9999')
        : (lot as unknown as Record<string, unknown>)[column],
    compare: decimalColumns(['quantity', 'value']),
    initialSort: { columnAccessor: 'expiry', direction: 'asc' },
  });
  const set = (change: Partial<LotFilters>) => {
    table.resetPage();
    onFiltersChange({ ...filters, ...change });
  };

  if (lots.isError) {
    return (
      <QueryError
        what="the lots"
        error={lots.error}
        onRetry={() => void lots.refetch()}
        retrying={lots.isFetching}
      />
    );
  }
  const narrowed = Object.values(filters).some((value) => value !== undefined);
  const empty =
    (lots.data?.length ?? 0) === 0
      ? narrowed
        ? 'No lot matches these filters. Clear them to see every lot in stock.'
        : 'No lots in stock yet. Book in a delivery with "Receive a delivery".'
      : `Nothing matches "${table.query.trim()}". Clear the filter.`;

  return (
    <Stack gap="sm">
      <Group gap="sm" wrap="wrap" align="flex-end">
        <SearchInput
          label="Filter lots"
          placeholder="Filter by material, batch or location"
          value={table.query}
          onChange={table.setQuery}
        />
        <Select
          aria-label="Status"
          data={statusOptions}
          value={filters.status ?? ''}
          onChange={(value) => set({ status: value ? (value as LotStatusValue) : undefined })}
          w={{ base: '100%', sm: 170 }}
          size="sm"
        />
        <Select
          aria-label="Location"
          placeholder="Every location"
          data={[
            { value: '', label: 'Every location' },
            ...(locations.data ?? []).map((l) => ({ value: l.id, label: l.path })),
          ]}
          value={filters.locationId ?? ''}
          onChange={(value) => set({ locationId: value || undefined })}
          searchable
          w={{ base: '100%', sm: 240 }}
          size="sm"
        />
        <Checkbox
          label="Expiring within 30 days"
          checked={filters.expiringWithinDays === 30}
          onChange={(event) => set({ expiringWithinDays: event.currentTarget.checked ? 30 : undefined })}
        />
        <Checkbox
          label="Check before use"
          checked={filters.flagged === true}
          onChange={(event) => set({ flagged: event.currentTarget.checked ? true : undefined })}
        />
        <Checkbox
          label="Include used up"
          checked={filters.includeEmpty === true}
          onChange={(event) => set({ includeEmpty: event.currentTarget.checked ? true : undefined })}
        />
      </Group>
      {filters.materialId ? (
        <Group gap="xs">
          <Badge
            size="lg"
            variant="light"
            rightSection={
              <CloseButton
                size="xs"
                aria-label="Show every material"
                onClick={() => set({ materialId: undefined })}
              />
            }
            styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
          >
            {materialLabel ??
              (lots.data?.[0] ? `${lots.data[0].materialCode} ${lots.data[0].materialName}` : 'One material')}
          </Badge>
        </Group>
      ) : null}
      <DataTable<Lot>
        withTableBorder
        borderRadius="lg"
        highlightOnHover
        verticalSpacing="sm"
        minHeight={table.records.length === 0 ? 200 : undefined}
        fetching={lots.isPending}
        records={table.records}
        noRecordsText={lots.isPending ? 'Loading…' : empty}
        recordsPerPageLabel="Lots per page"
        {...table.tableProps}
        onRowClick={({ record }) => void navigate(hrefs.lot(record.id))}
        columns={[
          {
            accessor: 'materialName',
            title: 'Material',
            sortable: true,
            render: (lot) => (
              <Stack gap={0}>
                <Text size="sm" fw={600}>
                  {lot.materialName}
                </Text>
                <Text size="xs" c="dimmed" ff="monospace">
                  {lot.materialCode}
                </Text>
              </Stack>
            ),
          },
          {
            accessor: 'batchNumber',
            title: 'Batch',
            sortable: true,
            render: (lot) => lot.batchNumber ?? '—',
          },
          {
            accessor: 'locationName',
            title: 'Where',
            sortable: true,
            render: (lot) =>
              lot.places.length > 1
                ? lot.places.map((place) => place.locationName).join(', ')
                : lot.locationName,
          },
          {
            accessor: 'quantity',
            title: 'Quantity',
            sortable: true,
            textAlign: 'right',
            render: (lot) => formatQuantity(lot.quantity, lot.stockUnit),
          },
          {
            accessor: 'expiry',
            title: 'Expiry',
            sortable: true,
            render: (lot) => <ExpiryBadge expiry={lot.expiry} />,
          },
          {
            accessor: 'status',
            title: 'Status',
            sortable: true,
            render: (lot) => (
              <LotBadges
                status={lot.status}
                exposureFlagged={lot.exposureFlagged}
                exposureReason={lot.exposureReason}
              />
            ),
          },
          {
            accessor: 'value',
            title: 'Value',
            sortable: true,
            textAlign: 'right',
            visibleMediaQuery: '(min-width: 62em)',
            render: (lot) => formatMoney(lot.value),
          },
          {
            accessor: 'receivedOn',
            title: 'Received',
            sortable: true,
            visibleMediaQuery: '(min-width: 62em)',
            render: (lot) => formatDate(lot.receivedOn),
          },
        ]}
      />
    </Stack>
  );
}
