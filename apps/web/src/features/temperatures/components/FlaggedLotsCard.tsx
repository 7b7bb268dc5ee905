import { Alert, Anchor, Button, Card, Group, Modal, Stack, Text, Textarea, Title } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconLock, IconTemperatureSun } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { QueryError } from '../../../components/QueryError';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatQuantity } from '../../../lib/amounts';
import { formatDateTime } from '../../../lib/format';
import { newIdempotencyKey } from '../../../lib/upload';
import { useClientTable } from '../../../lib/use-client-table';
import { useFlaggedLots } from '../api/get-choices';
import { useFlaggedLotAction } from '../api/lot-action';
import type { ExposedLot } from '../api/types';

type Action = { lot: ExposedLot; action: 'clear-flag' | 'quarantine' };

function ActionForm({ choice, onClose }: { choice: Action; onClose: () => void }) {
  const act = useFlaggedLotAction();
  const [key] = useState(newIdempotencyKey);
  const [note, setNote] = useState('');
  const [tried, setTried] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { lot, action } = choice;
  const name = `${lot.materialName}${lot.batchNumber ? ` ${lot.batchNumber}` : ''}`;
  const clear = action === 'clear-flag';
  const noteError =
    tried && note.trim() === '' ? (clear ? 'Say what you checked' : 'Say why it is set aside') : undefined;
  if (confirming) {
    return (
      <Stack gap="md">
        <Alert color={clear ? 'blue' : 'red'} variant="light" title="Check before you confirm">
          {clear
            ? `${name} becomes usable again, with your note: “${note.trim()}”.`
            : `${name} is set aside and not offered for jobs until released. Note: “${note.trim()}”.`}
        </Alert>
        {error ? (
          <Alert color="red" variant="light" role="alert" title="Nothing was changed">
            {error}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={() => setConfirming(false)} disabled={act.isPending}>
            Back
          </Button>
          <Button
            color={clear ? undefined : 'red'}
            loading={act.isPending}
            onClick={() =>
              act.mutate(
                { lotId: lot.id, action, note: note.trim(), key },
                {
                  onSuccess: () => {
                    notifications.show({
                      color: 'green',
                      message: clear ? `${name} is cleared for use.` : `${name} is quarantined.`,
                    });
                    onClose();
                  },
                  onError: (failure) => setError(errorMessage(failure)),
                },
              )
            }
          >
            {clear ? 'Clear the flag' : 'Quarantine it'}
          </Button>
        </Group>
      </Stack>
    );
  }
  return (
    <Stack gap="md">
      <Text size="sm">{lot.exposureReason ?? 'It was stored outside its temperature range.'}</Text>
      <Textarea
        label="Note"
        placeholder={
          clear
            ? 'Resin checked: clear, no gel, viscosity normal'
            : 'Catalyst got too warm; kept aside for the supplier'
        }
        autosize
        minRows={2}
        value={note}
        onChange={(e) => setNote(e.currentTarget.value)}
        error={noteError}
        data-autofocus
      />
      <Group justify="flex-end">
        <Button variant="default" onClick={onClose}>
          Cancel
        </Button>
        <Button
          color={clear ? undefined : 'red'}
          onClick={() => {
            setTried(true);
            if (note.trim() !== '') {
              setConfirming(true);
            }
          }}
        >
          Next
        </Button>
      </Group>
    </Stack>
  );
}

/** The lots flagged "check before use": clear each (checked, fine) or quarantine it. */
export function FlaggedLotsCard({ canChange }: { canChange: boolean }) {
  const lots = useFlaggedLots();
  const [choice, setChoice] = useState<Action | null>(null);
  const table = useClientTable<ExposedLot>(lots.data ?? [], {
    searchText: (l) =>
      `${l.materialCode} ${l.materialName} ${l.batchNumber ?? ''} ${l.places.map((p) => p.locationName).join(' ')}`,
    initialSort: { columnAccessor: 'exposureFlaggedAt', direction: 'desc' },
    pageSizes: [10, 25, 50],
  });
  return (
    <Card>
      <Group justify="space-between" mb="sm" wrap="wrap">
        <Group gap="xs">
          <IconTemperatureSun size={22} aria-hidden />
          <Title order={2} fz="lg">
            Check before use
          </Title>
        </Group>
        <SearchInput
          label="Filter flagged lots"
          placeholder="Filter by material, batch or location"
          value={table.query}
          onChange={table.setQuery}
          width={260}
        />
      </Group>
      {lots.isError ? (
        <QueryError
          what="the flagged lots"
          error={lots.error}
          onRetry={() => void lots.refetch()}
          retrying={lots.isFetching}
        />
      ) : (
        <DataTable<ExposedLot>
          withTableBorder
          borderRadius="md"
          verticalSpacing="xs"
          minHeight={table.records.length === 0 ? 140 : undefined}
          fetching={lots.isPending}
          records={table.records}
          noRecordsText={
            lots.isPending
              ? 'Loading…'
              : 'No lot is flagged. A reading outside a material’s range flags the lots stored there.'
          }
          recordsPerPageLabel="Lots per page"
          {...table.tableProps}
          columns={[
            {
              accessor: 'materialName',
              title: 'Lot',
              sortable: true,
              render: (l) => (
                <Anchor component={Link} to={hrefs.lot(l.id)} size="sm">
                  {l.materialName}
                  {l.batchNumber ? ` · ${l.batchNumber}` : ''}
                </Anchor>
              ),
            },
            {
              accessor: 'places',
              title: 'Where',
              render: (l) => l.places.map((p) => p.locationName).join(', ') || '—',
            },
            {
              accessor: 'quantity',
              title: 'Quantity',
              textAlign: 'right',
              render: (l) => formatQuantity(l.quantity, l.stockUnit),
            },
            {
              accessor: 'exposureReason',
              title: 'Why',
              visibleMediaQuery: '(min-width: 48em)',
              render: (l) => l.exposureReason ?? '—',
            },
            {
              accessor: 'exposureFlaggedAt',
              title: 'Flagged',
              sortable: true,
              visibleMediaQuery: '(min-width: 62em)',
              render: (l) => (l.exposureFlaggedAt ? formatDateTime(l.exposureFlaggedAt) : '—'),
            },
            ...(canChange
              ? [
                  {
                    accessor: 'actions',
                    title: '',
                    textAlign: 'right' as const,
                    render: (l: ExposedLot) => (
                      <Group gap={4} justify="flex-end" wrap="nowrap">
                        <Button
                          size="xs"
                          variant="light"
                          onClick={() => setChoice({ lot: l, action: 'clear-flag' })}
                          aria-label={`Clear the flag on ${l.materialName} ${l.batchNumber ?? ''}`}
                        >
                          Checked: clear
                        </Button>
                        <Button
                          size="xs"
                          variant="light"
                          color="red"
                          leftSection={<IconLock size={12} />}
                          onClick={() => setChoice({ lot: l, action: 'quarantine' })}
                          aria-label={`Quarantine ${l.materialName} ${l.batchNumber ?? ''}`}
                          disabled={l.status === 'quarantined'}
                        >
                          Quarantine
                        </Button>
                      </Group>
                    ),
                  },
                ]
              : []),
          ]}
        />
      )}
      <Modal
        opened={choice !== null}
        onClose={() => setChoice(null)}
        title={
          choice
            ? `${choice.action === 'clear-flag' ? 'Clear the flag on' : 'Quarantine'} ${choice.lot.materialName}${choice.lot.batchNumber ? ` ${choice.lot.batchNumber}` : ''}`
            : ''
        }
      >
        {choice ? (
          <ActionForm
            key={`${choice.lot.id}-${choice.action}`}
            choice={choice}
            onClose={() => setChoice(null)}
          />
        ) : null}
      </Modal>
    </Card>
  );
}
