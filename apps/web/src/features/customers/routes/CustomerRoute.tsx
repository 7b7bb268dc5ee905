import {
  Anchor,
  Badge,
  Breadcrumbs,
  Button,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Text,
  Title,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPencil, IconPlus } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { RecordError } from '../../../components/RecordError';
import { hrefs, paths } from '../../../config/paths';
import { formatMoney } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import type { NewJobFor } from '../../../lib/customers';
import { useCustomer } from '../api/get-customer';
import { useCustomerJobs } from '../api/get-customer-jobs';
import type { CustomerJob } from '../api/types';
import { CustomerFormModal } from '../components/CustomerFormModal';
import { statusColors, statusLabels } from '../../../lib/job-status';

const JOB_SORTS: Record<string, { asc: string; desc: string }> = {
  reference: { asc: 'number', desc: '-number' },
  scheduledOn: { asc: 'scheduledOn', desc: '-scheduledOn' },
  value: { asc: 'value', desc: '-value' },
};
const PAGE_SIZE = 10;

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={700} lts={0.4}>
        {label}
      </Text>
      <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
        {children}
      </Text>
    </div>
  );
}

/** One customer: who to speak to, where the invoice goes, and every job for them. */
export function CustomerRoute() {
  const { customerId = '' } = useParams();
  const navigate = useNavigate();
  const customer = useCustomer(customerId);
  const [editOpened, edit] = useDisclosure(false);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<CustomerJob>>({
    columnAccessor: 'reference',
    direction: 'desc',
  });
  const [page, setPage] = useState(1);
  const column = JOB_SORTS[String(sortStatus.columnAccessor)] ?? JOB_SORTS.reference!;
  const sort = sortStatus.direction === 'asc' ? column.asc : column.desc;
  const jobs = useCustomerJobs(customerId, { sort, page, pageSize: PAGE_SIZE });

  if (customer.isPending) {
    return <PageLoader label="Loading the customer…" />;
  }
  if (customer.isError) {
    return (
      <RecordError
        what="the customer"
        notFoundTitle="Customer not found"
        backTo={paths.customers}
        backLabel="the customers"
        error={customer.error}
        onRetry={() => void customer.refetch()}
        retrying={customer.isFetching}
      />
    );
  }
  const c = customer.data;

  return (
    <Stack gap="md">
      <Breadcrumbs>
        <Anchor component={Link} to={paths.customers} size="sm">
          Customers
        </Anchor>
        <Text size="sm">{c.name}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start" wrap="wrap">
        <Title order={1}>{c.name}</Title>
        <Group gap="sm">
          <Button variant="default" leftSection={<IconPencil size={16} />} onClick={edit.open}>
            Edit customer
          </Button>
          <Button
            component={Link}
            to={paths.jobs}
            state={{ newJobFor: { id: c.id, name: c.name } } satisfies NewJobFor}
            leftSection={<IconPlus size={16} />}
          >
            New job for {c.name}
          </Button>
        </Group>
      </Group>
      <Paper withBorder p="md" radius="md">
        <SimpleGrid cols={{ base: 1, xs: 2, md: 4 }} spacing="md">
          <Fact label="Contact">{c.contactName ?? '—'}</Fact>
          <Fact label="Phone">
            {c.phone ? (
              <Anchor href={`tel:${c.phone}`} size="sm">
                {c.phone}
              </Anchor>
            ) : (
              '—'
            )}
          </Fact>
          <Fact label="E-mail">
            {c.email ? (
              <Anchor href={`mailto:${c.email}`} size="sm">
                {c.email}
              </Anchor>
            ) : (
              '—'
            )}
          </Fact>
          <Fact label="Billing address">{c.billingAddress ?? '—'}</Fact>
        </SimpleGrid>
        {c.notes ? (
          <Text size="sm" mt="sm" style={{ whiteSpace: 'pre-line' }}>
            {c.notes}
          </Text>
        ) : null}
      </Paper>

      <Stack gap="xs" component="section" aria-label="Jobs for this customer">
        <Title order={2} size="h3">
          Jobs
        </Title>
        {jobs.isError ? (
          <QueryError
            what="the customer’s jobs"
            error={jobs.error}
            onRetry={() => void jobs.refetch()}
            retrying={jobs.isFetching}
          />
        ) : (
          <DataTable<CustomerJob>
            withTableBorder
            borderRadius="lg"
            highlightOnHover
            verticalSpacing="sm"
            records={jobs.data?.items ?? []}
            idAccessor="id"
            fetching={jobs.isFetching}
            minHeight={(jobs.data?.items.length ?? 0) === 0 ? 160 : undefined}
            noRecordsText="No jobs for this customer yet. Start one from Jobs with “New job”."
            sortStatus={sortStatus}
            onSortStatusChange={(s) => {
              setSortStatus(s);
              setPage(1);
            }}
            totalRecords={jobs.data?.total ?? 0}
            recordsPerPage={PAGE_SIZE}
            page={page}
            onPageChange={setPage}
            paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
            onRowClick={({ record }) => navigate(hrefs.job(record.id))}
            columns={[
              {
                accessor: 'reference',
                title: 'Job',
                sortable: true,
                render: (j) => (
                  <Stack gap={0}>
                    <Anchor
                      component={Link}
                      to={hrefs.job(j.id)}
                      fw={700}
                      size="sm"
                      onClick={(e) => e.stopPropagation()}
                    >
                      {j.reference} · {j.title}
                    </Anchor>
                    <Text size="xs" c="dimmed" lineClamp={1}>
                      {j.siteAddress}
                    </Text>
                  </Stack>
                ),
              },
              {
                accessor: 'status',
                title: 'Status',
                noWrap: true,
                render: (j) => (
                  <Badge
                    color={statusColors[j.status]}
                    variant={j.status === 'lost' || j.status === 'cancelled' ? 'outline' : 'light'}
                  >
                    {statusLabels[j.status]}
                  </Badge>
                ),
              },
              {
                accessor: 'scheduledOn',
                title: 'Date',
                sortable: true,
                noWrap: true,
                render: (j) =>
                  j.scheduledOn ? (
                    formatDate(j.scheduledOn)
                  ) : (
                    <Text size="sm" c="dimmed">
                      Not set
                    </Text>
                  ),
              },
              {
                accessor: 'estimator',
                title: 'Estimator',
                visibleMediaQuery: (theme) => `(min-width: ${theme.breakpoints.sm})`,
                render: (j) => j.estimator?.name ?? '—',
              },
              {
                accessor: 'value',
                title: 'Value (net)',
                sortable: true,
                textAlign: 'right',
                render: (j) =>
                  j.value ? (
                    formatMoney(j.value)
                  ) : (
                    <Text size="sm" c="dimmed">
                      Not accepted
                    </Text>
                  ),
              },
            ]}
          />
        )}
      </Stack>
      <CustomerFormModal opened={editOpened} onClose={edit.close} customer={c} />
    </Stack>
  );
}
