import { Badge, Button, CloseButton, Group, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { IconPlus, IconSearch } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs } from '../../../config/paths';
import { useSessionUser } from '../../../lib/session';
import { useSuppliers } from '../api/get-suppliers';
import { SUPPLIER_SORTS, type Supplier, type SupplierSort } from '../api/types';
import { canEditSuppliers } from '../components/can-edit';
import { SupplierFormModal } from '../components/SupplierFormModal';

const PAGE_SIZES = [25, 50, 100];
type ActiveFilter = 'true' | 'false' | 'all';

const isSort = (value: string): value is SupplierSort =>
  (SUPPLIER_SORTS as readonly string[]).includes(value);

export function SuppliersRoute() {
  const user = useSessionUser();
  const canEdit = canEditSuppliers(user.role);
  const navigate = useNavigate();
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query, 300);
  const [active, setActive] = useState<ActiveFilter>('true');
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(PAGE_SIZES[0] ?? 25);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<Supplier>>({
    columnAccessor: 'name',
    direction: 'asc',
  });
  const [formOpened, formModal] = useDisclosure(false);
  const sort = String(sortStatus.columnAccessor);
  const suppliers = useSuppliers({
    q: debounced,
    active,
    sort: isSort(sort) ? sort : 'name',
    order: sortStatus.direction,
    page,
    pageSize,
  });

  const filtered = debounced.trim() !== '' || active !== 'true';
  const emptyText = filtered
    ? 'No supplier matches. Clear the search, or look under "All".'
    : canEdit
      ? 'No suppliers yet. Add the firms you buy from with "Add a supplier".'
      : 'No suppliers yet. The owner or estimator adds the firms you buy from.';

  return (
    <>
      <PageHeader
        title="Suppliers"
        description="The firms the company buys from: who to order from, how long deliveries take, and what each pack costs."
        actions={
          canEdit ? (
            <Button leftSection={<IconPlus size={18} />} onClick={formModal.open}>
              Add a supplier
            </Button>
          ) : null
        }
      />
      <Stack gap="sm">
        <Group gap="sm" wrap="wrap">
          <TextInput
            aria-label="Search suppliers"
            placeholder="Search by name, e-mail or contact"
            leftSection={<IconSearch size={16} />}
            value={query}
            onChange={(event) => {
              setQuery(event.currentTarget.value);
              setPage(1);
            }}
            rightSection={
              query ? <CloseButton aria-label="Clear the search" onClick={() => setQuery('')} /> : null
            }
            w={{ base: '100%', sm: 320 }}
            size="sm"
          />
          <SegmentedControl
            size="sm"
            aria-label="In use or archived"
            value={active}
            onChange={(value) => {
              setActive(value as ActiveFilter);
              setPage(1);
            }}
            data={[
              { value: 'true', label: 'In use' },
              { value: 'false', label: 'Archived' },
              { value: 'all', label: 'All' },
            ]}
          />
        </Group>
        {suppliers.isPending ? (
          <PageLoader label="Loading suppliers…" />
        ) : suppliers.isError ? (
          <QueryError
            what="the suppliers"
            error={suppliers.error}
            onRetry={() => void suppliers.refetch()}
            retrying={suppliers.isFetching}
          />
        ) : (
          <DataTable<Supplier>
            withTableBorder
            borderRadius="lg"
            highlightOnHover
            verticalSpacing="sm"
            minHeight={suppliers.data.items.length === 0 ? 220 : undefined}
            fetching={suppliers.isFetching && suppliers.isPlaceholderData}
            records={suppliers.data.items}
            noRecordsText={emptyText}
            sortStatus={sortStatus}
            onSortStatusChange={(status) => {
              setSortStatus(status);
              setPage(1);
            }}
            totalRecords={suppliers.data.total}
            recordsPerPage={pageSize}
            page={page}
            onPageChange={setPage}
            recordsPerPageOptions={PAGE_SIZES}
            onRecordsPerPageChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
            recordsPerPageLabel="Suppliers per page"
            paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
            onRowClick={({ record }) => void navigate(hrefs.supplier(record.id))}
            columns={[
              {
                accessor: 'name',
                title: 'Name',
                sortable: true,
                render: (supplier) => (
                  <Group gap={6} wrap="nowrap">
                    <Text size="sm" fw={600}>
                      {supplier.name}
                    </Text>
                    {supplier.active ? null : (
                      <Badge
                        size="sm"
                        color="gray"
                        variant="outline"
                        styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                      >
                        Archived
                      </Badge>
                    )}
                  </Group>
                ),
              },
              {
                accessor: 'orderEmail',
                title: 'Order e-mail',
                render: (supplier) => supplier.orderEmail ?? '—',
              },
              {
                accessor: 'phone',
                title: 'Phone',
                visibleMediaQuery: '(min-width: 48em)',
                render: (supplier) => supplier.phone ?? '—',
              },
              {
                accessor: 'leadTimeDays',
                title: 'Lead time',
                sortable: true,
                render: (supplier) => `${supplier.leadTimeDays} day${supplier.leadTimeDays === 1 ? '' : 's'}`,
              },
              {
                accessor: 'contacts',
                title: 'Contacts',
                visibleMediaQuery: '(min-width: 48em)',
                render: (supplier) =>
                  supplier.contacts.length === 0
                    ? '—'
                    : supplier.contacts.map((contact) => contact.name).join(', '),
              },
            ]}
          />
        )}
      </Stack>
      {canEdit ? (
        <SupplierFormModal
          opened={formOpened}
          onClose={formModal.close}
          onSaved={(saved) => void navigate(hrefs.supplier(saved.id))}
        />
      ) : null}
    </>
  );
}
