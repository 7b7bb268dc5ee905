import { Button, Card, CloseButton, Group, MultiSelect, Stack, Text, TextInput, Title } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { MATERIAL_KINDS, type MaterialKind } from '@potlife/domain';
import { IconDownload, IconFileImport, IconPlus, IconSearch } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useState } from 'react';
import { QueryError } from '../../../components/QueryError';
import { formatMoney } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { materialKindLabels, unitLabel } from '../../../lib/material-words';
import { useSupplierPrices } from '../api/get-supplier-prices';
import { useExportPrices } from '../api/price-csv';
import { PRICE_SORTS, type PriceSort, type Supplier, type SupplierPrice } from '../api/types';
import { PriceFormModal } from './PriceFormModal';
import { PriceHistory } from './PriceHistory';
import { PriceImportModal } from './PriceImportModal';

const PAGE_SIZE = 25;
const kindOptions = MATERIAL_KINDS.map((kind) => ({ value: kind, label: materialKindLabels[kind] }));
const isSort = (value: string): value is PriceSort => (PRICE_SORTS as readonly string[]).includes(value);

export function PricesCard({ supplier, canEdit }: { supplier: Supplier; canEdit: boolean }) {
  const [query, setQuery] = useState('');
  const [debounced] = useDebouncedValue(query, 300);
  const [kinds, setKinds] = useState<MaterialKind[]>([]);
  const [on, setOn] = useState('');
  const [page, setPage] = useState(1);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<SupplierPrice>>({
    columnAccessor: 'materialCode',
    direction: 'asc',
  });
  const [expanded, setExpanded] = useState<string[]>([]);
  const [priceOpened, priceModal] = useDisclosure(false);
  const [importOpened, importModal] = useDisclosure(false);
  const [initial, setInitial] = useState<
    { materialId: string; packSize: string; supplierCode: string | null } | undefined
  >();
  const exporter = useExportPrices();
  const sort = String(sortStatus.columnAccessor);
  const prices = useSupplierPrices(supplier.id, {
    q: debounced,
    kind: kinds,
    on: /^\d{4}-\d{2}-\d{2}$/.test(on) ? on : undefined,
    sort: isSort(sort) ? sort : 'materialCode',
    order: sortStatus.direction,
    page,
    pageSize: PAGE_SIZE,
  });

  const newPrice = (price?: SupplierPrice) => {
    setInitial(
      price
        ? { materialId: price.materialId, packSize: price.packSize, supplierCode: price.supplierCode }
        : undefined,
    );
    priceModal.open();
  };

  const filtered = debounced.trim() !== '' || kinds.length > 0;
  const emptyText = filtered
    ? 'No price matches. Clear the search or the kinds.'
    : canEdit
      ? `No prices from ${supplier.name} yet. Add one, or import their price list from a CSV file.`
      : `No prices from ${supplier.name} yet. The owner or estimator enters them.`;

  return (
    <Card>
      <Group justify="space-between" mb="sm" wrap="wrap" gap="sm">
        <div>
          <Title order={2} fz="lg">
            Prices
          </Title>
          <Text size="sm" c="dimmed">
            Per pack, net of VAT{prices.data ? `, in force on ${formatDate(prices.data.on)}` : ''}. Open a row
            for its history.
          </Text>
        </div>
        <Group gap="xs">
          <Button
            variant="default"
            size="sm"
            leftSection={<IconDownload size={16} />}
            loading={exporter.isPending}
            onClick={() =>
              exporter.mutate(
                { supplierId: supplier.id, supplierName: supplier.name },
                {
                  onSuccess: () =>
                    notifications.show({ color: 'green', message: 'The price list CSV is downloaded.' }),
                },
              )
            }
          >
            Export CSV
          </Button>
          {canEdit ? (
            <>
              <Button
                variant="default"
                size="sm"
                leftSection={<IconFileImport size={16} />}
                onClick={importModal.open}
              >
                Import CSV
              </Button>
              <Button size="sm" leftSection={<IconPlus size={16} />} onClick={() => newPrice()}>
                Add a price
              </Button>
            </>
          ) : null}
        </Group>
      </Group>
      <Stack gap="sm">
        <Group gap="sm" wrap="wrap" align="flex-end">
          <TextInput
            aria-label="Search prices"
            placeholder="Search by material code or name"
            leftSection={<IconSearch size={16} />}
            value={query}
            onChange={(event) => {
              setQuery(event.currentTarget.value);
              setPage(1);
            }}
            rightSection={
              query ? <CloseButton aria-label="Clear the search" onClick={() => setQuery('')} /> : null
            }
            w={{ base: '100%', sm: 280 }}
            size="sm"
          />
          <MultiSelect
            aria-label="Kind"
            placeholder={kinds.length === 0 ? 'Every kind' : undefined}
            data={kindOptions}
            value={kinds}
            onChange={(value) => {
              setKinds(value as MaterialKind[]);
              setPage(1);
            }}
            clearable
            w={{ base: '100%', sm: 280 }}
            size="sm"
          />
          <TextInput
            label="Prices on"
            type="date"
            size="sm"
            value={on}
            onChange={(event) => {
              setOn(event.currentTarget.value);
              setPage(1);
            }}
            w={170}
          />
        </Group>
        {prices.isError ? (
          <QueryError
            what="the prices"
            error={prices.error}
            onRetry={() => void prices.refetch()}
            retrying={prices.isFetching}
          />
        ) : (
          <DataTable<SupplierPrice>
            withTableBorder
            borderRadius="md"
            verticalSpacing="xs"
            minHeight={(prices.data?.items.length ?? 0) === 0 ? 180 : undefined}
            fetching={prices.isPending || (prices.isFetching && prices.isPlaceholderData)}
            records={prices.data?.items ?? []}
            noRecordsText={emptyText}
            sortStatus={sortStatus}
            onSortStatusChange={(status) => {
              setSortStatus(status);
              setPage(1);
            }}
            totalRecords={prices.data?.total ?? 0}
            recordsPerPage={PAGE_SIZE}
            page={page}
            onPageChange={setPage}
            paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
            rowExpansion={{
              allowMultiple: true,
              expanded: { recordIds: expanded, onRecordIdsChange: setExpanded },
              content: ({ record }) => <PriceHistory price={record} />,
            }}
            columns={[
              {
                accessor: 'materialCode',
                title: 'Code',
                sortable: true,
                noWrap: true,
                render: (price) => (
                  <Text size="sm" ff="monospace" fw={600}>
                    {price.materialCode}
                  </Text>
                ),
              },
              { accessor: 'materialName', title: 'Material', sortable: true },
              {
                accessor: 'packSize',
                title: 'Pack',
                sortable: true,
                render: (price) => price.packLabel ?? `${price.packSize} ${unitLabel(price.stockUnit)}`,
              },
              {
                accessor: 'packPrice',
                title: 'Per pack',
                sortable: true,
                textAlign: 'right',
                render: (price) => formatMoney(price.packPrice),
              },
              {
                accessor: 'unitPrice',
                title: 'Per unit',
                sortable: true,
                textAlign: 'right',
                visibleMediaQuery: '(min-width: 48em)',
                render: (price) => `${formatMoney(price.unitPrice)} / ${unitLabel(price.stockUnit)}`,
              },
              {
                accessor: 'validFrom',
                title: 'Since',
                sortable: true,
                render: (price) => (
                  <Text size="sm">
                    {formatDate(price.validFrom)}
                    {price.previous ? (
                      <Text span size="xs" c="dimmed">
                        {' '}
                        (was {formatMoney(price.previous.packPrice)})
                      </Text>
                    ) : null}
                  </Text>
                ),
              },
              {
                accessor: 'next',
                title: 'Next',
                visibleMediaQuery: '(min-width: 62em)',
                render: (price) =>
                  price.next
                    ? `${formatMoney(price.next.packPrice)} from ${formatDate(price.next.validFrom)}`
                    : '—',
              },
              ...(canEdit
                ? [
                    {
                      accessor: 'actions',
                      title: '',
                      textAlign: 'right' as const,
                      render: (price: SupplierPrice) => (
                        <Button
                          size="xs"
                          variant="subtle"
                          onClick={(event) => {
                            event.stopPropagation();
                            newPrice(price);
                          }}
                          aria-label={`New price for ${price.materialCode} ${price.packLabel ?? price.packSize}`}
                        >
                          New price
                        </Button>
                      ),
                    },
                  ]
                : []),
            ]}
          />
        )}
      </Stack>
      {canEdit ? (
        <>
          <PriceFormModal
            supplierId={supplier.id}
            supplierName={supplier.name}
            opened={priceOpened}
            onClose={priceModal.close}
            initial={initial}
          />
          <PriceImportModal
            supplierId={supplier.id}
            supplierName={supplier.name}
            opened={importOpened}
            onClose={importModal.close}
          />
        </>
      ) : null}
    </Card>
  );
}
