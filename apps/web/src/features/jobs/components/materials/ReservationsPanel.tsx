import { Alert, Badge, Button, Group, Paper, Stack, Table, Text } from '@mantine/core';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import {
  IconAlertTriangle,
  IconChevronDown,
  IconChevronRight,
  IconLockOpen,
  IconPackage,
} from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { compareValues, formatDate } from '../../../../lib/format';
import { useReleaseReservations } from '../../api/release-reservations';
import { useReserveMaterials } from '../../api/reserve-materials';
import type { JobDetail, ReservationMaterial, Reservations } from '../../api/types';
import { formatQuantity } from '../../utils/format';
import { materialStateLabels, statusLabels } from '../../utils/labels';
import { FlagBadges, lotLabel } from './FlagBadges';

const RESERVABLE = ['quoted', 'won', 'scheduled', 'in-progress'];
const PAGE_SIZE = 15;

interface ReservationsPanelProps {
  job: JobDetail;
  reservations: Reservations;
  canReserve: boolean;
  onGoToEstimate?: () => void;
  onEditJob?: () => void;
}

function sortValue(m: ReservationMaterial, column: string): string | number {
  switch (column) {
    case 'outstanding':
      return Number(m.outstanding);
    case 'shortfall':
      return m.shortfall ? m.shortfall.neededBy : '';
    default:
      return m.material.name;
  }
}

