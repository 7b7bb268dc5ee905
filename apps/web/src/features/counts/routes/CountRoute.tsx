import { Alert, Button, Card, SimpleGrid, Stack, Table, Text, Title } from '@mantine/core';
import { IconArrowLeft, IconClock } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { paths } from '../../../config/paths';
import { formatSignedMoney, formatSignedQuantity } from '../../../lib/amounts';
import { formatDateTime } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useCount } from '../api/get-count';
import { CountStatusBadge } from '../components/badges';
import { BlindEntry } from '../components/BlindEntry';
import { canApprove, canCount } from '../components/can-count';
import { DecisionPanel } from '../components/DecisionPanel';
import { VarianceTable } from '../components/VarianceTable';

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

export function CountRoute() {
  const { countId = '' } = useParams();
  const user = useSessionUser();
  const count = useCount(countId);

  if (count.isPending) {
    return <PageLoader label="Loading the count…" />;
  }
  if (count.isError) {
    return (
      <QueryError
        what="the count"
        error={count.error}
        onRetry={() => void count.refetch()}
        retrying={count.isFetching}
      />
    );
  }
  const c = count.data;
  const decided = c.status === 'approved' || c.status === 'cancelled';

  return (
    <>
      <PageHeader
        title={`Count ${c.number}: ${c.scopeName}`}
        description={`Opened ${formatDateTime(c.openedAt)} by ${c.openedByName}. Locations: ${c.locationNames.join(', ') || '—'}.`}
        actions={
          <Button
            component={Link}
            to={paths.counts}
            variant="default"
            leftSection={<IconArrowLeft size={18} />}
          >
            Counts
          </Button>
        }
      />
      <Stack gap="lg" maw={1100}>
        <CountStatusBadge status={c.status} />
        {c.note ? <Text size="sm">Note: {c.note}</Text> : null}
        {c.status === 'open' && c.decisionNote ? (
          <Alert color="orange" variant="light" title="Sent back to be counted again">
            {c.decisionNote}
          </Alert>
        ) : null}

        {c.status === 'open' ? (
          canCount(user.role) ? (
            <BlindEntry count={c} />
          ) : (
            <Alert color="blue" variant="light">
              This count is being done by the store. Its figures show once it is submitted.
            </Alert>
          )
        ) : (
          <>
            <Card>
              <SimpleGrid cols={{ base: 2, md: 4 }} spacing="md" mb="md">
                <Fact label="Lines">{c.totals.lines}</Fact>
                <Fact label="Less than expected">{c.totals.losses}</Fact>
                <Fact label="More than expected">{c.totals.surpluses}</Fact>
                <Fact label="Net value of the differences">{formatSignedMoney(c.totals.varianceValue)}</Fact>
                {c.submittedAt ? (
                  <Fact label="Submitted">{`${formatDateTime(c.submittedAt)} by ${c.submittedByName ?? '—'}`}</Fact>
                ) : null}
                {c.decidedAt ? (
                  <Fact
                    label={c.status === 'approved' ? 'Approved' : 'Cancelled'}
                  >{`${formatDateTime(c.decidedAt)} by ${c.decidedByName ?? '—'}`}</Fact>
                ) : null}
                {decided && c.decisionNote ? <Fact label="Note">{c.decisionNote}</Fact> : null}
              </SimpleGrid>
              <VarianceTable lines={c.lines} />
            </Card>
            {c.status === 'submitted' ? (
              canApprove(user.role) ? (
                <DecisionPanel count={c} />
              ) : (
                <Alert
                  color="orange"
                  variant="light"
                  icon={<IconClock size={20} />}
                  title="Waiting for the owner"
                >
                  The owner approves the differences, or sends the count back to be counted again.
                </Alert>
              )
            ) : null}
            {c.status === 'approved' ? (
              <Card>
                <Title order={2} fz="lg" mb="sm">
                  Adjustments posted
                </Title>
                {c.adjustments.length === 0 ? (
                  <Text size="sm" c="dimmed">
                    Every line matched: nothing was adjusted.
                  </Text>
                ) : (
                  <Table.ScrollContainer minWidth={560}>
                    <Table fz="sm" verticalSpacing={4}>
                      <Table.Thead>
                        <Table.Tr>
                          <Table.Th>Lot</Table.Th>
                          <Table.Th>Location</Table.Th>
                          <Table.Th ta="right">Quantity</Table.Th>
                          <Table.Th ta="right">Value</Table.Th>
                        </Table.Tr>
                      </Table.Thead>
                      <Table.Tbody>
                        {c.adjustments.map((m) => (
                          <Table.Tr key={m.id}>
                            <Table.Td>
                              {m.materialName}
                              {m.batchNumber ? ` · ${m.batchNumber}` : ''}
                            </Table.Td>
                            <Table.Td>{m.locationName}</Table.Td>
                            <Table.Td ta="right">{formatSignedQuantity(m.quantity, m.stockUnit)}</Table.Td>
                            <Table.Td ta="right">{formatSignedMoney(m.value)}</Table.Td>
                          </Table.Tr>
                        ))}
                      </Table.Tbody>
                    </Table>
                  </Table.ScrollContainer>
                )}
              </Card>
            ) : null}
          </>
        )}
      </Stack>
    </>
  );
}
