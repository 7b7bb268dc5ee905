import {
  Alert,
  Anchor,
  Badge,
  Button,
  Card,
  Group,
  List,
  SimpleGrid,
  Stack,
  Table,
  Text,
  Title,
} from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconAlertTriangle, IconArrowLeft, IconCircleCheck, IconFileText } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useLocation, useParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs, paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatMoney, formatQuantity } from '../../../lib/amounts';
import { formatBytes, formatDate, formatDateTime } from '../../../lib/format';
import { unitLabel } from '../../../lib/material-words';
import { openFileInNewTab } from '../../../lib/open-file';
import { useSessionUser } from '../../../lib/session';
import { getDeliveryNote } from '../api/delivery-note';
import { useReceipt } from '../api/get-receipt';
import type { Receipt } from '../api/types';
import { canReceive } from '../components/can-receive';
import { DeliveryNoteUpload } from '../components/DeliveryNoteUpload';
import { PrintLabelsButton } from '../components/PrintLabelsButton';
import type { PostedState } from './ReceiveRoute';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" fw={600} tt="uppercase">
        {label}
      </Text>
      <Text size="sm">{children}</Text>
    </div>
  );
}

const typeWords: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/jpeg': 'JPEG image',
  'image/png': 'PNG image',
};

function DeliveryNoteCard({ receipt, canChange }: { receipt: Receipt; canChange: boolean }) {
  const [busy, setBusy] = useState(false);
  const note = receipt.deliveryNote;
  return (
    <Card>
      <Title order={2} fz="lg" mb="sm">
        Delivery note
      </Title>
      {note ? (
        <Group justify="space-between" wrap="wrap" gap="sm">
          <Group gap="sm" wrap="nowrap">
            <IconFileText size={28} aria-hidden />
            <div>
              <Text size="sm" fw={600}>
                {note.fileName}
              </Text>
              <Text size="xs" c="dimmed">
                {typeWords[note.contentType] ?? note.contentType}, {formatBytes(note.sizeBytes)}, kept{' '}
                {formatDateTime(note.uploadedAt)}
              </Text>
            </div>
          </Group>
          <Button
            variant="default"
            loading={busy}
            onClick={() => {
              setBusy(true);
              openFileInNewTab(() => getDeliveryNote(receipt.id), note.fileName)
                .catch((error: unknown) =>
                  notifications.show({
                    color: 'red',
                    title: 'The delivery note did not open',
                    message: errorMessage(error),
                  }),
                )
                .finally(() => setBusy(false));
            }}
          >
            Open it
          </Button>
        </Group>
      ) : canChange ? (
        <DeliveryNoteUpload receiptId={receipt.id} />
      ) : (
        <Text size="sm" c="dimmed">
          No delivery note is kept with this receipt.
        </Text>
      )}
    </Card>
  );
}

