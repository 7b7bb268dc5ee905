import {
  Alert,
  Anchor,
  Button,
  Card,
  Group,
  SimpleGrid,
  Stack,
  Table,
  Text,
  Timeline,
  Title,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import {
  IconArrowLeft,
  IconArrowsExchange,
  IconLock,
  IconLockOpen,
  IconTemperatureSun,
  IconTrash,
} from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { CautionsList } from '../../../components/CautionsList';
import { ExpiryBadge, LotBadges } from '../../../components/LotBadges';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { rolesFor } from '../../../config/navigation';
import { hrefs } from '../../../config/paths';
import { formatMoney, formatQuantity, signOf } from '../../../lib/amounts';
import { formatDate, formatDateTime } from '../../../lib/format';
import { hazardShort, materialKindLabel, unitLabel } from '../../../lib/material-words';
import { useSessionUser } from '../../../lib/session';
import { useLot } from '../api/get-lot';
import type { LotAction } from '../api/lot-action';
import { canChangeStock } from '../components/can-change-stock';
import { LotMovementsTable } from '../components/LotMovementsTable';
import { LotNoteActionModal } from '../components/LotNoteActionModal';
import { lotEventLabels } from '../components/movement-words';
import { PrintLabelButton } from '../components/PrintLabelButton';
import { TransferModal } from '../components/TransferModal';
import { WriteOffModal } from '../components/WriteOffModal';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" fw={600} tt="uppercase">
        {label}
      </Text>
      <div>{typeof children === 'string' ? <Text size="sm">{children}</Text> : children}</div>
    </div>
  );
}

