import {
  Accordion,
  Alert,
  Badge,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Switch,
  Table,
  Text,
  Title,
} from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { compareValues, formatDate, formatDateTime } from '../../../../lib/format';
import type { Estimate, EstimateMaterial, EstimatePack } from '../../api/types';
import { formatArea, formatMoney, formatNumber, formatQuantity, unitLabel } from '../../utils/format';
import { CautionsList } from './CautionsList';

/** " (lot R-A)" for a lot with a batch number; nothing for one without (trims, fixings). */
const lotName = (p: EstimatePack) => (p.lot?.batchNumber ? ` (lot ${p.lot.batchNumber})` : '');

/** "6 kg from stock (lot R-A) + 2 × 25 kg drum" */
export function packsText(m: EstimateMaterial): string {
  if (m.packs.length === 0) {
    return '—';
  }
  return m.packs
    .map((p) =>
      p.source === 'stock'
        ? `${formatQuantity(p.size, m.unit, 3)} from stock${lotName(p)}`
        : `${p.count} × ${p.label}`,
    )
    .join(' + ');
}

/** A lot's cost of one unit: to the penny, or to its 4 places when it has them ("£13.40", "£3.1234"). */
function unitCostText(v: string): string {
  const places = (v.split('.')[1] ?? '').replace(/0+$/, '').length;
  return places <= 2 ? formatMoney(v) : `£${formatNumber(v, 4)}`;
}

/** "£3.1234 / kg (lot R-A), £87.25 / 25 kg drum": a lot at its own cost, packs at the supplier's price. */
export function packPriceText(m: EstimateMaterial): string {
  const priced = m.packs.filter((p) => (p.source === 'stock' ? p.lot !== null : p.packPrice !== null));
  if (priced.length === 0) {
    return '—';
  }
  return priced
    .map((p) =>
      p.source === 'stock'
        ? `${unitCostText(p.lot!.unitCost)} / ${unitLabel(m.unit) || 'each'}${lotName(p)}`
        : `${formatMoney(p.packPrice)} / ${p.label}`,
    )
    .join(', ');
}

export const costBasisLabels = { supplier: 'Supplier prices', stock: 'Stock cost' } as const;

const PAGE_SIZE = 25;

function sortValue(m: EstimateMaterial, column: string): string | number {
  switch (column) {
    case 'material':
      return m.material?.name ?? m.materialKind;
    case 'cost':
      return m.cost === null ? -1 : Number(m.cost);
    default:
      return m.position;
  }
}

