import { Button, Group, Progress, SegmentedControl, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconListCheck } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useClientTable } from '../../../lib/use-client-table';
import { useCounts } from '../api/get-counts';
import type { CountStatus, CountSummary } from '../api/types';
import { CountStatusBadge, countStatusLabels } from '../components/badges';
import { canCount } from '../components/can-count';
import { OpenCountModal } from '../components/OpenCountModal';

type Filter = 'current' | 'all' | CountStatus;

export function CountsRoute() {
  const user = useSessionUser();
  const navigate = useNavigate();
  const counts = useCounts();
  const [opened, modal] = useDisclosure(false);
  const [filter, setFilter] = useState<Filter>('current');
  const shown = (counts.data ?? []).filter((c) =>
    filter === 'all'
      ? true
      : filter === 'current'
        ? c.status === 'open' || c.status === 'submitted'
        : c.status === filter,
  );
  const table = useClientTable<CountSummary>(shown, {
    searchText: (c) => `${c.number} ${c.scopeName} ${countStatusLabels[c.status]} ${c.openedByName}`,
    initialSort: { columnAccessor: 'number', direction: 'desc' },
  });

  return (
    <>
      <PageHeader
        title="Counts"
        description="Check what is on the shelf against the ledger. Whoever counts does not see the expected figures; the owner approves the differences."
        actions={
          canCount(user.role) ? (
            <Button leftSection={<IconListCheck size={18} />} onClick={modal.open}>
              Open a count
            </Button>
          ) : null
        }
      />
      <Stack gap="sm">
        <Group gap="sm" wrap="wrap">
          <SearchInput
            label="Filter counts"
            placeholder="Filter by number, location or person"
            value={table.query}
            onChange={table.setQuery}
          />
          <SegmentedControl
            size="sm"
            aria-label="Which counts"
            value={filter}
            onChange={(value) => {
              setFilter(value as Filter);
              table.resetPage();
            }}
            data={[
              { value: 'current', label: 'Open or awaiting approval' },
              { value: 'approved', label: 'Approved' },
              { value: 'all', label: 'All' },
            ]}
          />
        </Group>
        {counts.isError ? (
          <QueryError
            what="the counts"
            error={counts.error}
            onRetry={() => void counts.refetch()}
            retrying={counts.isFetching}
          />
        ) : (
          <DataTable<CountSummary>
            withTableBorder
            borderRadius="lg"
            highlightOnHover
            verticalSpacing="sm"
            minHeight={table.records.length === 0 ? 200 : undefined}
            fetching={counts.isPending}
            records={table.records}
            noRecordsText={
              counts.isPending
                ? 'Loading…'
                : (counts.data?.length ?? 0) === 0
                  ? canCount(user.role)
                    ? 'No counts yet. Open one for a location, or for everything.'
                    : 'No counts yet.'
                  : 'No count here. Choose "All" to see every count.'
            }
            recordsPerPageLabel="Counts per page"
            {...table.tableProps}
            onRowClick={({ record }) => void navigate(hrefs.count(record.id))}
            columns={[
              { accessor: 'number', title: 'No.', sortable: true, width: 70 },
              { accessor: 'scopeName', title: 'What', sortable: true },
              {
                accessor: 'status',
                title: 'Status',
                sortable: true,
                render: (c) => <CountStatusBadge status={c.status} />,
              },
              {
                accessor: 'countedCount',
                title: 'Counted',
                render: (c) => (
                  <Stack gap={2} w={120}>
                    <Text size="xs">
                      {c.countedCount} of {c.lineCount}
                    </Text>
                    <Progress
                      size="xs"
                      value={c.lineCount === 0 ? 0 : (c.countedCount / c.lineCount) * 100}
                      aria-label={`${c.countedCount} of ${c.lineCount} counted`}
                    />
                  </Stack>
                ),
              },
              {
                accessor: 'openedAt',
                title: 'Opened',
                sortable: true,
                visibleMediaQuery: '(min-width: 48em)',
                render: (c) => `${formatDateTime(c.openedAt)} by ${c.openedByName}`,
              },
              {
                accessor: 'decidedAt',
                title: 'Decided',
                sortable: true,
                visibleMediaQuery: '(min-width: 62em)',
                render: (c) =>
                  c.decidedAt ? `${formatDateTime(c.decidedAt)} by ${c.decidedByName ?? '—'}` : '—',
              },
            ]}
          />
        )}
      </Stack>
      <OpenCountModal opened={opened} onClose={modal.close} />
    </>
  );
}
