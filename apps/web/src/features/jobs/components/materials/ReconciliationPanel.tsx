import { Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { PageLoader } from '../../../../components/PageLoader';
import { QueryError } from '../../../../components/QueryError';
import { compareValues } from '../../../../lib/format';
import { useReconciliation } from '../../api/get-reconciliation';
import type { ReconciliationMaterial } from '../../api/types';
import { formatMoney, formatNumber, formatQuantity } from '../../utils/format';
import { LabourCostLine } from '../labour/LabourCostLine';

const PAGE_SIZE = 15;

function sortValue(m: ReconciliationMaterial, column: string): string | number {
  switch (column) {
    case 'variance':
      return Number(m.variance);
    case 'actualCost':
      return Number(m.actualCost);
    default:
      return m.material?.name ?? '';
  }
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={700}>
        {label}
      </Text>
      <Text fw={700}>{value}</Text>
    </div>
  );
}

/** The accepted estimate against what went out, came back and was used, with the job's margin so far. */
export function ReconciliationPanel({ jobId }: { jobId: string }) {
  const rec = useReconciliation(jobId, true);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<ReconciliationMaterial>>({
    columnAccessor: 'material',
    direction: 'asc',
  });
  const [page, setPage] = useState(1);
  const rows = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    return [...(rec.data?.materials ?? [])].sort(
      (a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)),
    );
  }, [rec.data, sortStatus]);

  if (rec.isPending) {
    return <PageLoader label="Loading estimated against used…" />;
  }
  if (rec.isError) {
    return (
      <QueryError
        what="the comparison"
        error={rec.error}
        onRetry={() => void rec.refetch()}
        retrying={rec.isFetching}
      />
    );
  }
  const { totals } = rec.data;
  const records = rows.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);
  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Estimated against used">
      <Stack gap="sm">
        <Group justify="space-between" wrap="wrap">
          <Text fw={700}>Estimated against used</Text>
          <Text size="sm" c="dimmed">
            Used = issued − returned. From estimate version {rec.data.estimate?.version ?? '—'}.
          </Text>
        </Group>
        <SimpleGrid cols={{ base: 2, sm: 5 }} spacing="sm">
          <Figure label="Price (net)" value={formatMoney(totals.price)} />
          <Figure label="Materials estimated" value={formatMoney(totals.estimatedMaterials)} />
          <Figure label="Materials used" value={formatMoney(totals.actualMaterials)} />
          <Figure label="Labour" value={formatMoney(totals.labour)} />
          <Figure
            label="Margin"
            value={
              totals.margin === null
                ? '—'
                : `${formatMoney(totals.margin)}${totals.marginPct ? ` (${formatNumber(totals.marginPct, 1)} %)` : ''}`
            }
          />
        </SimpleGrid>
        <LabourCostLine reconciliation={rec.data} />
        <DataTable<ReconciliationMaterial>
          withTableBorder
          borderRadius="md"
          verticalSpacing="xs"
          records={records}
          idAccessor={(m) => m.material?.id ?? m.roles.join(',')}
          noRecordsText="Nothing estimated or issued yet."
          minHeight={records.length === 0 ? 120 : undefined}
          sortStatus={sortStatus}
          onSortStatusChange={setSortStatus}
          totalRecords={rows.length}
          recordsPerPage={PAGE_SIZE}
          page={page}
          onPageChange={setPage}
          paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
          columns={[
            {
              accessor: 'material',
              title: 'Material',
              sortable: true,
              render: (m) => m.material?.name ?? 'Not in the catalogue',
            },
            {
              accessor: 'estimatedQuantity',
              title: 'Estimated',
              textAlign: 'right',
              render: (m) => formatQuantity(m.estimatedQuantity, m.unit, 3),
            },
            {
              accessor: 'issued',
              title: 'Issued',
              textAlign: 'right',
              render: (m) => formatQuantity(m.issued, m.unit, 3),
            },
            {
              accessor: 'returned',
              title: 'Returned',
              textAlign: 'right',
              render: (m) => formatQuantity(m.returned, m.unit, 3),
            },
            {
              accessor: 'used',
              title: 'Used',
              textAlign: 'right',
              render: (m) => formatQuantity(m.used, m.unit, 3),
            },
            {
              accessor: 'variance',
              title: 'Used − estimated',
              sortable: true,
              textAlign: 'right',
              render: (m) => (Number(m.variance) > 0 ? '+' : '') + formatQuantity(m.variance, m.unit, 3),
            },
            {
              accessor: 'actualCost',
              title: 'Cost used',
              sortable: true,
              textAlign: 'right',
              render: (m) => formatMoney(m.actualCost),
            },
          ]}
        />
      </Stack>
    </Paper>
  );
}