/** One estimate version: what it needs, in packs and money, and the price it comes to. */
export function EstimateView({ estimate }: { estimate: Estimate }) {
  const [onlyUnpriced, setOnlyUnpriced] = useState(false);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<EstimateMaterial>>({
    columnAccessor: 'position',
    direction: 'asc',
  });
  const [page, setPage] = useState(1);
  const rows = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    return estimate.materials
      .filter((m) => !onlyUnpriced || !m.priced)
      .sort((a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)));
  }, [estimate.materials, onlyUnpriced, sortStatus]);
  const records = rows.slice((page - 1) * PAGE_SIZE, page * PAGE_SIZE);
  const { price, labour } = estimate;

  return (
    <Stack gap="md" aria-label={`Estimate version ${estimate.version}`} component="section">
      <Group justify="space-between" align="flex-end" wrap="wrap">
        <div>
          <Group gap="xs">
            <Title order={3} fz="lg">
              Version {estimate.version}
            </Title>
            {estimate.accepted ? <Badge color="green">Accepted</Badge> : null}
            <Badge color={estimate.costBasis === 'stock' ? 'teal' : 'gray'} variant="light">
              {costBasisLabels[estimate.costBasis]}
            </Badge>
          </Group>
          <Text size="sm" c="dimmed">
            {estimate.buildUp.name} · priced on {formatDate(estimate.pricedOn)} · made{' '}
            {formatDateTime(estimate.createdAt)}
            {estimate.createdBy ? ` by ${estimate.createdBy.name}` : ''}
          </Text>
        </div>
        <Text size="sm">
          Deck {formatArea(estimate.deckAreaM2)} · laminated {formatArea(estimate.laminatedAreaM2)} · catalyst{' '}
          {formatNumber(estimate.catalystPercent)} % at {formatNumber(estimate.airC)} °C
        </Text>
      </Group>
      {estimate.note ? <Text size="sm">Note: {estimate.note}</Text> : null}
      {estimate.costBasis === 'stock' ? (
        <Text size="sm" c="dimmed">
          Costed on stock: what the job could reserve for its date at the lots&apos; own cost, the rest at
          supplier prices. The quote shows only the price.
        </Text>
      ) : null}

      {estimate.unpriced > 0 ? (
        <Alert
          color="orange"
          variant="light"
          icon={<IconAlertTriangle size={18} />}
          title={`${estimate.unpriced} without a price`}
        >
          <Text size="sm">The total leaves these out until the catalogue has a price for them:</Text>
          <Stack gap={2} mt={4}>
            {estimate.problems.map((p) => (
              <Text key={p} size="sm">
                · {p}
              </Text>
            ))}
          </Stack>
        </Alert>
      ) : null}

      <Group justify="space-between" wrap="wrap">
        <Text fw={700}>Materials</Text>
        <Switch
          size="sm"
          label="Only lines without a price"
          checked={onlyUnpriced}
          onChange={(e) => {
            setOnlyUnpriced(e.currentTarget.checked);
            setPage(1);
          }}
        />
      </Group>
      <DataTable<EstimateMaterial>
        withTableBorder
        borderRadius="md"
        verticalSpacing="xs"
        minHeight={records.length === 0 ? 160 : undefined}
        records={records}
        idAccessor="position"
        noRecordsText={onlyUnpriced ? 'Every line has a price.' : 'This estimate has no materials.'}
        sortStatus={sortStatus}
        onSortStatusChange={setSortStatus}
        totalRecords={rows.length}
        recordsPerPage={PAGE_SIZE}
        page={page}
        onPageChange={setPage}
        paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
        rowColor={(m) => (m.priced ? undefined : 'orange.9')}
        columns={[
          { accessor: 'position', title: '#', sortable: true, width: 48 },
          {
            accessor: 'material',
            title: 'Material',
            sortable: true,
            render: (m) => (
              <Stack gap={0}>
                <Text size="sm" fw={600}>
                  {m.material?.name ?? `No ${m.materialKind} in the catalogue`}
                </Text>
                {m.problem ? (
                  <Text size="xs" c="orange.9">
                    {m.problem}
                  </Text>
                ) : null}
              </Stack>
            ),
          },
          {
            accessor: 'quantity',
            title: 'Quantity',
            textAlign: 'right',
            render: (m) => formatQuantity(m.quantity, m.unit),
          },
          { accessor: 'packs', title: 'Packs', render: (m) => packsText(m) },
          { accessor: 'unitCost', title: 'Unit cost', render: (m) => packPriceText(m) },
          {
            accessor: 'cost',
            title: 'Line total',
            sortable: true,
            noWrap: true,
            textAlign: 'right',
            render: (m) =>
              m.priced ? (
                formatMoney(m.cost)
              ) : (
                <Badge
                  color="orange"
                  variant="outline"
                  size="sm"
                  leftSection={<IconAlertTriangle size={11} />}
                >
                  No price
                </Badge>
              ),
          },
        ]}
      />

      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
        <Paper withBorder p="md" radius="md">
          <Table verticalSpacing={6} aria-label="Price">
            <Table.Tbody>
              <Table.Tr>
                <Table.Td>Materials{estimate.unpriced > 0 ? ' (priced lines)' : ''}</Table.Td>
                <Table.Td ta="right">{formatMoney(price.materialCost)}</Table.Td>
              </Table.Tr>
              <Table.Tr>
                <Table.Td>
                  Labour: {formatNumber(labour.totalHours)} h × {formatMoney(labour.rate)}
                </Table.Td>
                <Table.Td ta="right">{formatMoney(price.labourCost)}</Table.Td>
              </Table.Tr>
              <Table.Tr>
                <Table.Td>Markup {formatNumber(price.markupPct)} %</Table.Td>
                <Table.Td ta="right">{formatMoney(price.markup)}</Table.Td>
              </Table.Tr>
              <Table.Tr>
                <Table.Td fw={700}>Net</Table.Td>
                <Table.Td ta="right" fw={700}>
                  {formatMoney(price.net)}
                </Table.Td>
              </Table.Tr>
              <Table.Tr>
                <Table.Td>VAT {formatNumber(price.vatRatePct)} %</Table.Td>
                <Table.Td ta="right">{formatMoney(price.vat)}</Table.Td>
              </Table.Tr>
              <Table.Tr>
                <Table.Td fw={800} fz="lg">
                  Total
                </Table.Td>
                <Table.Td ta="right" fw={800} fz="lg" data-testid="estimate-total">
                  {formatMoney(price.gross)}
                </Table.Td>
              </Table.Tr>
            </Table.Tbody>
          </Table>
        </Paper>
        <Paper withBorder p="md" radius="md">
          <Text fw={700} mb="xs">
            Labour
          </Text>
          <Text size="sm">
            Laminating {formatNumber(labour.laminatingHours)} h · trims {formatNumber(labour.trimHours)} h ·
            total {formatNumber(labour.totalHours)} h at {formatMoney(labour.rate)} an hour ={' '}
            {formatMoney(labour.cost)}
          </Text>
          <Text size="sm" c="dimmed" mt="xs">
            {formatNumber(estimate.trimM)} m of trim · corner pieces {estimate.corners.external} external,{' '}
            {estimate.corners.internal} internal · {estimate.pipes} pipe{estimate.pipes === 1 ? '' : 's'} ·{' '}
            {estimate.outlets} outlet{estimate.outlets === 1 ? '' : 's'}
          </Text>
        </Paper>
      </SimpleGrid>

      <Accordion variant="contained" radius="md">
        <Accordion.Item value="takeoff">
          <Accordion.Control>
            Take-off from the costing engine ({estimate.lines.length} lines)
          </Accordion.Control>
          <Accordion.Panel>
            <Table verticalSpacing={4} fz="sm">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Line</Table.Th>
                  <Table.Th ta="right">Quantity</Table.Th>
                  <Table.Th>Material</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {estimate.lines.map((line) => (
                  <Table.Tr key={line.position}>
                    <Table.Td>{line.description}</Table.Td>
                    <Table.Td ta="right">{formatQuantity(line.quantity, line.unit)}</Table.Td>
                    <Table.Td>{line.material?.name ?? '—'}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Accordion.Panel>
        </Accordion.Item>
      </Accordion>

      <CautionsList cautions={estimate.cautions} title="Cautions for this job" />
    </Stack>
  );
}
