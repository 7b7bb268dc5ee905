import { Badge, Button, Group, Text } from '@mantine/core';
import { IconCheck, IconFileTypePdf } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { compareValues, formatDateTime } from '../../../../lib/format';
import type { EstimateSummary } from '../../api/types';
import { formatArea, formatMoney } from '../../utils/format';

const PAGE_SIZE = 10;

interface VersionsTableProps {
  versions: EstimateSummary[];
  selected: number | null;
  canAccept: boolean;
  accepting: number | null;
  downloading: number | null;
  onSelect: (version: number) => void;
  onAccept: (version: EstimateSummary) => void;
  onQuote: (version: number) => void;
}

/** Every estimate of the job, newest first; the accepted one is marked. */
export function VersionsTable({
  versions,
  selected,
  canAccept,
  accepting,
  downloading,
  onSelect,
  onAccept,
  onQuote,
}: VersionsTableProps) {
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<EstimateSummary>>({
    columnAccessor: 'version',
    direction: 'desc',
  });
  const [page, setPage] = useState(1);
  const sorted = useMemo(() => {
    const column = String(sortStatus.columnAccessor) as keyof EstimateSummary;
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    const value = (v: EstimateSummary) =>
      column === 'gross' || column === 'net' ? Number(v[column]) : v[column];
    return [...versions].sort((a, b) => direction * compareValues(value(a), value(b)));
  }, [versions, sortStatus]);
  const records = sorted.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);

  return (
    <DataTable<EstimateSummary>
      withTableBorder
      borderRadius="md"
      highlightOnHover
      verticalSpacing="xs"
      records={records}
      idAccessor="version"
      noRecordsText="No estimates yet: run one above."
      minHeight={records.length === 0 ? 140 : undefined}
      sortStatus={sortStatus}
      onSortStatusChange={setSortStatus}
      totalRecords={sorted.length}
      recordsPerPage={PAGE_SIZE}
      page={page}
      onPageChange={setPage}
      paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
      onRowClick={({ record }) => onSelect(record.version)}
      rowStyle={(v) => (v.version === selected ? { background: 'var(--mantine-color-resin-0)' } : undefined)}
      columns={[
        {
          accessor: 'version',
          title: 'Version',
          sortable: true,
          noWrap: true,
          render: (v) => (
            <Group gap={6} wrap="nowrap">
              <Text size="sm" fw={700}>
                v{v.version}
              </Text>
              {v.accepted ? (
                <Badge color="green" size="sm" leftSection={<IconCheck size={11} />}>
                  Accepted
                </Badge>
              ) : null}
              {v.version === selected ? (
                <Text size="xs" c="dimmed">
                  (shown)
                </Text>
              ) : null}
            </Group>
          ),
        },
        { accessor: 'createdAt', title: 'Made', sortable: true, render: (v) => formatDateTime(v.createdAt) },
        { accessor: 'buildUpName', title: 'Build-up', sortable: true },
        {
          accessor: 'costBasis',
          title: 'Costed at',
          render: (v) => (v.costBasis === 'stock' ? 'Stock cost' : 'Supplier prices'),
        },
        {
          accessor: 'laminatedAreaM2',
          title: 'Laminated',
          textAlign: 'right',
          render: (v) => formatArea(v.laminatedAreaM2),
        },
        {
          accessor: 'net',
          title: 'Net',
          sortable: true,
          textAlign: 'right',
          render: (v) => formatMoney(v.net),
        },
        {
          accessor: 'gross',
          title: 'Total',
          sortable: true,
          noWrap: true,
          textAlign: 'right',
          render: (v) => (
            <Group gap={4} justify="flex-end" wrap="nowrap">
              {v.unpriced > 0 ? (
                <Badge color="orange" variant="outline" size="xs">
                  {v.unpriced} no price
                </Badge>
              ) : null}
              <Text size="sm" fw={600}>
                {formatMoney(v.gross)}
              </Text>
            </Group>
          ),
        },
        {
          accessor: 'actions',
          title: '',
          noWrap: true,
          textAlign: 'right',
          render: (v) => (
            <Group gap={6} justify="flex-end" wrap="nowrap" onClick={(e) => e.stopPropagation()}>
              <Button
                size="compact-xs"
                variant="subtle"
                leftSection={<IconFileTypePdf size={14} />}
                loading={downloading === v.version}
                aria-label={`Quote PDF of version ${v.version}`}
                onClick={() => onQuote(v.version)}
              >
                Quote
              </Button>
              {canAccept && !v.accepted ? (
                <Button
                  size="compact-xs"
                  variant="light"
                  loading={accepting === v.version}
                  aria-label={`Accept version ${v.version}`}
                  onClick={() => onAccept(v)}
                >
                  Accept
                </Button>
              ) : null}
            </Group>
          ),
        },
      ]}
    />
  );
}
