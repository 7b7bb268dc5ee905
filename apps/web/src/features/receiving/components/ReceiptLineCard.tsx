import { ActionIcon, Group, Paper, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { expiryDate } from '@potlife/domain';
import { IconTrash } from '@tabler/icons-react';
import { formatQuantity } from '../../../lib/amounts';
import { formatDate } from '../../../lib/format';
import { hazardShort, unitLabel } from '../../../lib/material-words';
import type { LocationChoice, MaterialChoice } from '../api/get-choices';
import { lineQuantity, type ReceiptValues } from './receipt-form';

interface ReceiptLineCardProps {
  form: UseFormReturnType<ReceiptValues>;
  index: number;
  materials: MaterialChoice[];
  locations: LocationChoice[];
  canRemove: boolean;
}

/** One line of a delivery: what, which batch, how many packs (taken in and refused), at what cost, put where. */
export function ReceiptLineCard({ form, index, materials, locations, canRemove }: ReceiptLineCardProps) {
  const line = form.values.lines[index];
  if (!line) {
    return null;
  }
  const at = (field: string) => `lines.${index}.${field}`;
  const material = materials.find((m) => m.id === line.materialId);
  const unit = material ? unitLabel(material.stockUnit) : '';
  const computedExpiry =
    material?.shelfLifeDays && /^\d{4}-\d{2}-\d{2}$/.test(form.values.receivedOn)
      ? expiryDate(form.values.receivedOn, material.shelfLifeDays)
      : null;
  const quantity = lineQuantity(line);
  const refused = Number(line.packsRefused.trim() || '0') > 0;

  return (
    <Paper
      withBorder
      p="md"
      radius="md"
      component="fieldset"
      style={{ border: undefined }}
      aria-label={`Line ${index + 1}`}
    >
      <Stack gap="sm">
        <Group justify="space-between" wrap="nowrap">
          <Text fw={700} size="sm">
            Line {index + 1}
            {material ? ` · ${material.code}` : ''}
          </Text>
          <ActionIcon
            color="red"
            aria-label={`Remove line ${index + 1}`}
            disabled={!canRemove}
            onClick={() => form.removeListItem('lines', index)}
          >
            <IconTrash size={18} />
          </ActionIcon>
        </Group>
        <Select
          size="md"
          label="Material"
          placeholder="Choose a material"
          searchable
          data={materials.map((m) => ({ value: m.id, label: `${m.code} ${m.name}` }))}
          nothingFoundMessage="No material has that code or name"
          {...form.getInputProps(at('materialId'))}
          onChange={(value) => {
            form.setFieldValue(at('materialId'), value ?? '');
            const chosen = materials.find((m) => m.id === value);
            form.setFieldValue(
              at('packSize'),
              chosen?.packSizes.length === 1 ? (chosen.packSizes[0]?.size ?? '') : '',
            );
          }}
        />
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
          <TextInput
            label="Batch number"
            description={material && !material.lotTracked ? 'Optional: not lot-tracked' : 'From the pack'}
            autoCapitalize="characters"
            {...form.getInputProps(at('batchNumber'))}
          />
          <TextInput
            label="Expiry date"
            type="date"
            description={
              computedExpiry
                ? `Left empty: ${formatDate(computedExpiry)} (${material?.shelfLifeDays} days' shelf life)`
                : material
                  ? 'As printed on the packs'
                  : undefined
            }
            {...form.getInputProps(at('expiresOn'))}
          />
          <Select
            size="md"
            label="Pack"
            placeholder={material ? 'Choose a pack' : 'Choose the material first'}
            disabled={!material}
            data={(material?.packSizes ?? []).map((p) => ({
              value: p.size,
              label: `${p.label} (${p.size} ${unit})`,
            }))}
            {...form.getInputProps(at('packSize'))}
          />
          <TextInput
            label="Packs taken in"
            inputMode="numeric"
            description={
              quantity && material ? `= ${formatQuantity(quantity, material.stockUnit)}` : undefined
            }
            {...form.getInputProps(at('packsReceived'))}
          />
          <TextInput
            label="Packs refused (damaged)"
            inputMode="numeric"
            description="Turned away at the door"
            {...form.getInputProps(at('packsRefused'))}
          />
          {refused ? (
            <TextInput
              label="What was wrong"
              placeholder="Drum split at the seam"
              {...form.getInputProps(at('refusedReason'))}
            />
          ) : null}
          <TextInput
            label={`Cost per ${unit || 'unit'} (£)`}
            description="Left empty: the supplier's price on file"
            inputMode="decimal"
            {...form.getInputProps(at('unitCost'))}
          />
          <Select
            size="md"
            label="Put away at"
            placeholder="Choose a location"
            searchable
            data={locations.map((l) => {
              const fits = !material || l.allowedHazardClasses.includes(material.hazardClass);
              return {
                value: l.id,
                label: fits
                  ? l.path
                  : `${l.path} (does not take ${hazardShort(material?.hazardClass ?? 'none').toLowerCase()})`,
                disabled: !fits,
              };
            })}
            nothingFoundMessage="No location by that name"
            {...form.getInputProps(at('locationId'))}
          />
        </SimpleGrid>
      </Stack>
    </Paper>
  );
}