export function LotRoute() {
  const { lotId = '' } = useParams();
  const user = useSessionUser();
  const canChange = canChangeStock(user.role);
  const lot = useLot(lotId);
  const [transferOpened, transfer] = useDisclosure(false);
  const [writeOffOpened, writeOff] = useDisclosure(false);
  const [noteAction, setNoteAction] = useState<LotAction | null>(null);

  if (lot.isPending) {
    return <PageLoader label="Loading the lot…" />;
  }
  if (lot.isError) {
    return (
      <QueryError
        what="the lot"
        error={lot.error}
        onRetry={() => void lot.refetch()}
        retrying={lot.isFetching}
      />
    );
  }
  const l = lot.data;
  const inStock = signOf(l.quantity) > 0;
  const name = `${l.materialName}${l.batchNumber ? ` · batch ${l.batchNumber}` : ''}`;

  return (
    <>
      <PageHeader
        title={name}
        description={
          <>
            {materialKindLabel(l.materialKind)}{' '}
            <Text span ff="monospace">
              {l.materialCode}
            </Text>
            , received {formatDate(l.receivedOn)}
            {l.receiptId && l.receiptNumber !== null ? (
              <>
                {' '}
                on{' '}
                {rolesFor('receipts').includes(user.role) ? (
                  <Anchor component={Link} to={hrefs.receipt(l.receiptId)} size="sm">
                    receipt {l.receiptNumber}
                  </Anchor>
                ) : (
                  `receipt ${l.receiptNumber}`
                )}
              </>
            ) : null}
            .
          </>
        }
        actions={
          <Button
            component={Link}
            to={hrefs.stockView('lot')}
            variant="default"
            leftSection={<IconArrowLeft size={18} />}
          >
            Lots
          </Button>
        }
      />
      <Stack gap="lg" maw={1100}>
        {l.exposureFlagged ? (
          <Alert
            color="yellow"
            variant="light"
            icon={<IconTemperatureSun size={20} />}
            title="Check before use"
          >
            <Text size="sm">
              {l.exposureReason ?? 'It was stored outside its temperature range.'}
              {l.exposureFlaggedAt ? ` (flagged ${formatDateTime(l.exposureFlaggedAt)})` : ''} Check it, then
              clear the flag with a note, or quarantine it.
            </Text>
          </Alert>
        ) : null}
        <Card>
          <Group justify="space-between" align="flex-start" wrap="wrap" gap="md" mb="md">
            <Group gap="xs">
              <LotBadges
                status={l.status}
                exposureFlagged={l.exposureFlagged}
                exposureReason={l.exposureReason}
              />
              <ExpiryBadge expiry={l.expiry} />
            </Group>
            <PrintLabelButton lot={l} />
          </Group>
          <SimpleGrid cols={{ base: 2, md: 4 }} spacing="md">
            <Fact label="Quantity">{formatQuantity(l.quantity, l.stockUnit)}</Fact>
            <Fact label={`Cost per ${unitLabel(l.stockUnit)}`}>{formatMoney(l.unitCost)}</Fact>
            <Fact label="Value">{formatMoney(l.value)}</Fact>
            <Fact label="Expiry date">{l.expiry.expiresOn ? formatDate(l.expiry.expiresOn) : 'None'}</Fact>
            <Fact label="Hazard">
              {hazardShort(l.hazardClass) === '—' ? 'Not dangerous goods' : hazardShort(l.hazardClass)}
            </Fact>
            <Fact label="Usable for jobs">{l.usable ? 'Yes' : 'No'}</Fact>
          </SimpleGrid>
          <Title order={3} fz="sm" mt="lg" mb={6}>
            Where it is
          </Title>
          {l.places.length === 0 ? (
            <Text size="sm" c="dimmed">
              Nothing of it is left.
            </Text>
          ) : (
            <Table fz="sm" maw={480} verticalSpacing={4}>
              <Table.Tbody>
                {l.places.map((place) => (
                  <Table.Tr key={place.locationId}>
                    <Table.Td>{place.locationName}</Table.Td>
                    <Table.Td ta="right">{formatQuantity(place.quantity, l.stockUnit)}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          )}
          {canChange && inStock ? (
            <Group gap="sm" mt="lg" wrap="wrap">
              <Button variant="light" leftSection={<IconArrowsExchange size={18} />} onClick={transfer.open}>
                Move
              </Button>
              {l.status === 'quarantined' ? (
                <Button
                  variant="light"
                  leftSection={<IconLockOpen size={18} />}
                  onClick={() => setNoteAction('release')}
                >
                  Release
                </Button>
              ) : l.status !== 'written-off' ? (
                <Button
                  variant="light"
                  color="orange"
                  leftSection={<IconLock size={18} />}
                  onClick={() => setNoteAction('quarantine')}
                >
                  Quarantine
                </Button>
              ) : null}
              {l.exposureFlagged ? (
                <Button
                  variant="light"
                  color="yellow"
                  leftSection={<IconTemperatureSun size={18} />}
                  onClick={() => setNoteAction('clear-flag')}
                >
                  Clear the flag
                </Button>
              ) : null}
              <Button
                variant="light"
                color="red"
                leftSection={<IconTrash size={18} />}
                onClick={writeOff.open}
              >
                Write off
              </Button>
            </Group>
          ) : null}
        </Card>

        <CautionsList kinds={[l.materialKind]} where="store" title="Handling it" />

        {l.events.length > 0 ? (
          <Card>
            <Title order={2} fz="lg" mb="sm">
              What happened to it
            </Title>
            <Timeline bulletSize={14} lineWidth={2}>
              {l.events.map((event) => (
                <Timeline.Item key={event.id} title={lotEventLabels[event.kind] ?? event.kind}>
                  <Text size="sm">{event.note ?? '—'}</Text>
                  <Text size="xs" c="dimmed">
                    {event.userName ?? 'Potlife'} · {formatDateTime(event.createdAt)}
                  </Text>
                </Timeline.Item>
              ))}
            </Timeline>
          </Card>
        ) : null}

        <Card>
          <Title order={2} fz="lg" mb="sm">
            Movements
          </Title>
          <LotMovementsTable lotId={l.id} canChange={canChange} />
        </Card>
      </Stack>
      {canChange ? (
        <>
          <TransferModal lot={l} opened={transferOpened} onClose={transfer.close} />
          <WriteOffModal lot={l} opened={writeOffOpened} onClose={writeOff.close} />
          <LotNoteActionModal lot={l} action={noteAction} onClose={() => setNoteAction(null)} />
        </>
      ) : null}
    </>
  );
}
