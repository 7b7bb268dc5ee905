import { Badge, Button, Group, Stack, Switch, Text, TextInput } from '@mantine/core';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconPencil, IconPlus, IconSearch } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { compareValues, formatDate } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useBuildUps, type BuildUp } from '../api/get-build-ups';
import { useSaveBuildUp } from '../api/save-build-up';
import { BuildUpModal } from '../components/BuildUpModal';
import { JobSettingsCard } from '../components/JobSettingsCard';

const PAGE_SIZES = [10, 25, 50];

function sortValue(b: BuildUp, column: string): string | number {
  switch (column) {
    case 'matGsm':
      return Number(b.matGsm) * Number(b.layers);
    case 'labourRate':
      return Number(b.labourRate);
    case 'markupPct':
      return Number(b.markupPct);
    case 'updatedAt':
      return b.updatedAt;
    default:
      return b.name;
  }
}

/** The company's build-ups; the owner keeps their rates, estimators choose one per job. */
export function BuildUpsRoute() {
  const user = useSessionUser();
  const owner = user.role === 'owner';
  const [includeInactive, setIncludeInactive] = useState(false);
  const buildUps = useBuildUps(includeInactive);
  const save = useSaveBuildUp();
  const [editing, setEditing] = useState<BuildUp | null>(null);
  const [opened, setOpened] = useState(false);
  const [query, setQuery] = useState('');
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<BuildUp>>({
    columnAccessor: 'name',
    direction: 'asc',
  });
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(10);

  const sorted = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    const q = query.trim().toLowerCase();
    return (buildUps.data ?? [])
      .filter((b) => q === '' || `${b.name} ${b.description ?? ''}`.toLowerCase().includes(q))
      .sort((a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)));
  }, [buildUps.data, query, sortStatus]);
  const records = sorted.slice((page - 1) * pageSize, page * pageSize);

  const open = (b: BuildUp | null) => {
    setEditing(b);
    setOpened(true);
  };

  const setActive = (b: BuildUp, active: boolean) => {
    const run = () =>
      save.mutate(
        { id: b.id, active },
        {
          onSuccess: () =>
            notifications.show({
              color: 'green',
              message: active
                ? `${b.name} can be chosen again.`
                : `${b.name} is hidden from new jobs and estimates.`,
            }),
        },
      );
    if (active) {
      run();
      return;
    }
    modals.openConfirmModal({
      title: `Retire ${b.name}?`,
      children: (
        <Text size="sm">
          It can no longer be chosen for new jobs and estimates. Estimates already made with it keep their
          numbers, and you can bring it back later.
        </Text>
      ),
      labels: { confirm: 'Retire', cancel: 'Keep it' },
      confirmProps: { color: 'red' },
      onConfirm: run,
    });
  };

  return (
    <>
      <PageHeader
        title="Build-ups"
        description={
          owner
            ? 'The layers and rates your roofs are priced with. Estimators choose one for each job.'
            : 'The layers and rates roofs are priced with. The owner keeps them; you choose one for each job.'
        }
        actions={
          owner ? (
            <Button leftSection={<IconPlus size={18} />} onClick={() => open(null)}>
              New build-up
            </Button>
          ) : null
        }
      />
      <Stack gap="sm">
        <Group gap="md" wrap="wrap">
          <TextInput
            aria-label="Filter build-ups"
            placeholder="Filter by name"
            leftSection={<IconSearch size={16} />}
            value={query}
            onChange={(e) => {
              setQuery(e.currentTarget.value);
              setPage(1);
            }}
            w={{ base: '100%', sm: 300 }}
          />
          <Switch
            label="Show retired ones"
            checked={includeInactive}
            onChange={(e) => {
              setIncludeInactive(e.currentTarget.checked);
              setPage(1);
            }}
          />
        </Group>
        {buildUps.isPending ? (
          <PageLoader label="Loading build-ups…" />
        ) : buildUps.isError ? (
          <QueryError
            what="the build-ups"
            error={buildUps.error}
            onRetry={() => void buildUps.refetch()}
            retrying={buildUps.isFetching}
          />
        ) : (
          <DataTable<BuildUp>
            withTableBorder
            borderRadius="lg"
            highlightOnHover
            verticalSpacing="sm"
            minHeight={records.length === 0 ? 200 : undefined}
            records={records}
            idAccessor="id"
            noRecordsText={
              (buildUps.data ?? []).length === 0
                ? owner
                  ? 'No build-ups yet. Add one with “New build-up”: it starts from trade-typical rates.'
                  : 'No build-ups yet. Ask the owner to set one up.'
                : 'No build-up matches the filter.'
            }
            sortStatus={sortStatus}
            onSortStatusChange={setSortStatus}
            totalRecords={sorted.length}
            recordsPerPage={pageSize}
            page={page}
            onPageChange={setPage}
            recordsPerPageOptions={PAGE_SIZES}
            onRecordsPerPageChange={(s) => {
              setPageSize(s);
              setPage(1);
            }}
            recordsPerPageLabel="Build-ups per page"
            paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
            columns={[
              {
                accessor: 'name',
                title: 'Build-up',
                sortable: true,
                render: (b) => (
                  <Stack gap={0}>
                    <Group gap={6}>
                      <Text size="sm" fw={700}>
                        {b.name}
                      </Text>
                      {!b.active ? (
                        <Badge size="xs" color="gray" variant="outline">
                          Retired
                        </Badge>
                      ) : null}
                    </Group>
                    {b.description ? (
                      <Text size="xs" c="dimmed" lineClamp={1}>
                        {b.description}
                      </Text>
                    ) : null}
                  </Stack>
                ),
              },
              {
                accessor: 'matGsm',
                title: 'Mat',
                sortable: true,
                render: (b) => `${b.layers} × ${b.matGsm} g/m², resin ${b.resinToGlass}:1`,
              },
              {
                accessor: 'labourRate',
                title: 'Labour',
                sortable: true,
                render: (b) => `£${b.labourRate} an hour`,
              },
              { accessor: 'markupPct', title: 'Markup', sortable: true, render: (b) => `${b.markupPct} %` },
              { accessor: 'vatRatePct', title: 'VAT', render: (b) => `${b.vatRatePct} %` },
              {
                accessor: 'updatedAt',
                title: 'Changed',
                sortable: true,
                render: (b) => formatDate(b.updatedAt),
              },
              {
                accessor: 'actions',
                title: '',
                textAlign: 'right',
                render: (b) =>
                  !owner ? (
                    <Button
                      size="compact-sm"
                      variant="subtle"
                      aria-label={`Rates of ${b.name}`}
                      onClick={() => open(b)}
                    >
                      Rates
                    </Button>
                  ) : (
                    <Group gap={6} justify="flex-end" wrap="nowrap">
                      <Button
                        size="compact-sm"
                        variant="light"
                        leftSection={<IconPencil size={14} />}
                        aria-label={`Edit ${b.name}`}
                        onClick={() => open(b)}
                      >
                        Edit
                      </Button>
                      <Button
                        size="compact-sm"
                        variant="subtle"
                        color={b.active ? 'red' : 'green'}
                        aria-label={`${b.active ? 'Retire' : 'Bring back'} ${b.name}`}
                        loading={save.isPending && save.variables?.id === b.id}
                        onClick={() => setActive(b, !b.active)}
                      >
                        {b.active ? 'Retire' : 'Bring back'}
                      </Button>
                    </Group>
                  ),
              },
            ]}
          />
        )}
      </Stack>
      <Stack mt="lg">
        <JobSettingsCard canEdit={owner} />
      </Stack>
      <BuildUpModal buildUp={editing} opened={opened} onClose={() => setOpened(false)} readOnly={!owner} />
    </>
  );
}
