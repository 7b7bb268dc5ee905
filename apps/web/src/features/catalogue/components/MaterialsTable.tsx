import { Badge, Button, Group, Text } from '@mantine/core';
import { IconArchive, IconArrowBackUp, IconPencil } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useNavigate } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import { hazardShort, unitLabel } from '../../../lib/material-words';
import { trimPieceLabels, type Material, type MaterialSort } from '../api/types';
import { MaterialKindBadge } from './MaterialKindBadge';
import { packsText, storageText } from './storage-text';

export const MATERIAL_PAGE_SIZES = [25, 50, 100];

interface MaterialsTableProps {
  materials: Material[];
  total: number;
  page: number;
  pageSize: number;
  onPageChange: (page: number) => void;
  onPageSizeChange: (size: number) => void;
  sortStatus: DataTableSortStatus<Material>;
  onSortStatusChange: (status: DataTableSortStatus<Material>) => void;
  fetching: boolean;
  emptyText: string;
  canEdit: boolean;
  onEdit: (material: Material) => void;
  onSetActive: (material: Material, active: boolean) => void;
  busyId?: string;
}

export function isMaterialSort(value: string): value is MaterialSort {
  return [
    'code',
    'name',
    'kind',
    'stockUnit',
    'shelfLifeDays',
    'hazardClass',
    'createdAt',
    'updatedAt',
  ].includes(value);
}

export function MaterialsTable({
  materials,
  total,
  page,
  pageSize,
  onPageChange,
  onPageSizeChange,
  sortStatus,
  onSortStatusChange,
  fetching,
  emptyText,
  canEdit,
  onEdit,
  onSetActive,
  busyId,
}: MaterialsTableProps) {
  const navigate = useNavigate();
  return (
    <DataTable<Material>
      withTableBorder
      borderRadius="lg"
      highlightOnHover
      verticalSpacing="sm"
      minHeight={materials.length === 0 ? 220 : undefined}
      fetching={fetching}
      records={materials}
      idAccessor="id"
      noRecordsText={emptyText}
      sortStatus={sortStatus}
      onSortStatusChange={onSortStatusChange}
      totalRecords={total}
      recordsPerPage={pageSize}
      page={page}
      onPageChange={onPageChange}
      recordsPerPageOptions={MATERIAL_PAGE_SIZES}
      onRecordsPerPageChange={onPageSizeChange}
      recordsPerPageLabel="Materials per page"
      paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
      onRowClick={({ record }) => void navigate(hrefs.material(record.id))}
      columns={[
        {
          accessor: 'code',
          title: 'Code',
          sortable: true,
          noWrap: true,
          render: (material) => (
            <Text size="sm" fw={700} ff="monospace">
              {material.code}
            </Text>
          ),
        },
        {
          accessor: 'name',
          title: 'Name',
          sortable: true,
          render: (material) => (
            <Group gap={6} wrap="nowrap">
              <Text size="sm">{material.name}</Text>
              {material.kind === 'trim' ? (
                <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
                  {trimPieceLabels[material.trimPiece ?? 'length']}
                </Text>
              ) : null}
              {material.active ? null : (
                <Badge
                  color="gray"
                  variant="outline"
                  size="sm"
                  styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
                >
                  Archived
                </Badge>
              )}
            </Group>
          ),
        },
        {
          accessor: 'kind',
          title: 'Kind',
          noWrap: true,
          sortable: true,
          render: (material) => <MaterialKindBadge kind={material.kind} />,
        },
        {
          accessor: 'stockUnit',
          title: 'Unit',
          sortable: true,
          render: (material) => unitLabel(material.stockUnit),
        },
        {
          accessor: 'packSizes',
          title: 'Packs',
          visibleMediaQuery: '(min-width: 62em)',
          render: (material) => packsText(material),
        },
        {
          accessor: 'shelfLifeDays',
          title: 'Shelf life',
          noWrap: true,
          sortable: true,
          visibleMediaQuery: '(min-width: 48em)',
          render: (material) => (material.shelfLifeDays === null ? '—' : `${material.shelfLifeDays} days`),
        },
        {
          accessor: 'storage',
          title: 'Storage',
          noWrap: true,
          visibleMediaQuery: '(min-width: 62em)',
          render: (material) => storageText(material),
        },
        {
          accessor: 'hazardClass',
          title: 'Hazard',
          sortable: true,
          render: (material) => hazardShort(material.hazardClass),
        },
        ...(canEdit
          ? [
              {
                accessor: 'actions',
                title: 'Actions',
                textAlign: 'right' as const,
                render: (material: Material) => (
                  <Group
                    gap={4}
                    justify="flex-end"
                    wrap="nowrap"
                    onClick={(event) => event.stopPropagation()}
                  >
                    <Button
                      size="xs"
                      variant="subtle"
                      leftSection={<IconPencil size={14} />}
                      aria-label={`Change ${material.code}`}
                      onClick={() => onEdit(material)}
                    >
                      Change
                    </Button>
                    <Button
                      size="xs"
                      variant="subtle"
                      color={material.active ? 'red' : 'green'}
                      leftSection={
                        material.active ? <IconArchive size={14} /> : <IconArrowBackUp size={14} />
                      }
                      loading={busyId === material.id}
                      aria-label={`${material.active ? 'Archive' : 'Restore'} ${material.code}`}
                      onClick={() => onSetActive(material, !material.active)}
                    >
                      {material.active ? 'Archive' : 'Restore'}
                    </Button>
                  </Group>
                ),
              },
            ]
          : []),
      ]}
    />
  );
}
