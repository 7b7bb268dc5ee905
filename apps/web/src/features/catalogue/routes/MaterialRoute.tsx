import { Badge, Button, Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconArchive, IconArrowBackUp, IconArrowLeft, IconPackages, IconPencil } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { CautionsList } from '../../../components/CautionsList';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs, paths } from '../../../config/paths';
import { formatQuantity } from '../../../lib/amounts';
import { formatDateTime } from '../../../lib/format';
import { hazardClassLabels, materialKindLabel, trimKindLabels, unitLabel } from '../../../lib/material-words';
import { useSessionUser } from '../../../lib/session';
import { useMaterial } from '../api/get-material';
import { useSetMaterialActive } from '../api/save-material';
import { trimPieceLabels, type Material } from '../api/types';
import { canEditCatalogue } from '../components/can-edit';
import { MaterialFormModal } from '../components/MaterialFormModal';
import { MaterialPricesCard } from '../components/MaterialPricesCard';
import { packsText, storageText } from '../components/storage-text';

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

function kindFacts(material: Material): ReactNode {
  switch (material.kind) {
    case 'mat':
    case 'bandage':
      return (
        <>
          <Fact label="Weight">{material.matGsm === null ? '—' : `${material.matGsm} g/m²`}</Fact>
          <Fact label="Roll width">{material.rollWidthM === null ? '—' : `${material.rollWidthM} m`}</Fact>
        </>
      );
    case 'trim':
      return (
        <>
          <Fact label="Trim kind">{material.trimKind ? trimKindLabels[material.trimKind] : '—'}</Fact>
          <Fact label="Length">{material.trimLengthM === null ? '—' : `${material.trimLengthM} m`}</Fact>
          <Fact label="Piece">{trimPieceLabels[material.trimPiece ?? 'length']}</Fact>
        </>
      );
    case 'topcoat':
      return <Fact label="Colour">{material.topcoatColour ?? '—'}</Fact>;
    default:
      return null;
  }
}

export function MaterialRoute() {
  const { materialId = '' } = useParams();
  const user = useSessionUser();
  const canEdit = canEditCatalogue(user.role);
  const material = useMaterial(materialId);
  const setActive = useSetMaterialActive();
  const [formOpened, formModal] = useDisclosure(false);

  if (material.isPending) {
    return <PageLoader label="Loading the material…" />;
  }
  if (material.isError) {
    return (
      <QueryError
        what="the material"
        error={material.error}
        onRetry={() => void material.refetch()}
        retrying={material.isFetching}
      />
    );
  }
  const m = material.data;

  const archive = () =>
    modals.openConfirmModal({
      title: `Archive ${m.code} ${m.name}?`,
      children: (
        <Text size="sm">
          It leaves the lists of materials to buy and receive. Its lots, prices and history stay, and you can
          restore it later.
        </Text>
      ),
      labels: { confirm: 'Archive', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        setActive.mutate(
          { id: m.id, active: false },
          { onSuccess: () => notifications.show({ color: 'green', message: `${m.code} is archived.` }) },
        ),
    });

  return (
    <>
      <PageHeader
        title={`${m.code} ${m.name}`}
        description={
          <>
            {materialKindLabel(m.kind)}, stocked in {unitLabel(m.stockUnit)}. Last changed{' '}
            {formatDateTime(m.updatedAt)}.
          </>
        }
        actions={
          <>
            <Button
              component={Link}
              to={paths.catalogue}
              variant="default"
              leftSection={<IconArrowLeft size={18} />}
            >
              Catalogue
            </Button>
            <Button
              component={Link}
              to={hrefs.stockView('lot', { material: m.id })}
              variant="default"
              leftSection={<IconPackages size={18} />}
            >
              Its lots in stock
            </Button>
            {canEdit ? (
              <>
                {m.active ? (
                  <Button
                    variant="default"
                    color="red"
                    leftSection={<IconArchive size={18} />}
                    loading={setActive.isPending}
                    onClick={archive}
                  >
                    Archive
                  </Button>
                ) : (
                  <Button
                    variant="default"
                    leftSection={<IconArrowBackUp size={18} />}
                    loading={setActive.isPending}
                    onClick={() =>
                      setActive.mutate(
                        { id: m.id, active: true },
                        {
                          onSuccess: () =>
                            notifications.show({
                              color: 'green',
                              message: `${m.code} is back in the catalogue.`,
                            }),
                        },
                      )
                    }
                  >
                    Restore
                  </Button>
                )}
                <Button leftSection={<IconPencil size={18} />} onClick={formModal.open}>
                  Change
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <Stack gap="lg" maw={1100}>
        {m.active ? null : (
          <Badge
            color="gray"
            variant="outline"
            size="lg"
            styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
          >
            Archived: not offered for buying or receiving
          </Badge>
        )}
        <Card>
          <Title order={2} fz="lg" mb="sm">
            Details
          </Title>
          <SimpleGrid cols={{ base: 1, xs: 2, md: 3 }} spacing="md">
            <Fact label="Packs">{packsText(m)}</Fact>
            <Fact label="Lots">
              {m.lotTracked ? 'Tracked: batch number and expiry per lot' : 'Not tracked'}
            </Fact>
            <Fact label="Shelf life">
              {m.shelfLifeDays === null ? 'None given' : `${m.shelfLifeDays} days from receipt`}
            </Fact>
            <Fact label="Storage">{storageText(m)}</Fact>
            <Fact label="Hazard">
              {hazardClassLabels[m.hazardClass]}
              {m.unNumber ? `, UN ${m.unNumber}` : ''}
              {m.packingGroup ? `, packing group ${m.packingGroup}` : ''}
            </Fact>
            {m.flashPointC !== null ? <Fact label="Flash point">{m.flashPointC} °C</Fact> : null}
            {m.isAccelerator ? <Fact label="Accelerator">Yes: kept apart from peroxide catalyst</Fact> : null}
            {m.litresPerKg !== null ? <Fact label="Litres per kg">{m.litresPerKg}</Fact> : null}
            {kindFacts(m)}
            <Fact label="Reorder">
              At {formatQuantity(m.reorderLevel, m.stockUnit)}, order{' '}
              {formatQuantity(m.reorderQuantity, m.stockUnit)}
            </Fact>
          </SimpleGrid>
          {m.notes ? (
            <Group mt="md">
              <Fact label="Notes">{m.notes}</Fact>
            </Group>
          ) : null}
        </Card>
        <CautionsList kinds={[m.kind]} where="store" title="Handling and storing it" />
        <MaterialPricesCard materialId={m.id} />
      </Stack>
      {canEdit ? <MaterialFormModal opened={formOpened} onClose={formModal.close} material={m} /> : null}
    </>
  );
}
