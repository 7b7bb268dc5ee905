import { Anchor, Stack, Text } from '@mantine/core';
import type { DataTableSortStatus } from 'mantine-datatable';
import { DataTable } from 'mantine-datatable';
import { Link } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { Customer } from '../api/types';

export const PAGE_SIZES = [10, 25, 50];

/** Columns the API sorts by, and the sort parameter for each direction. */
const SORTS: Record<string, { asc: string; desc: string }> = {
  name: { asc: 'name', desc: '-name' },
  jobCount: { asc: 'jobCount', desc: '-jobCount' },
  createdAt: { asc: 'createdAt', desc: '-createdAt' },
};

export function sortParam(status: DataTableSortStatus<Customer>): string {
  const sort = SORTS[String(status.columnAccessor)] ?? SORTS.name!;
  return status.direction === 'asc' ? sort.asc : sort.desc;
}

export function sortStatusOf(param: string): DataTableSortStatus<Customer> {
  const desc = param.startsWith('-');
  const key = desc ? param.slice(1) : param;
  return { columnAccessor: SORTS[key] ? key : 'name', direction: desc ? 'desc' : 'asc' };
}

interface CustomersTableProps {
  customers: Customer[];
  total: number;
  page: number;
  pageSize: number;
  sort: string;
  fetching: boolean;
  emptyText: string;
  onPageChange: (page: number) => void;
  onPageSizeChange: (size: number) => void;
  onSortChange: (sort: string) => void;
  onOpen: (customer: Customer) => void;
}

export function CustomersTable(props: CustomersTableProps) {
  const { customers, total, page, pageSize, sort, fetching, emptyText } = props;
  return (
    <DataTable<Customer>
      withTableBorder
      borderRadius="lg"
      highlightOnHover
      verticalSpacing="sm"
      minHeight={customers.length === 0 ? 200 : undefined}
      records={customers}
      idAccessor="id"
      fetching={fetching}
      noRecordsText={emptyText}
      sortStatus={sortStatusOf(sort)}
      onSortStatusChange={(status) => props.onSortChange(sortParam(status))}
      totalRecords={total}
      recordsPerPage={pageSize}
      page={page}
      onPageChange={props.onPageChange}
      recordsPerPageOptions={PAGE_SIZES}
      onRecordsPerPageChange={props.onPageSizeChange}
      recordsPerPageLabel="Customers per page"
      paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
      onRowClick={({ record }) => props.onOpen(record)}
      columns={[
        {
          accessor: 'name',
          title: 'Customer',
          sortable: true,
          render: (c) => (
            <Stack gap={0}>
              <Anchor
                component={Link}
                to={hrefs.customer(c.id)}
                fw={700}
                size="sm"
                onClick={(e) => e.stopPropagation()}
              >
                {c.name}
              </Anchor>
              {c.billingAddress ? (
                <Text size="xs" c="dimmed" lineClamp={1}>
                  {c.billingAddress}
                </Text>
              ) : null}
            </Stack>
          ),
        },
        {
          accessor: 'contactName',
          title: 'Contact',
          render: (c) => (
            <Stack gap={0}>
              <Text size="sm">{c.contactName ?? '—'}</Text>
              {c.phone || c.email ? (
                <Text size="xs" c="dimmed" lineClamp={1}>
                  {[c.phone, c.email].filter(Boolean).join(' · ')}
                </Text>
              ) : null}
            </Stack>
          ),
        },
        { accessor: 'jobCount', title: 'Jobs', sortable: true, textAlign: 'right', width: 90 },
        {
          accessor: 'createdAt',
          title: 'Added',
          sortable: true,
          noWrap: true,
          visibleMediaQuery: (theme) => `(min-width: ${theme.breakpoints.sm})`,
          render: (c) => formatDate(c.createdAt),
        },
      ]}
    />
  );
}
