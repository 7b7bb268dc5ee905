import { Anchor, Badge, Card, Group, Stack, Table, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { QueryError } from '../../../components/QueryError';
import { PageLoader } from '../../../components/PageLoader';
import { hrefs } from '../../../config/paths';
import { formatMoney } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { unitLabel } from '../../../lib/material-words';
import { useMaterialPrices } from '../api/get-material-prices';

/** Every supplier's price in force for each pack of one material, cheapest first, with earlier prices under each. */
export function MaterialPricesCard({ materialId }: { materialId: string }) {
  const prices = useMaterialPrices(materialId);
  return (
    <Card>
      <Title order={2} fz="lg" mb="xs">
        Prices
      </Title>
      {prices.isPending ? (
        <PageLoader label="Loading prices…" />
      ) : prices.isError ? (
        <QueryError
          what="the prices"
          error={prices.error}
          onRetry={() => void prices.refetch()}
          retrying={prices.isFetching}
        />
      ) : prices.data.packs.every((pack) => pack.prices.length === 0) ? (
        <Text size="sm" c="dimmed">
          No supplier has a price for this material yet. Add one on the supplier&apos;s page, or import their
          price list there.
        </Text>
      ) : (
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            In force on {formatDate(prices.data.on)}, net of VAT, cheapest first.
          </Text>
          {prices.data.packs
            .filter((pack) => pack.prices.length > 0)
            .map((pack) => (
              <Stack key={pack.packSize} gap={6}>
                <Text fw={700} size="sm">
                  {pack.packLabel ?? `${pack.packSize} ${unitLabel(prices.data.material.stockUnit)}`}
                </Text>
                <Table.ScrollContainer minWidth={560}>
                  <Table withTableBorder fz="sm" verticalSpacing={6}>
                    <Table.Thead>
                      <Table.Tr>
                        <Table.Th>Supplier</Table.Th>
                        <Table.Th ta="right">Per pack</Table.Th>
                        <Table.Th ta="right">Per {unitLabel(prices.data.material.stockUnit)}</Table.Th>
                        <Table.Th>Since</Table.Th>
                        <Table.Th>Earlier prices</Table.Th>
                      </Table.Tr>
                    </Table.Thead>
                    <Table.Tbody>
                      {pack.prices.map((price, index) => (
                        <Table.Tr key={price.id}>
                          <Table.Td>
                            <Group gap={6}>
                              <Anchor component={Link} to={hrefs.supplier(price.supplierId)} size="sm">
                                {price.supplierName}
                              </Anchor>
                              {index === 0 && pack.prices.length > 1 ? (
                                <Badge
                                  size="sm"
                                  color="green"
                                  styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                                >
                                  Cheapest
                                </Badge>
                              ) : null}
                              {price.supplierActive ? null : (
                                <Badge
                                  size="sm"
                                  color="gray"
                                  variant="outline"
                                  styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                                >
                                  Archived supplier
                                </Badge>
                              )}
                            </Group>
                          </Table.Td>
                          <Table.Td ta="right">{formatMoney(price.packPrice)}</Table.Td>
                          <Table.Td ta="right">{formatMoney(price.unitPrice)}</Table.Td>
                          <Table.Td>{formatDate(price.validFrom)}</Table.Td>
                          <Table.Td>
                            {(price.history ?? []).filter((entry) => entry.id !== price.id).length === 0 ? (
                              <Text size="sm" c="dimmed">
                                —
                              </Text>
                            ) : (
                              <Text size="sm">
                                {(price.history ?? [])
                                  .filter((entry) => entry.id !== price.id)
                                  .slice(0, 3)
                                  .map(
                                    (entry) =>
                                      `${formatMoney(entry.packPrice)} from ${formatDate(entry.validFrom)}`,
                                  )
                                  .join('; ')}
                              </Text>
                            )}
                          </Table.Td>
                        </Table.Tr>
                      ))}
                    </Table.Tbody>
                  </Table>
                </Table.ScrollContainer>
              </Stack>
            ))}
        </Stack>
      )}
    </Card>
  );
}
