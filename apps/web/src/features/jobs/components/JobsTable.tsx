import { Anchor, Stack, Text } from '@mantine/core';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { Link } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { Job } from '../api/types';
import { formatMoney } from '../utils/format';
import { JobStatusBadge, MaterialStateBadge } from './JobStatusBadge';

export const PAGE_SIZES = [10, 25, 50];

/** Columns the API sorts by, and the sort parameter for each direction. */
const SORTS: Record<string, { asc: string; desc: string }> = {
  reference: { asc: 'number', desc: '-number' },
  scheduledOn: { asc: 'scheduledOn', desc: '-scheduledOn' },
  customer: { asc: 'customer', desc: '-customer' },
  value: { asc: 'value', desc: '-value' },
};

export function sortParam(status: DataTableSortStatus<Job>): string {
  const sort = SORTS[String(status.columnAccessor)] ?? SORTS.reference!;
  return status.direction === 'asc' ? sort.asc : sort.desc;
}

export function sortStatusOf(param: string): DataTableSortStatus<Job> {
  const desc = param.startsWith('-');
  const key = desc ? param.slice(1) : param;
  const column = Object.entries(SORTS).find(([, s]) => s.asc === key)?.[0] ?? 'reference';
  return { columnAccessor: column, direction: desc ? 'desc' : 'asc' };
}

interface JobsTableProps {
  jobs: Job[];
  total: number;
  page: number;
  pageSize: number;
  sort: string;
  fetching: boolean;
  showValue: boolean;
  emptyText: string;
  onPageChange: (page: number) => void;
  onPageSizeChange: (size: number) => void;
  onSortChange: (sort: string) => void;
  onOpen: (job: Job) => void;
}

export function JobsTable({
  jobs,
  total,
  page,
  pageSize,
  sort,
  fetching,
  showValue,
  emptyText,
  onPageChange,
  onPageSizeChange,
  onSortChange,
  onOpen,
}: JobsTableProps) {
  return (
    <DataTable<Job>
      withTableBorder
      borderRadius="lg"
      highlightOnHover
      verticalSpacing="sm"
      minHeight={jobs.length === 0 ? 220 : undefined}
      records={jobs}
      idAccessor="id"
      fetching={fetching}
      noRecordsText={emptyText}
      sortStatus={sortStatusOf(sort)}
      onSortStatusChange={(status) => onSortChange(sortParam(status))}
      totalRecords={total}
      recordsPerPage={pageSize}
      page={page}
      onPageChange={onPageChange}
      recordsPerPageOptions={PAGE_SIZES}
      onRecordsPerPageChange={onPageSizeChange}
      recordsPerPageLabel="Jobs per page"
      paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
      onRowClick={({ record }) => onOpen(record)}
      columns={[
        {
          accessor: 'reference',
          title: 'Job',
          sortable: true,
          width: 240,
          render: (job) => (
            <Stack gap={0}>
              <Anchor
                component={Link}
                to={hrefs.job(job.id)}
                fw={700}
                size="sm"
                onClick={(e) => e.stopPropagation()}
              >
                {job.reference} · {job.title}
              </Anchor>
              <Text size="xs" c="dimmed" lineClamp={1}>
                {job.siteAddress}
              </Text>
            </Stack>
          ),
        },
        {
          accessor: 'customer',
          title: 'Customer',
          sortable: true,
          // The estimator rides under the customer: one column fewer, so the status stays whole.
          render: (job) => (
            <Stack gap={0}>
              <Text size="sm">{job.customer.name}</Text>
              <Text size="xs" c="dimmed">
                {job.estimator ? `Estimator: ${job.estimator.name}` : 'No estimator yet'}
              </Text>
            </Stack>
          ),
        },
        {
          accessor: 'status',
          title: 'Status',
          noWrap: true,
          render: (job) => <JobStatusBadge status={job.status} />,
        },
        {
          accessor: 'scheduledOn',
          title: 'Date',
          sortable: true,
          noWrap: true,
          render: (job) =>
            job.scheduledOn ? (
              formatDate(job.scheduledOn)
            ) : (
              <Text size="sm" c="dimmed">
                Not set
              </Text>
            ),
        },
        {
          accessor: 'value',
          title: 'Value (net)',
          sortable: true,
          textAlign: 'right',
          hidden: !showValue,
          render: (job) =>
            job.value ? (
              formatMoney(job.value)
            ) : (
              <Text size="sm" c="dimmed">
                Not accepted
              </Text>
            ),
        },
        {
          accessor: 'materialState',
          title: 'Materials',
          noWrap: true,
          render: (job) => <MaterialStateBadge state={job.materialState} />,
        },
      ]}
    />
  );
}