export function ReceiptRoute() {
  const { receiptId = '' } = useParams();
  const location = useLocation();
  const posted = (location.state as PostedState | null)?.justPosted ? (location.state as PostedState) : null;
  const user = useSessionUser();
  const canChange = canReceive(user.role);
  const receipt = useReceipt(receiptId);

  if (receipt.isPending) {
    return <PageLoader label="Loading the receipt…" />;
  }
  if (receipt.isError) {
    return (
      <QueryError
        what="the receipt"
        error={receipt.error}
        onRetry={() => void receipt.refetch()}
        retrying={receipt.isFetching}
      />
    );
  }
  const r = receipt.data;
  const packs = r.lines.reduce((sum, line) => sum + line.packsReceived, 0);

  return (
    <>
      <PageHeader
        title={`Receipt ${r.number}`}
        description={`${r.supplierName ?? 'Unlisted supplier'}${r.deliveryNoteNumber ? `, delivery note ${r.deliveryNoteNumber}` : ''}. Received ${formatDate(r.receivedOn)} by ${r.receivedByName}.`}
        actions={
          <>
            <Button
              component={Link}
              to={paths.receipts}
              variant="default"
              leftSection={<IconArrowLeft size={18} />}
            >
              Receipts
            </Button>
            {packs > 0 ? (
              <PrintLabelsButton receiptId={r.id} number={r.number} variant={posted ? 'filled' : 'default'} />
            ) : null}
          </>
        }
      />
      <Stack gap="lg" maw={1100}>
        {posted ? (
          <Alert color="green" variant="light" icon={<IconCircleCheck size={20} />} title="Booked in">
            <Group justify="space-between" wrap="wrap" gap="sm">
              <Text size="sm">
                {packs} pack{packs === 1 ? '' : 's'} are in stock as {r.lines.filter((l) => l.lotId).length}{' '}
                lot
                {r.lines.filter((l) => l.lotId).length === 1 ? '' : 's'}. Print a label for each pack and
                stick it on.
              </Text>
              {packs > 0 ? <PrintLabelsButton receiptId={r.id} number={r.number} size="sm" /> : null}
            </Group>
          </Alert>
        ) : null}
        {(posted?.warnings ?? r.warnings).length > 0 ? (
          <Alert color="yellow" variant="light" icon={<IconAlertTriangle size={20} />} title="Worth a look">
            <List size="sm" spacing={2}>
              {(posted?.warnings ?? r.warnings).map((warning) => (
                <List.Item key={warning}>{warning}</List.Item>
              ))}
            </List>
          </Alert>
        ) : null}
        {posted?.uploadError ? (
          <Alert color="red" variant="light" role="alert" title="The delivery note was not kept">
            {posted.uploadError} The delivery itself is booked in; add the note again below.
          </Alert>
        ) : null}

        <Card>
          <SimpleGrid cols={{ base: 2, md: 4 }} spacing="md" mb="md">
            <Fact label="Supplier">
              {r.supplierId ? (
                <Anchor component={Link} to={hrefs.supplier(r.supplierId)} size="sm">
                  {r.supplierName}
                </Anchor>
              ) : (
                (r.supplierName ?? '—')
              )}
            </Fact>
            <Fact label="Delivery note number">{r.deliveryNoteNumber ?? '—'}</Fact>
            <Fact label="Value">{formatMoney(r.totalValue)}</Fact>
            <Fact label="Recorded">{formatDateTime(r.createdAt)}</Fact>
          </SimpleGrid>
          {r.note ? <Fact label="Note">{r.note}</Fact> : null}
          <Title order={2} fz="lg" mt="md" mb="sm">
            Lines
          </Title>
          <Table.ScrollContainer minWidth={860}>
            <Table fz="sm" verticalSpacing={6} striped>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>#</Table.Th>
                  <Table.Th>Material</Table.Th>
                  <Table.Th>Batch</Table.Th>
                  <Table.Th>Expiry</Table.Th>
                  <Table.Th ta="right">Packs in</Table.Th>
                  <Table.Th ta="right">Refused</Table.Th>
                  <Table.Th ta="right">Quantity</Table.Th>
                  <Table.Th ta="right">Cost</Table.Th>
                  <Table.Th ta="right">Value</Table.Th>
                  <Table.Th>Put away at</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {r.lines.map((line) => (
                  <Table.Tr key={line.id}>
                    <Table.Td>{line.lineNo}</Table.Td>
                    <Table.Td>
                      <Text size="sm">
                        <Text span ff="monospace" fw={700}>
                          {line.materialCode}
                        </Text>{' '}
                        {line.materialName}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      {line.lotId ? (
                        <Anchor component={Link} to={hrefs.lot(line.lotId)} size="sm">
                          {line.batchNumber ?? 'the lot'}
                        </Anchor>
                      ) : (
                        (line.batchNumber ?? '—')
                      )}
                    </Table.Td>
                    <Table.Td>
                      {line.expiresOn ? formatDate(line.expiresOn) : '—'}
                      {line.expiryComputed ? (
                        <Badge
                          ml={6}
                          size="xs"
                          variant="outline"
                          color="gray"
                          styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                        >
                          from shelf life
                        </Badge>
                      ) : null}
                    </Table.Td>
                    <Table.Td ta="right">{line.packsReceived}</Table.Td>
                    <Table.Td ta="right">
                      {line.packsRefused > 0 ? (
                        <Text size="sm" c="red.8" title={line.refusedReason ?? undefined}>
                          {line.packsRefused}
                          {line.refusedReason ? ` (${line.refusedReason})` : ''}
                        </Text>
                      ) : (
                        '0'
                      )}
                    </Table.Td>
                    <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                      {formatQuantity(line.quantity, line.stockUnit)}
                    </Table.Td>
                    <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                      {formatMoney(line.unitCost)} / {unitLabel(line.stockUnit)}
                    </Table.Td>
                    <Table.Td ta="right">{formatMoney(line.value)}</Table.Td>
                    <Table.Td>{line.locationName ?? '—'}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        </Card>
        <DeliveryNoteCard receipt={r} canChange={canChange} />
      </Stack>
    </>
  );
}
