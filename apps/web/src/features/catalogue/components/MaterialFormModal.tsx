import {
  ActionIcon,
  Alert,
  Button,
  Divider,
  Group,
  Modal,
  Select,
  SimpleGrid,
  Stack,
  Switch,
  Text,
  Textarea,
  TextInput,
  Title,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { HAZARD_CLASSES, MATERIAL_KINDS } from '@potlife/domain';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useState, type ReactNode } from 'react';
import { splitFieldErrors } from '../../../lib/field-errors';
import { scrollToFirstError } from '../../../lib/scroll-to-error';
import {
  hazardClassLabels,
  materialKindLabels,
  stockUnitOptions,
  trimKindLabels,
  unitLabel,
} from '../../../lib/material-words';
import { useSaveMaterial } from '../api/save-material';
import { TRIM_PIECES, trimPieceLabels, type Material } from '../api/types';
import {
  formValuesOf,
  LIQUID_KINDS,
  MAT_FIELD_KINDS,
  MATERIAL_FORM_FIELDS,
  materialBodyOf,
  materialSchema,
  newPackRow,
  type MaterialFormValues,
} from './material-form';

const kindOptions = MATERIAL_KINDS.map((kind) => ({ value: kind, label: materialKindLabels[kind] }));
const hazardOptions = HAZARD_CLASSES.map((value) => ({ value, label: hazardClassLabels[value] }));
const trimOptions = Object.entries(trimKindLabels).map(([value, label]) => ({ value, label }));
const trimPieceOptions = TRIM_PIECES.map((value) => ({ value, label: trimPieceLabels[value] }));
const packingGroupOptions = [
  { value: '', label: 'None' },
  { value: 'I', label: 'I — great danger' },
  { value: 'II', label: 'II — medium danger' },
  { value: 'III', label: 'III — minor danger' },
];

interface MaterialFormModalProps {
  opened: boolean;
  onClose: () => void;
  /** The material to change; none to add one. */
  material?: Material;
  onSaved?: (material: Material) => void;
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack gap="sm">
      <Title order={3} fz="md">
        {title}
      </Title>
      {children}
    </Stack>
  );
}

export function MaterialFormModal({ opened, onClose, material, onSaved }: MaterialFormModalProps) {
  const phone = useMediaQuery('(max-width: 36em)');
  const title = material ? `Change ${material.code}` : 'Add a material';
  return (
    <Modal opened={opened} onClose={onClose} title={title} size="xl" fullScreen={phone}>
      {/* Mounted afresh on each opening, so the form starts from the material's values. */}
      {opened ? (
        <MaterialForm
          key={material?.id ?? 'new'}
          title={title}
          material={material}
          onClose={onClose}
          onSaved={onSaved}
        />
      ) : null}
    </Modal>
  );
}

