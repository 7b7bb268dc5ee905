import {
  Button,
  CloseButton,
  Group,
  MultiSelect,
  SegmentedControl,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { MATERIAL_KINDS, type MaterialKind } from '@potlife/domain';
import { IconDownload, IconFileImport, IconPlus, IconSearch } from '@tabler/icons-react';
import type { DataTableSortStatus } from 'mantine-datatable';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { paths } from '../../../config/paths';
import { materialKindLabels } from '../../../lib/material-words';
import { useSessionUser } from '../../../lib/session';
import { useExportMaterials } from '../api/export-materials';
import { useMaterials } from '../api/get-materials';
import { useSetMaterialActive } from '../api/save-material';
import type { Material } from '../api/types';
import { canEditCatalogue } from '../components/can-edit';
import { MaterialFormModal } from '../components/MaterialFormModal';
import { isMaterialSort, MATERIAL_PAGE_SIZES, MaterialsTable } from '../components/MaterialsTable';

const kindOptions = MATERIAL_KINDS.map((kind) => ({ value: kind, label: materialKindLabels[kind] }));
type ActiveFilter = 'true' | 'false' | 'all';

export function CatalogueRoute() {
  const user = useSessionUser();
  const canEdit = canEditCatalogue(user.role);
  const [query, setQuery] = useState('');
  const [debouncedQuery] = useDebouncedValue(query, 300);
  const [kinds, setKinds] = useState<MaterialKind[]>([]);
  const [active, setActive] = useState<ActiveFilter>('true');
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(MATERIAL_PAGE_SIZES[0] ?? 25);
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<Material>>({
    columnAccessor: 'code',
    direction: 'asc',
  });
  const [formOpened, formModal] = useDisclosure(false);
  const [editing, setEditing] = useState<Material | undefined>(undefined);

  const sort = String(sortStatus.columnAccessor);
  const materials = useMaterials({
    q: debouncedQuery,
    kind: kinds,
    active,
    sort: isMaterialSort(sort) ? sort : 'code',
    order: sortStatus.direction,
    page,
    pageSize,
  });
  const exporter = useExportMaterials();
  const setMaterialActive = useSetMaterialActive();

  const openForm = (material?: Material) => {
    setEditing(material);
    formModal.open();
  };

  const confirmActive = (material: Material, makeActive: boolean) => {
    const save = () =>
      setMaterialActive.mutate(
        { id: material.id, active: makeActive },
        {
          onSuccess: (saved) =>
            notifications.show({
              color: 'green',
              message: makeActive ? `${saved.code} is back in the catalogue.` : `${saved.code} is archived.`,
            }),
        },
      );
    if (makeActive) {
      save();
      return;
    }
    modals.openConfirmModal({
      title: `Archive ${material.code} ${material.name}?`,
      children: (
        <Text size="sm">
          It leaves the lists of materials to buy and receive. Its lots, prices and history stay, and you can
          restore it from &quot;Archived&quot;.
        </Text>
      ),
      labels: { confirm: 'Archive', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: save,
    });
  };

  const filtered = debouncedQuery.trim() !== '' || kinds.length > 0 || active !== 'true';
  const emptyText = filtered
    ? 'No material matches these filters. Clear the search or choose other kinds.'
    : canEdit
      ? 'The catalogue is empty. Add a material, or import your list from a CSV file.'
      : 'The catalogue is empty. Ask the owner or estimator to add the materials you stock.';

  return (
    <>
      <PageHeader
        title="Catalogue"
        description={
          canEdit
            ? 'Every material the company stocks: its packs, shelf life, storage and hazard. Suppliers price these materials.'
            : 'Every material the company stocks: its packs, shelf life, storage and hazard. The owner and estimator keep it up to date.'
        }
        actions={
          <>
            <Button
              variant="default"
              leftSection={<IconDownload size={18} />}
              loading={exporter.isPending}
              onClick={() =>
                exporter.mutate(
                  { q: debouncedQuery, kind: kinds, active },
                  {
                    onSuccess: () =>
                      notifications.show({ color: 'green', message: 'The catalogue CSV is downloaded.' }),
                  },
                )
              }
            >
              Export CSV
            </Button>
            {canEdit ? (
              <>
                <Button
                  component={Link}
                  to={paths.catalogueImport}
                  variant="default"
                  leftSection={<IconFileImport size={18} />}
                >
                  Import CSV
                </Button>
                <Button leftSection={<IconPlus size={18} />} onClick={() => openForm()}>
                  Add a material
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <Stack gap="sm">
        <Group gap="sm" align="flex-end" wrap="wrap">
          <TextInput
            aria-label="Search materials"
            placeholder="Search by code or name"
            leftSection={<IconSearch size={16} />}
            value={query}
            onChange={(event) => {
              setQuery(event.currentTarget.value);
              setPage(1);
            }}
            rightSection={
              query ? <CloseButton aria-label="Clear the search" onClick={() => setQuery('')} /> : null
            }
            w={{ base: '100%', sm: 300 }}
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
            searchable
            w={{ base: '100%', sm: 320 }}
            size="sm"
          />
          <SegmentedControl
            size="sm"
            aria-label="In use or archived"
            value={active}
            onChange={(value) => {
              setActive(value as ActiveFilter);
              setPage(1);
            }}
            data={[
              { value: 'true', label: 'In use' },
              { value: 'false', label: 'Archived' },
              { value: 'all', label: 'All' },
            ]}
          />
        </Group>
        {materials.isPending ? (
          <PageLoader label="Loading the catalogue…" />
        ) : materials.isError ? (
          <QueryError
            what="the catalogue"
            error={materials.error}
            onRetry={() => void materials.refetch()}
            retrying={materials.isFetching}
          />
        ) : (
          <MaterialsTable
            materials={materials.data.items}
            total={materials.data.total}
            page={page}
            pageSize={pageSize}
            onPageChange={setPage}
            onPageSizeChange={(size) => {
              setPageSize(size);
              setPage(1);
            }}
            sortStatus={sortStatus}
            onSortStatusChange={(status) => {
              setSortStatus(status);
              setPage(1);
            }}
            fetching={materials.isFetching && materials.isPlaceholderData}
            emptyText={emptyText}
            canEdit={canEdit}
            onEdit={openForm}
            onSetActive={confirmActive}
            busyId={setMaterialActive.isPending ? setMaterialActive.variables.id : undefined}
          />
        )}
      </Stack>
      {canEdit ? (
        <MaterialFormModal opened={formOpened} onClose={formModal.close} material={editing} />
      ) : null}
    </>
  );
}
