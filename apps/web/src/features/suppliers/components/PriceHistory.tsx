import { Loader, Table, Text } from '@mantine/core';
import { formatMoney } from '../../../lib/amounts';
import { formatDate, formatDateTime } from '../../../lib/format';
import { usePriceHistory } from '../api/get-price-history';
import type { SupplierPrice } from '../api/types';

/** Every price this supplier has had for one pack, newest first (under a row of the prices table). */
export function PriceHistory({ price }: { price: SupplierPrice }) {
  const history = usePriceHistory(price.supplierId, price.materialId);
  if (history.isPending) {
    return <Loader size="sm" m="sm" aria-label="Loading the history" />;
  }
  if (history.isError) {
    return (
      <Text size="sm" c="red" p="sm">
        The history could not be loaded: {history.error.message}
      </Text>
    );
  }
  const rows = history.data[price.packSize] ?? [];
  if (rows.length === 0) {
    return (
      <Text size="sm" c="dimmed" p="sm">
        No other price for this pack.
      </Text>
    );
  }
  return (
    <Table
      fz="sm"
      verticalSpacing={4}
      mx="md"
      my="xs"
      maw={640}
      aria-label={`Price history of ${price.materialCode} ${price.packLabel ?? price.packSize}`}
    >
      <Table.Thead>
        <Table.Tr>
          <Table.Th>From</Table.Th>
          <Table.Th ta="right">Per pack</Table.Th>
          <Table.Th>Their code</Table.Th>
          <Table.Th>Entered</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {rows.map((entry) => (
          <Table.Tr key={entry.id} fw={entry.id === price.id ? 700 : undefined}>
            <Table.Td>
              {formatDate(entry.validFrom)}
              {entry.id === price.id ? ' (in force)' : ''}
            </Table.Td>
            <Table.Td ta="right">{formatMoney(entry.packPrice)}</Table.Td>
            <Table.Td>{entry.supplierCode ?? '—'}</Table.Td>
            <Table.Td>{formatDateTime(entry.createdAt)}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
