import { Button, CloseButton, Group, MultiSelect, Stack, TextInput } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { JOB_STATUSES, type JobStatus } from '@potlife/domain';
import { IconPlus, IconSearch } from '@tabler/icons-react';
import { useLocation, useNavigate } from 'react-router-dom';
import type { NewJobFor } from '../../../lib/customers';
import { useAddressList } from '../../../lib/use-address-list';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs } from '../../../config/paths';
import { useSessionUser } from '../../../lib/session';
import { useJobs } from '../api/get-jobs';
import { CreateJobModal } from '../components/CreateJobModal';
import { JobsTable, PAGE_SIZES } from '../components/JobsTable';
import { statusLabels } from '../utils/labels';

const statusOptions = JOB_STATUSES.map((s) => ({ value: s, label: statusLabels[s] }));

function isStatus(value: string): value is JobStatus {
  return (JOB_STATUSES as readonly string[]).includes(value);
}

/** Every job of the company: filtered, sorted and paged by the API; the filters live in the address. */
export function JobsRoute() {
  const user = useSessionUser();
  const navigate = useNavigate();
  const { params, update, query, setQuery, q, sort, page, pageSize } = useAddressList({
    defaultSort: '-number',
    pageSizes: PAGE_SIZES,
  });
  // The customer page's "New job for …" comes here with the customer in the router state.
  const location = useLocation();
  const forCustomer = (location.state as Partial<NewJobFor> | null)?.newJobFor ?? null;
  const [createOpened, create] = useDisclosure(forCustomer !== null);
  const canEdit = user.role !== 'storeman';

  const statuses = (params.get('status') ?? '').split(',').filter(isStatus);
  const jobs = useJobs({ statuses, q, sort, page, pageSize });

  const filtered = statuses.length > 0 || q !== '';
  const emptyText = filtered
    ? 'No job matches these filters. Clear them to see every job.'
    : canEdit
      ? 'No jobs yet. Start one with “New job”.'
      : 'No jobs yet. Jobs appear here once an estimator creates them.';

  return (
    <>
      <PageHeader
        title="Jobs"
        description={
          canEdit
            ? 'Every roof from enquiry to invoice: measure it, price it, hold its materials for the day.'
            : 'The jobs the store sends materials to, with their dates and pick lists.'
        }
        actions={
          canEdit ? (
            <Button leftSection={<IconPlus size={18} />} onClick={create.open}>
              New job
            </Button>
          ) : null
        }
      />
      <Stack gap="sm">
        <Group gap="sm" align="flex-end" wrap="wrap">
          <TextInput
            aria-label="Search jobs"
            placeholder="Reference, title, site or customer"
            leftSection={<IconSearch size={16} />}
            value={query}
            onChange={(e) => setQuery(e.currentTarget.value)}
            rightSection={
              query ? <CloseButton aria-label="Clear the search" onClick={() => setQuery('')} /> : null
            }
            w={{ base: '100%', sm: 320 }}
          />
          <MultiSelect
            aria-label="Filter by status"
            placeholder={statuses.length === 0 ? 'Any status' : undefined}
            data={statusOptions}
            value={statuses}
            onChange={(value) => update({ status: value.join(','), page: null })}
            clearable
            w={{ base: '100%', sm: 360 }}
            comboboxProps={{ withinPortal: true }}
          />
        </Group>
        {jobs.isPending ? (
          <PageLoader label="Loading jobs…" />
        ) : jobs.isError ? (
          <QueryError
            what="the jobs"
            error={jobs.error}
            onRetry={() => void jobs.refetch()}
            retrying={jobs.isFetching}
          />
        ) : (
          <JobsTable
            jobs={jobs.data.items}
            total={jobs.data.total}
            page={page}
            pageSize={pageSize}
            sort={sort}
            fetching={jobs.isFetching}
            showValue={canEdit}
            emptyText={emptyText}
            onPageChange={(p) => update({ page: String(p) })}
            onPageSizeChange={(size) => update({ size: String(size), page: null })}
            onSortChange={(s) => update({ sort: s, page: null })}
            onOpen={(job) => navigate(hrefs.job(job.id))}
          />
        )}
      </Stack>
      {canEdit ? (
        <CreateJobModal
          opened={createOpened}
          forCustomer={forCustomer}
          onClose={() => {
            create.close();
            if (forCustomer) {
              void navigate({ search: location.search }, { replace: true, state: null });
            }
          }}
          onCreated={(job) => navigate(hrefs.job(job.id))}
        />
      ) : null}
    </>
  );
}
