import { Button, Group, Stack, Switch, Text, TextInput } from '@mantine/core';
import { modals } from '@mantine/modals';
import { DataTable } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { SearchInput } from '../../../../components/SearchInput';
import { formatDate, formatDateTime } from '../../../../lib/format';
import { useClientTable } from '../../../../lib/use-client-table';
import { useRemoveLabour } from '../../api/remove-labour';
import type { LabourEntry } from '../../api/types';
import { formatNumber } from '../../utils/format';

interface LabourEntriesTableProps {
  jobId: string;
  entries: LabourEntry[];
  /** owners and estimators, while the sheet is open */
  canStrike: boolean;
}

function StrikeReason({ onChange }: { onChange: (value: string) => void }) {
  const [value, setValue] = useState('');
  return (
    <TextInput
      label="Why (optional)"
      placeholder="e.g. Booked on the wrong job"
      maxLength={500}
      value={value}
      onChange={(e) => {
        setValue(e.currentTarget.value);
        onChange(e.currentTarget.value);
      }}
      data-autofocus
    />
  );
}

/** The time sheet, newest day first; a struck-out entry stays, crossed through, with who and why. */
export function LabourEntriesTable({ jobId, entries, canStrike }: LabourEntriesTableProps) {
  const [showStruck, setShowStruck] = useState(true);
  const remove = useRemoveLabour(jobId);
  const shown = useMemo(() => entries.filter((e) => showStruck || e.removed === null), [entries, showStruck]);
  const table = useClientTable<LabourEntry>(shown, {
    searchText: (e) => `${e.crewMember} ${e.note ?? ''}`,
    sortValue: (e, column) =>
      column === 'hours' ? Number(e.hours) : (e as unknown as Record<string, unknown>)[column],
    initialSort: { columnAccessor: 'workedOn', direction: 'desc' },
    pageSizes: [10, 25, 50],
  });

  const strike = (entry: LabourEntry) => {
    let reason = '';
    modals.openConfirmModal({
      title: 'Strike out this entry?',
      children: (
        <Stack gap="sm">
          <Text size="sm">
            {formatNumber(entry.hours)} h for {entry.crewMember} on {formatDate(entry.workedOn)} will stop
            counting. It stays on the sheet, crossed through, with your name.
          </Text>
          <StrikeReason onChange={(v) => (reason = v)} />
        </Stack>
      ),
      labels: { confirm: 'Strike out', cancel: 'Keep it' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        remove.mutate({ entryId: entry.id, reason: reason.trim() === '' ? null : reason.trim() }),
    });
  };

  const crossed = (e: LabourEntry) =>
    e.removed ? { textDecoration: 'line-through', opacity: 0.6 } : undefined;

  return (
    <Stack gap="sm">
      <Group gap="sm" wrap="wrap" justify="space-between">
        <SearchInput
          label="Filter the hours"
          placeholder="Crew member or note"
          value={table.query}
          onChange={table.setQuery}
        />
        <Switch
          label="Show struck-out entries"
          checked={showStruck}
          onChange={(e) => {
            setShowStruck(e.currentTarget.checked);
            table.resetPage();
          }}
        />
      </Group>
      <DataTable<LabourEntry>
        withTableBorder
        borderRadius="md"
        verticalSpacing="xs"
        records={table.records}
        idAccessor="id"
        minHeight={table.records.length === 0 ? 140 : undefined}
        noRecordsText={
          entries.length === 0
            ? 'No hours recorded yet. Record each crew member’s hours for each day above.'
            : 'No entry matches. Clear the filter to see them all.'
        }
        {...table.tableProps}
        recordsPerPageLabel="Entries per page"
        columns={[
          {
            accessor: 'workedOn',
            title: 'Day',
            sortable: true,
            noWrap: true,
            render: (e) => <span style={crossed(e)}>{formatDate(e.workedOn)}</span>,
          },
          {
            accessor: 'crewMember',
            title: 'Who',
            sortable: true,
            render: (e) => <span style={crossed(e)}>{e.crewMember}</span>,
          },
          {
            accessor: 'hours',
            title: 'Hours',
            sortable: true,
            textAlign: 'right',
            render: (e) => <span style={crossed(e)}>{formatNumber(e.hours)} h</span>,
          },
          {
            accessor: 'note',
            title: 'Note',
            render: (e) => (
              <Stack gap={2}>
                {e.note ? (
                  <Text size="sm" style={crossed(e)}>
                    {e.note}
                  </Text>
                ) : null}
                {e.removed ? (
                  <Text size="xs" c="red">
                    Struck out by {e.removed.by?.name ?? 'someone'} on {formatDateTime(e.removed.at)}
                    {e.removed.reason ? `: ${e.removed.reason}` : ''}
                  </Text>
                ) : null}
              </Stack>
            ),
          },
          {
            accessor: 'createdBy',
            title: 'Recorded by',
            visibleMediaQuery: (theme) => `(min-width: ${theme.breakpoints.sm})`,
            render: (e) => (
              <Text size="xs" c="dimmed">
                {e.createdBy?.name ?? '—'}, {formatDateTime(e.createdAt)}
              </Text>
            ),
          },
          {
            accessor: 'actions',
            title: '',
            hidden: !canStrike,
            textAlign: 'right',
            render: (e) =>
              e.removed ? null : (
                <Button
                  size="compact-xs"
                  variant="subtle"
                  color="red"
                  onClick={() => strike(e)}
                  aria-label={`Strike out ${formatNumber(e.hours)} h for ${e.crewMember} on ${formatDate(e.workedOn)}`}
                >
                  Strike out
                </Button>
              ),
          },
        ]}
      />
    </Stack>
  );
}
