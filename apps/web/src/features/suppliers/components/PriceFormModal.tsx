import { Alert, Button, Group, Modal, Select, SimpleGrid, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useState } from 'react';
import { z } from 'zod';
import { formatMoney } from '../../../lib/amounts';
import { splitFieldErrors } from '../../../lib/field-errors';
import { unitLabel } from '../../../lib/material-words';
import { useAddPrice } from '../api/add-price';
import { useMaterialChoices } from '../api/get-materials';

const today = () => new Date().toISOString().slice(0, 10);

const priceSchema = z.object({
  materialId: z.string().min(1, 'Choose the material'),
  packSize: z.string().min(1, 'Choose the pack'),
  packPrice: z
    .string()
    .trim()
    .min(1, 'Enter the price per pack')
    .regex(/^\d{1,9}(\.\d{1,2})?$/, 'Write pounds and pence, like 86.40'),
  validFrom: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Choose the date the price starts'),
  supplierCode: z.string().trim().max(60, 'Keep it to 60 characters'),
});

type PriceValues = z.infer<typeof priceSchema>;

interface PriceFormModalProps {
  supplierId: string;
  supplierName: string;
  opened: boolean;
  onClose: () => void;
  /** Start from this material and pack (a new price for a listed one). */
  initial?: { materialId: string; packSize: string; supplierCode: string | null };
}

export function PriceFormModal({ opened, onClose, ...rest }: PriceFormModalProps) {
  return (
    <Modal opened={opened} onClose={onClose} title={`New price from ${rest.supplierName}`} size="lg">
      {opened ? (
        <PriceForm
          key={rest.initial ? `${rest.initial.materialId}-${rest.initial.packSize}` : 'new'}
          onClose={onClose}
          {...rest}
        />
      ) : null}
    </Modal>
  );
}

function PriceForm({ supplierId, supplierName, onClose, initial }: Omit<PriceFormModalProps, 'opened'>) {
  const materials = useMaterialChoices();
  const add = useAddPrice(supplierId);
  const [other, setOther] = useState<string | null>(null);
  const form = useForm<PriceValues>({
    initialValues: {
      materialId: initial?.materialId ?? '',
      packSize: initial?.packSize ?? '',
      packPrice: '',
      validFrom: today(),
      supplierCode: initial?.supplierCode ?? '',
    },
    validate: zod4Resolver(priceSchema, { errorPriority: 'first' }),
  });
  const material = materials.data?.find((candidate) => candidate.id === form.values.materialId);

  const submit = form.onSubmit((values) => {
    setOther(null);
    add.mutate(
      {
        materialId: values.materialId,
        packSize: values.packSize,
        packPrice: values.packPrice.trim(),
        validFrom: values.validFrom,
        supplierCode: values.supplierCode.trim() === '' ? null : values.supplierCode.trim(),
      },
      {
        onSuccess: (price) => {
          notifications.show({
            color: 'green',
            message: `${price.materialCode} ${price.packLabel ?? price.packSize}: ${formatMoney(price.packPrice)} from ${price.validFrom}.`,
          });
          onClose();
        },
        onError: (error) => {
          const split = splitFieldErrors(error, [
            'materialId',
            'packSize',
            'packPrice',
            'validFrom',
            'supplierCode',
          ]);
          form.setErrors(split.fields);
          setOther(split.other);
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate aria-label="New price">
      <Stack gap="md">
        <Text size="sm" c="dimmed">
          A new price from its date on; the price it replaces stays in the history. Pounds per pack, net of
          VAT.
        </Text>
        <Select
          size="md"
          label="Material"
          placeholder={materials.isPending ? 'Loading materials…' : 'Choose a material'}
          searchable
          data={(materials.data ?? []).map((m) => ({ value: m.id, label: `${m.code} ${m.name}` }))}
          nothingFoundMessage="No material has that code or name"
          {...form.getInputProps('materialId')}
          onChange={(value) => {
            form.setFieldValue('materialId', value ?? '');
            const chosen = materials.data?.find((candidate) => candidate.id === value);
            form.setFieldValue(
              'packSize',
              chosen?.packSizes.length === 1 ? (chosen.packSizes[0]?.size ?? '') : '',
            );
          }}
        />
        {materials.isError ? (
          <Alert color="red" variant="light">
            The materials could not be loaded. Close this and try again.
          </Alert>
        ) : null}
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <Select
            size="md"
            label="Pack"
            placeholder={material ? 'Choose a pack' : 'Choose the material first'}
            disabled={!material}
            data={(material?.packSizes ?? []).map((pack) => ({
              value: pack.size,
              label: `${pack.label} (${pack.size} ${unitLabel(material?.stockUnit ?? '')})`,
            }))}
            {...form.getInputProps('packSize')}
          />
          <TextInput
            label="Price per pack (£)"
            inputMode="decimal"
            placeholder="86.40"
            {...form.getInputProps('packPrice')}
          />
          <TextInput label="Valid from" type="date" {...form.getInputProps('validFrom')} />
          <TextInput
            label={`${supplierName}'s code`}
            description="Optional"
            {...form.getInputProps('supplierCode')}
          />
        </SimpleGrid>
        {other ? (
          <Alert color="red" variant="light" role="alert" title="The price was not saved">
            {other}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={add.isPending}>
            Save price
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