/** What the accepted estimate needs of each material, what is held for the date, and what is short. */
export function ReservationsPanel({
  job,
  reservations,
  canReserve,
  onGoToEstimate,
  onEditJob,
}: ReservationsPanelProps) {
  const reserve = useReserveMaterials(job.id);
  const release = useReleaseReservations(job.id);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<ReservationMaterial>>({
    columnAccessor: 'material',
    direction: 'asc',
  });
  const [page, setPage] = useState(1);
  const [expanded, setExpanded] = useState<string[]>([]);
  const rows = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    return [...reservations.materials].sort(
      (a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)),
    );
  }, [reservations.materials, sortStatus]);
  const records = rows.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);
  const held = reservations.materials.some((m) =>
    m.reservations.some((r) => r.status === 'held' && Number(r.heldQuantity) > 0),
  );
  const shorts = reservations.materials.filter((m) => m.shortfall !== null);

  const canRun =
    canReserve &&
    RESERVABLE.includes(job.status) &&
    reservations.estimate !== null &&
    reservations.jobDate !== null;

  const runReserve = () =>
    reserve.mutate(undefined, {
      onSuccess: (r) => {
        const short = r.materials.filter((m) => m.shortfall !== null).length;
        notifications.show({
          color: short > 0 ? 'orange' : 'green',
          title: short > 0 ? `${short} material${short === 1 ? '' : 's'} short` : 'All reserved',
          message:
            short > 0
              ? 'What the store could not cover is listed with the date it is needed by.'
              : `Everything the estimate needs is held for ${r.jobDate ? formatDate(r.jobDate) : 'the job'}.`,
        });
      },
    });

  const confirmRelease = () =>
    modals.openConfirmModal({
      title: `Release the reservations of ${job.reference}?`,
      children: (
        <Text size="sm">
          Every pack still held for this job goes back to the store for other jobs. Packs already issued stay
          issued. You can reserve again later, if the stock is still there.
        </Text>
      ),
      labels: { confirm: 'Release', cancel: 'Keep them' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        release.mutate(undefined, {
          onSuccess: () => notifications.show({ color: 'green', message: 'Reservations released.' }),
        }),
    });

  return (
    <Paper withBorder p="md" radius="md" component="section" aria-label="Reservations">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="wrap">
          <div>
            <Group gap="xs">
              <Text fw={700}>Reserved for the job date</Text>
              <Badge
                color={
                  reservations.state === 'reserved'
                    ? 'green'
                    : reservations.state === 'short'
                      ? 'red'
                      : reservations.state === 'issued'
                        ? 'blue'
                        : 'gray'
                }
                variant="light"
                leftSection={reservations.state === 'short' ? <IconAlertTriangle size={11} /> : undefined}
              >
                {materialStateLabels[reservations.state]}
              </Badge>
            </Group>
            <Text size="sm" c="dimmed">
              {reservations.jobDate
                ? `For ${formatDate(reservations.jobDate)}: lots must be in date until ${reservations.useBy ? formatDate(reservations.useBy) : '—'} (${reservations.marginDays} days' margin), not quarantined and not flagged.`
                : 'The job has no date yet.'}
              {reservations.estimate ? ` From estimate version ${reservations.estimate.version}.` : ''}
            </Text>
          </div>
          {canReserve ? (
            <Group gap="xs">
              {held ? (
                <Button
                  variant="default"
                  color="red"
                  leftSection={<IconLockOpen size={16} />}
                  loading={release.isPending}
                  onClick={confirmRelease}
                >
                  Release
                </Button>
              ) : null}
              {canRun ? (
                <Button
                  leftSection={<IconPackage size={16} />}
                  loading={reserve.isPending}
                  onClick={runReserve}
                >
                  {reservations.state === 'not-reserved' ? 'Reserve for the job date' : 'Reserve again'}
                </Button>
              ) : null}
            </Group>
          ) : null}
        </Group>

        {reservations.estimate === null ? (
          <Alert color="blue" variant="light" title="No accepted estimate">
            <Text size="sm">Materials are reserved from the accepted estimate&apos;s packs.</Text>
            {onGoToEstimate ? (
              <Button size="xs" mt="sm" variant="white" onClick={onGoToEstimate}>
                Open the estimates
              </Button>
            ) : null}
          </Alert>
        ) : reservations.jobDate === null && canReserve ? (
          <Alert color="blue" variant="light" title="Give the job a date">
            <Text size="sm">Stock is reserved for a day: it must still be in date then.</Text>
            {onEditJob ? (
              <Button size="xs" mt="sm" variant="white" onClick={onEditJob}>
                Set the date
              </Button>
            ) : null}
          </Alert>
        ) : canReserve && !RESERVABLE.includes(job.status) ? (
          <Text size="sm" c="dimmed">
            A {statusLabels[job.status].toLowerCase()} job holds no stock.
          </Text>
        ) : null}

        {shorts.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertTriangle size={18} />} title="Shortfalls">
            <Stack gap={4}>
              {shorts.map((m) => (
                <Text size="sm" key={m.material.id}>
                  <b>{m.material.name}</b>: {formatQuantity(m.shortfall?.quantity, m.unit)} needed by{' '}
                  {m.shortfall ? formatDate(m.shortfall.neededBy) : '—'}
                  {m.shortfall?.toOrder
                    ? ` — order ${m.shortfall.toOrder.packs.map((p) => `${p.count} × ${p.label}`).join(' + ')}`
                    : ''}
                  {m.shortfall?.supplier
                    ? ` from ${m.shortfall.supplier.name}${m.shortfall.leadTimeDays !== null ? ` (${m.shortfall.leadTimeDays} days' lead time)` : ''}`
                    : ''}
                  .
                </Text>
              ))}
            </Stack>
          </Alert>
        ) : null}

        {reservations.flagged > 0 ? (
          <Text size="sm" c="red.8">
            {reservations.flagged} reserved lot{reservations.flagged === 1 ? ' has' : 's have'} a problem for
            the job date: see the flags below and reserve again.
          </Text>
        ) : null}

        {records.length > 0 ? (
          <Text size="xs" c="dimmed">
            Click a material to see the lots held for it.
          </Text>
        ) : null}
        <DataTable<ReservationMaterial>
          withTableBorder
          borderRadius="md"
          verticalSpacing="xs"
          records={records}
          idAccessor={(m) => m.material.id}
          noRecordsText={
            reservations.estimate
              ? 'Nothing to reserve yet: reserve for the job date.'
              : 'Accept an estimate to see what the job needs.'
          }
          minHeight={records.length === 0 ? 140 : undefined}
          sortStatus={sortStatus}
          onSortStatusChange={setSortStatus}
          totalRecords={rows.length}
          recordsPerPage={PAGE_SIZE}
          page={page}
          onPageChange={setPage}
          paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
          rowExpansion={{
            allowMultiple: true,
            expanded: { recordIds: expanded, onRecordIdsChange: setExpanded },
            content: ({ record }) =>
              record.reservations.length === 0 ? (
                <Text size="sm" c="dimmed" p="sm">
                  No lot holds anything for this job.
                </Text>
              ) : (
                <Table verticalSpacing={4} fz="sm" ml="lg" maw={760}>
                  <Table.Thead>
                    <Table.Tr>
                      <Table.Th>Lot</Table.Th>
                      <Table.Th>Expires</Table.Th>
                      <Table.Th ta="right">Reserved</Table.Th>
                      <Table.Th ta="right">Issued</Table.Th>
                      <Table.Th ta="right">Held</Table.Th>
                      <Table.Th />
                    </Table.Tr>
                  </Table.Thead>
                  <Table.Tbody>
                    {record.reservations.map((r) => (
                      <Table.Tr key={r.id}>
                        <Table.Td>{lotLabel(r.lot)}</Table.Td>
                        <Table.Td>{r.lot.expiresOn ? formatDate(r.lot.expiresOn) : '—'}</Table.Td>
                        <Table.Td ta="right">{formatQuantity(r.reservedQuantity, record.unit, 3)}</Table.Td>
                        <Table.Td ta="right">{formatQuantity(r.issuedQuantity, record.unit, 3)}</Table.Td>
                        <Table.Td ta="right">{formatQuantity(r.heldQuantity, record.unit, 3)}</Table.Td>
                        <Table.Td>
                          <FlagBadges flags={r.flags} />
                        </Table.Td>
                      </Table.Tr>
                    ))}
                  </Table.Tbody>
                </Table>
              ),
          }}
          columns={[
            {
              accessor: 'material',
              title: 'Material',
              sortable: true,
              render: (m) => (
                <Stack gap={0}>
                  <Group gap={4} wrap="nowrap">
                    {expanded.includes(m.material.id) ? (
                      <IconChevronDown size={14} />
                    ) : (
                      <IconChevronRight size={14} />
                    )}
                    <Text size="sm" fw={600}>
                      {m.material.name}
                    </Text>
                  </Group>
                  <Text size="xs" c="dimmed">
                    {m.material.code} · {m.reservations.length} lot{m.reservations.length === 1 ? '' : 's'}
                    {m.reservations.some((r) => r.flags.length > 0) ? ' · flagged' : ''}
                  </Text>
                </Stack>
              ),
            },
            {
              accessor: 'needed',
              title: 'Needed',
              textAlign: 'right',
              render: (m) => formatQuantity(m.needed, m.unit, 3),
            },
            {
              accessor: 'held',
              title: 'Reserved',
              textAlign: 'right',
              render: (m) => formatQuantity(m.held, m.unit, 3),
            },
            {
              accessor: 'issued',
              title: 'Issued',
              textAlign: 'right',
              render: (m) => formatQuantity(m.issued, m.unit, 3),
            },
            {
              accessor: 'outstanding',
              title: 'Still to find',
              sortable: true,
              textAlign: 'right',
              render: (m) => formatQuantity(m.outstanding, m.unit, 3),
            },
            {
              accessor: 'shortfall',
              title: 'Shortfall',
              sortable: true,
              render: (m) =>
                m.shortfall ? (
                  <Badge color="red" variant="light" leftSection={<IconAlertTriangle size={11} />}>
                    {formatQuantity(m.shortfall.quantity, m.unit, 3)} by {formatDate(m.shortfall.neededBy)}
                  </Badge>
                ) : (
                  <Text size="sm" c="dimmed">
                    —
                  </Text>
                ),
            },
          ]}
        />
        {reservations.skipped.length > 0 ? (
          <Text size="sm" c="orange.9">
            Not reserved: {reservations.skipped.map((s) => s.reason).join(' ')}
          </Text>
        ) : null}
      </Stack>
    </Paper>
  );
}