function MaterialForm({
  title,
  material,
  onClose,
  onSaved,
}: Omit<MaterialFormModalProps, 'opened'> & { title: string }) {
  const save = useSaveMaterial();
  const [otherError, setOtherError] = useState<string | null>(null);
  const form = useForm<MaterialFormValues>({
    initialValues: formValuesOf(material),
    validate: zod4Resolver(materialSchema, { errorPriority: 'first' }),
  });

  const values = form.values;
  const kind = values.kind;
  const unit = values.stockUnit ? unitLabel(values.stockUnit) : 'stock unit';
  const hazardous = values.hazardClass !== 'none';

  const submit = form.onSubmit(
    (formValues) => {
      setOtherError(null);
      save.mutate(
        { id: material?.id, body: materialBodyOf(formValues, material?.active ?? true) },
        {
          onSuccess: (saved) => {
            notifications.show({
              color: 'green',
              message: material
                ? `${saved.code} ${saved.name} is saved.`
                : `${saved.code} ${saved.name} is in the catalogue.`,
            });
            onSaved?.(saved);
            onClose();
          },
          onError: (error) => {
            const split = splitFieldErrors(error, MATERIAL_FORM_FIELDS, { duplicate_code: 'code' });
            form.setErrors(split.fields);
            setOtherError(split.other);
          },
        },
      );
    },
    () => scrollToFirstError(title),
  );

  return (
    <form onSubmit={submit} noValidate aria-label={title}>
      <Stack gap="lg">
        <Section title="What it is">
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
            <TextInput
              label="Code"
              description="Short and unique, e.g. RES-25"
              data-autofocus
              {...form.getInputProps('code')}
            />
            <TextInput label="Name" {...form.getInputProps('name')} />
            <Select
              size="md"
              label="Kind"
              placeholder="Choose a kind"
              data={kindOptions}
              searchable
              {...form.getInputProps('kind')}
            />
            <Select
              size="md"
              label="Stock unit"
              description="What quantities are counted in"
              placeholder="Choose a unit"
              data={stockUnitOptions}
              {...form.getInputProps('stockUnit')}
            />
          </SimpleGrid>
        </Section>

        <Section title="Packs">
          <Text size="sm" c="dimmed">
            Each pack it is bought and stored in, with its size in {unit}: a 25 kg drum, a 30 m roll.
          </Text>
          {values.packSizes.map((pack, index) => (
            <Group key={pack.key} align="flex-start" gap="sm" wrap="nowrap">
              <TextInput
                label={`Size (${unit})`}
                aria-label={`Pack ${index + 1} size`}
                inputMode="decimal"
                w={130}
                {...form.getInputProps(`packSizes.${index}.size`)}
              />
              <TextInput
                label="Name of the pack"
                aria-label={`Pack ${index + 1} name`}
                style={{ flex: 1 }}
                placeholder="25 kg drum"
                {...form.getInputProps(`packSizes.${index}.label`)}
              />
              <ActionIcon
                mt={30}
                color="red"
                variant="subtle"
                aria-label={`Remove pack ${index + 1}`}
                disabled={values.packSizes.length === 1}
                onClick={() => form.removeListItem('packSizes', index)}
              >
                <IconTrash size={18} />
              </ActionIcon>
            </Group>
          ))}
          {typeof form.errors.packSizes === 'string' ? (
            <Text size="sm" c="red" role="alert">
              {form.errors.packSizes}
            </Text>
          ) : null}
          <Group>
            <Button
              variant="light"
              size="xs"
              leftSection={<IconPlus size={14} />}
              disabled={values.packSizes.length >= 20}
              onClick={() => form.insertListItem('packSizes', newPackRow())}
            >
              Add a pack size
            </Button>
          </Group>
        </Section>

        {kind === 'mat' || kind === 'bandage' || kind === 'trim' || kind === 'topcoat' ? (
          <Section title={`${materialKindLabels[kind]} details`}>
            <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
              {MAT_FIELD_KINDS.includes(kind) ? (
                <>
                  <TextInput
                    label="Weight (g/m²)"
                    description={kind === 'mat' ? 'Needed for a mat: 300, 450, 600…' : undefined}
                    inputMode="numeric"
                    {...form.getInputProps('matGsm')}
                  />
                  <TextInput
                    label="Roll width (m)"
                    description={kind === 'mat' ? 'Needed for a mat, e.g. 1.04' : undefined}
                    inputMode="decimal"
                    {...form.getInputProps('rollWidthM')}
                  />
                </>
              ) : null}
              {kind === 'trim' ? (
                <>
                  <Select
                    size="md"
                    label="Trim kind"
                    placeholder="Choose"
                    data={trimOptions}
                    {...form.getInputProps('trimKind')}
                  />
                  <TextInput
                    label="Length (m)"
                    inputMode="decimal"
                    placeholder="3"
                    {...form.getInputProps('trimLengthM')}
                  />
                  <Select
                    size="md"
                    label="Piece"
                    description="Estimates take corner pieces by this, not by the name"
                    data={trimPieceOptions}
                    allowDeselect={false}
                    {...form.getInputProps('trimPiece')}
                  />
                </>
              ) : null}
              {kind === 'topcoat' ? (
                <TextInput label="Colour" placeholder="Slate grey" {...form.getInputProps('topcoatColour')} />
              ) : null}
            </SimpleGrid>
          </Section>
        ) : null}

        <Divider />
        <Section title="Shelf life and storage">
          <Switch
            label="Track lots (batch numbers and expiry dates)"
            {...form.getInputProps('lotTracked', { type: 'checkbox' })}
          />
          <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
            <TextInput
              label="Shelf life (days)"
              description="Expiry = received date + this, when the packs give none"
              inputMode="numeric"
              {...form.getInputProps('shelfLifeDays')}
            />
            <TextInput
              label="Store at least (°C)"
              inputMode="decimal"
              {...form.getInputProps('storageMinC')}
            />
            <TextInput
              label="Store at most (°C)"
              inputMode="decimal"
              {...form.getInputProps('storageMaxC')}
            />
          </SimpleGrid>
          {kind !== '' && LIQUID_KINDS.includes(kind) ? (
            <TextInput
              label="Litres per kg"
              description="For a liquid stocked by weight: counts its litres in the flammables cabinet"
              inputMode="decimal"
              maw={260}
              {...form.getInputProps('litresPerKg')}
            />
          ) : null}
        </Section>

        <Section title="Hazard">
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
            <Select
              size="md"
              label="Hazard class"
              data={hazardOptions}
              {...form.getInputProps('hazardClass')}
            />
            {hazardous ? (
              <TextInput
                label="UN number"
                placeholder="1866"
                inputMode="numeric"
                {...form.getInputProps('unNumber')}
              />
            ) : null}
            {hazardous && values.hazardClass !== '5.2' && values.hazardClass !== '2' ? (
              <Select
                size="md"
                label="Packing group"
                data={packingGroupOptions}
                {...form.getInputProps('packingGroup')}
              />
            ) : null}
            {hazardous ? (
              <TextInput
                label="Flash point (°C)"
                inputMode="decimal"
                {...form.getInputProps('flashPointC')}
              />
            ) : null}
          </SimpleGrid>
          <Switch
            label="An accelerator (kept apart from peroxide catalyst)"
            {...form.getInputProps('isAccelerator', { type: 'checkbox' })}
          />
          <Text size="xs" c="dimmed">
            Take the class, UN number and packing group from the safety data sheet. Where to store it follows
            your local codes and licensed practice.
          </Text>
        </Section>

        <Section title="Reordering">
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
            <TextInput
              label={`Reorder level (${unit})`}
              description="Home lists it when usable stock falls to this"
              inputMode="decimal"
              {...form.getInputProps('reorderLevel')}
            />
            <TextInput
              label={`Reorder quantity (${unit})`}
              inputMode="decimal"
              {...form.getInputProps('reorderQuantity')}
            />
          </SimpleGrid>
        </Section>

        <Textarea label="Notes" autosize minRows={2} {...form.getInputProps('notes')} />

        {otherError ? (
          <Alert color="red" variant="light" role="alert" title="The material was not saved">
            {otherError}
          </Alert>
        ) : null}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            {material ? 'Save changes' : 'Add material'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
