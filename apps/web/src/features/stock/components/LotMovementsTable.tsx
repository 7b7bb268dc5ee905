import { Badge, Button, Stack, Text } from '@mantine/core';
import { DataTable } from 'mantine-datatable';
import { useState } from 'react';
import { QueryError } from '../../../components/QueryError';
import { formatSignedMoney, formatSignedQuantity } from '../../../lib/amounts';
import { formatDateTime } from '../../../lib/format';
import { MOVEMENTS_PAGE_SIZE, useLotMovements } from '../api/get-movements';
import type { Movement } from '../api/types';
import { movementKindLabels } from './movement-words';
import { ReverseMovementModal } from './ReverseMovementModal';

function where(movement: Movement): string {
  if (movement.kind === 'transfer' && movement.fromLocationName && movement.toLocationName) {
    return `${movement.fromLocationName} → ${movement.toLocationName}`;
  }
  return movement.locationName;
}

/** Every movement of one lot, newest first: who, when, why. Only receipts, transfers, adjustments and write-offs posted here can be reversed here. */
export function LotMovementsTable({ lotId, canChange }: { lotId: string; canChange: boolean }) {
  const [page, setPage] = useState(1);
  const movements = useLotMovements(lotId, page);
  const [reversing, setReversing] = useState<Movement | null>(null);
  if (movements.isError) {
    return (
      <QueryError
        what="the movements"
        error={movements.error}
        onRetry={() => void movements.refetch()}
        retrying={movements.isFetching}
      />
    );
  }
  // A transfer is two lines (out of one place, into another); show the leg into the new place once.
  const rows = (movements.data?.items ?? []).filter(
    (m) => m.kind !== 'transfer' || m.locationId === m.toLocationId,
  );
  return (
    <>
      <DataTable<Movement>
        withTableBorder
        borderRadius="md"
        verticalSpacing="xs"
        minHeight={rows.length === 0 ? 160 : undefined}
        fetching={movements.isPending || (movements.isFetching && movements.isPlaceholderData)}
        records={rows}
        noRecordsText={movements.isPending ? 'Loading…' : 'No movements yet.'}
        totalRecords={movements.data?.total ?? 0}
        recordsPerPage={MOVEMENTS_PAGE_SIZE}
        page={page}
        onPageChange={setPage}
        paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords} ledger lines`}
        columns={[
          { accessor: 'createdAt', title: 'When', render: (m) => formatDateTime(m.createdAt) },
          {
            accessor: 'kind',
            title: 'Movement',
            render: (m) => (
              <Stack gap={2}>
                <Text size="sm" fw={600}>
                  {movementKindLabels[m.kind]}
                </Text>
                {m.reversedByMovementId ? (
                  <Badge
                    size="xs"
                    color="gray"
                    variant="outline"
                    styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                  >
                    Reversed
                  </Badge>
                ) : null}
                {m.reversesMovementId ? (
                  <Badge
                    size="xs"
                    color="grape"
                    variant="light"
                    styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                  >
                    Reversal
                  </Badge>
                ) : null}
              </Stack>
            ),
          },
          { accessor: 'locationName', title: 'Where', render: where },
          {
            accessor: 'quantity',
            title: 'Quantity',
            textAlign: 'right',
            render: (m) => (
              <Text size="sm" fw={600} c={m.quantity.startsWith('-') ? 'red.8' : 'green.8'}>
                {m.kind === 'transfer'
                  ? formatSignedQuantity(m.quantity, m.stockUnit).replace(/^\+/, '')
                  : formatSignedQuantity(m.quantity, m.stockUnit)}
              </Text>
            ),
          },
          {
            accessor: 'value',
            title: 'Value',
            textAlign: 'right',
            visibleMediaQuery: '(min-width: 48em)',
            render: (m) => formatSignedMoney(m.value),
          },
          {
            accessor: 'reason',
            title: 'Who and why',
            render: (m) => (
              <Stack gap={0}>
                <Text size="sm">{m.userName}</Text>
                {m.reason || m.note ? (
                  <Text size="xs" c="dimmed">
                    {[m.reason, m.note].filter(Boolean).join(': ')}
                  </Text>
                ) : null}
              </Stack>
            ),
          },
          ...(canChange
            ? [
                {
                  accessor: 'actions',
                  title: '',
                  textAlign: 'right' as const,
                  render: (m: Movement) =>
                    m.reversedByMovementId ||
                    m.reversesMovementId ||
                    m.kind === 'issue' ||
                    m.kind === 'return' ? null : (
                      <Button
                        size="xs"
                        variant="subtle"
                        color="red"
                        onClick={() => setReversing(m)}
                        aria-label={`Reverse the ${movementKindLabels[m.kind].toLowerCase()} of ${formatDateTime(m.createdAt)}`}
                      >
                        Reverse
                      </Button>
                    ),
                },
              ]
            : []),
        ]}
      />
      <ReverseMovementModal movement={reversing} onClose={() => setReversing(null)} />
    </>
  );
}
