import { Alert, Button, Group, Modal, SimpleGrid, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useState } from 'react';
import { z } from 'zod';
import { splitFieldErrors } from '../../../lib/field-errors';
import { EMAIL_MAX_LENGTH } from '../../../lib/validation';
import { useSaveSupplier, type SupplierBody } from '../api/save-supplier';
import type { Supplier } from '../api/types';

const optionalEmail = z
  .string()
  .trim()
  .max(EMAIL_MAX_LENGTH, `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters`)
  .refine(
    (value) => value === '' || z.email().safeParse(value).success,
    'Enter a whole e-mail address, like orders@supplier.test',
  );

export const supplierSchema = z.object({
  name: z.string().trim().min(1, 'Enter the supplier’s name').max(160, 'Keep it to 160 characters'),
  orderEmail: optionalEmail,
  phone: z.string().trim().max(40, 'Keep it to 40 characters'),
  address: z.string().trim().max(500, 'Keep it to 500 characters'),
  leadTimeDays: z
    .string()
    .trim()
    .regex(/^\d+$/, 'Enter whole days, 0 or more')
    .refine((value) => Number(value) <= 365, 'At most 365 days'),
  notes: z.string().max(2000, 'Keep it to 2000 characters'),
});

type SupplierValues = {
  name: string;
  orderEmail: string;
  phone: string;
  address: string;
  leadTimeDays: string;
  notes: string;
};
const FIELDS = ['name', 'orderEmail', 'phone', 'address', 'leadTimeDays', 'notes'] as const;

const orNull = (value: string) => (value.trim() === '' ? null : value.trim());

interface SupplierFormModalProps {
  opened: boolean;
  onClose: () => void;
  supplier?: Supplier;
  onSaved?: (supplier: Supplier) => void;
}

export function SupplierFormModal({ opened, onClose, supplier, onSaved }: SupplierFormModalProps) {
  const title = supplier ? `Change ${supplier.name}` : 'Add a supplier';
  return (
    <Modal opened={opened} onClose={onClose} title={title} size="lg">
      {opened ? (
        <SupplierForm
          key={supplier?.id ?? 'new'}
          title={title}
          supplier={supplier}
          onClose={onClose}
          onSaved={onSaved}
        />
      ) : null}
    </Modal>
  );
}

function SupplierForm({
  title,
  supplier,
  onClose,
  onSaved,
}: Omit<SupplierFormModalProps, 'opened'> & { title: string }) {
  const save = useSaveSupplier();
  const [other, setOther] = useState<string | null>(null);
  const form = useForm<SupplierValues>({
    initialValues: {
      name: supplier?.name ?? '',
      orderEmail: supplier?.orderEmail ?? '',
      phone: supplier?.phone ?? '',
      address: supplier?.address ?? '',
      leadTimeDays: String(supplier?.leadTimeDays ?? 3),
      notes: supplier?.notes ?? '',
    },
    validate: zod4Resolver(supplierSchema, { errorPriority: 'first' }),
  });

  const submit = form.onSubmit((values) => {
    setOther(null);
    const body: SupplierBody = {
      name: values.name.trim(),
      orderEmail: orNull(values.orderEmail),
      phone: orNull(values.phone),
      address: orNull(values.address),
      leadTimeDays: Number(values.leadTimeDays.trim()),
      notes: orNull(values.notes),
    };
    save.mutate(
      { id: supplier?.id, body },
      {
        onSuccess: (saved) => {
          notifications.show({ color: 'green', message: `${saved.name} is saved.` });
          onSaved?.(saved);
          onClose();
        },
        onError: (error) => {
          const split = splitFieldErrors(error, FIELDS, { duplicate_name: 'name' });
          form.setErrors(split.fields);
          setOther(split.other);
        },
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate aria-label={title}>
      <Stack gap="md">
        <TextInput label="Name" data-autofocus {...form.getInputProps('name')} />
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
          <TextInput
            label="Order e-mail"
            description="Where purchase orders are sent"
            type="email"
            inputMode="email"
            {...form.getInputProps('orderEmail')}
          />
          <TextInput label="Phone" type="tel" {...form.getInputProps('phone')} />
          <TextInput
            label="Lead time (days)"
            description="From order to delivery, usually"
            inputMode="numeric"
            {...form.getInputProps('leadTimeDays')}
          />
        </SimpleGrid>
        <Textarea label="Address" autosize minRows={2} {...form.getInputProps('address')} />
        <Textarea label="Notes" autosize minRows={2} {...form.getInputProps('notes')} />
        {other ? (
          <Alert color="red" variant="light" role="alert" title="The supplier was not saved">
            {other}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            {supplier ? 'Save changes' : 'Add supplier'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
