import { Badge, Button, Group, Progress, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { Decimal } from '@potlife/domain';
import { IconArchive, IconArrowBackUp, IconPencil, IconPlus, IconTrash } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { useState } from 'react';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { formatNumber } from '../../../lib/amounts';
import { hazardShort, locationKindLabel } from '../../../lib/material-words';
import { useClientTable } from '../../../lib/use-client-table';
import { useLocations } from '../api/get-locations';
import { useDeleteLocation, useSetLocationActive } from '../api/save-location';
import type { Location } from '../api/types';
import { LocationFormModal } from './LocationFormModal';

function CabinetFill({ location }: { location: Location }) {
  if (location.capacityLitres === null) {
    return null;
  }
  const held = location.litresHeld ?? '0';
  // Display only: the share of the bar; the rule (warning at 90 %, refusal over) is the API's.
  const percent = Math.min(100, new Decimal(held).div(location.capacityLitres).mul(100).toNumber());
  return (
    <Stack gap={2} w={150}>
      <Text size="xs">
        {formatNumber(held)} of {formatNumber(location.capacityLitres)} L
      </Text>
      <Progress
        value={percent}
        color={percent >= 90 ? 'orange' : 'teal'}
        size="sm"
        aria-label={`${formatNumber(held)} of ${formatNumber(location.capacityLitres)} litres`}
      />
    </Stack>
  );
}

export function LocationsPanel({ canEdit }: { canEdit: boolean }) {
  const locations = useLocations();
  const setActive = useSetLocationActive();
  const remove = useDeleteLocation();
  const [opened, modal] = useDisclosure(false);
  const [editing, setEditing] = useState<Location | undefined>();
  const table = useClientTable<Location>(locations.data ?? [], {
    searchText: (l) => `${l.path} ${locationKindLabel(l.kind)}`,
    initialSort: { columnAccessor: 'path', direction: 'asc' },
  });

  if (locations.isError) {
    return (
      <QueryError
        what="the locations"
        error={locations.error}
        onRetry={() => void locations.refetch()}
        retrying={locations.isFetching}
      />
    );
  }
  const open = (location?: Location) => {
    setEditing(location);
    modal.open();
  };
  const archive = (location: Location) =>
    modals.openConfirmModal({
      title: `Take ${location.name} out of use?`,
      children: (
        <Text size="sm">
          It is no longer offered for putting stock away. Its history stays, and you can bring it back.
        </Text>
      ),
      labels: { confirm: 'Take out of use', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        setActive.mutate(
          { id: location.id, active: false },
          {
            onSuccess: () =>
              notifications.show({ color: 'green', message: `${location.name} is out of use.` }),
          },
        ),
    });
  const confirmDelete = (location: Location) =>
    modals.openConfirmModal({
      title: `Delete ${location.name}?`,
      children: (
        <Text size="sm">
          It has never held stock, so it goes for good. A location with history can only be taken out of use.
        </Text>
      ),
      labels: { confirm: 'Delete', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        remove.mutate(location.id, {
          onSuccess: () => notifications.show({ color: 'green', message: `${location.name} is deleted.` }),
        }),
    });

  const empty =
    (locations.data?.length ?? 0) === 0
      ? canEdit
        ? 'No locations yet. Add the store first, then its bays, shelves, flammables cabinet and peroxide store.'
        : 'No locations yet. The storeman or owner sets up the store.'
      : `Nothing matches "${table.query.trim()}". Clear the filter.`;

  return (
    <Stack gap="sm">
      <Group justify="space-between" wrap="wrap" gap="sm">
        <SearchInput
          label="Filter locations"
          placeholder="Filter by name or kind"
          value={table.query}
          onChange={table.setQuery}
        />
        {canEdit ? (
          <Button leftSection={<IconPlus size={18} />} onClick={() => open()}>
            Add a location
          </Button>
        ) : null}
      </Group>
      <DataTable<Location>
        withTableBorder
        borderRadius="lg"
        verticalSpacing="sm"
        minHeight={table.records.length === 0 ? 200 : undefined}
        fetching={locations.isPending}
        records={table.records}
        noRecordsText={locations.isPending ? 'Loading…' : empty}
        recordsPerPageLabel="Locations per page"
        {...table.tableProps}
        columns={[
          {
            accessor: 'path',
            title: 'Location',
            sortable: true,
            render: (l) => (
              <Group gap={6} wrap="nowrap">
                <Text size="sm" fw={600}>
                  {l.path}
                </Text>
                {l.active ? null : (
                  <Badge
                    size="sm"
                    color="gray"
                    variant="outline"
                    styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                  >
                    Out of use
                  </Badge>
                )}
              </Group>
            ),
          },
          { accessor: 'kind', title: 'Kind', sortable: true, render: (l) => locationKindLabel(l.kind) },
          {
            accessor: 'allowedHazardClasses',
            title: 'May hold',
            visibleMediaQuery: '(min-width: 48em)',
            render: (l) =>
              l.allowedHazardClasses
                .map((c) => (c === 'none' ? 'non-hazardous' : hazardShort(c)))
                .join(', ') || 'nothing',
          },
          { accessor: 'lotCount', title: 'Lots', sortable: true, textAlign: 'right' },
          { accessor: 'capacity', title: 'Cabinet', render: (l) => <CabinetFill location={l} /> },
          ...(canEdit
            ? [
                {
                  accessor: 'actions',
                  title: 'Actions',
                  textAlign: 'right' as const,
                  render: (l: Location) => (
                    <Group gap={4} justify="flex-end" wrap="nowrap">
                      <Button
                        size="xs"
                        variant="subtle"
                        leftSection={<IconPencil size={14} />}
                        aria-label={`Change ${l.name}`}
                        onClick={() => open(l)}
                      >
                        Change
                      </Button>
                      {l.active ? (
                        <Button
                          size="xs"
                          variant="subtle"
                          color="red"
                          leftSection={<IconArchive size={14} />}
                          aria-label={`Take ${l.name} out of use`}
                          onClick={() => archive(l)}
                        >
                          Out of use
                        </Button>
                      ) : (
                        <Button
                          size="xs"
                          variant="subtle"
                          leftSection={<IconArrowBackUp size={14} />}
                          aria-label={`Bring ${l.name} back into use`}
                          onClick={() => setActive.mutate({ id: l.id, active: true })}
                        >
                          Back in use
                        </Button>
                      )}
                      {l.lotCount === 0 ? (
                        <Button
                          size="xs"
                          variant="subtle"
                          color="red"
                          leftSection={<IconTrash size={14} />}
                          aria-label={`Delete ${l.name}`}
                          onClick={() => confirmDelete(l)}
                        >
                          Delete
                        </Button>
                      ) : null}
                    </Group>
                  ),
                },
              ]
            : []),
        ]}
      />
      {canEdit ? (
        <LocationFormModal
          opened={opened}
          onClose={modal.close}
          location={editing}
          locations={locations.data ?? []}
        />
      ) : null}
    </Stack>
  );
}
