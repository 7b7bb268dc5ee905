import { Button, Group, Modal, SimpleGrid, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useEffect } from 'react';
import { z } from 'zod';
import { useCreateCustomer } from '../../../lib/customers';
import { useUpdateCustomer } from '../api/update-customer';
import type { Customer, CustomerBody } from '../api/types';

const text = (max: number) => z.string().trim().max(max, `Keep it to ${max} characters`);

export const customerSchema = z.object({
  name: z.string().trim().min(1, 'Enter the customer’s name').max(160, 'Keep it to 160 characters'),
  contactName: text(120),
  email: z
    .string()
    .trim()
    .max(320, 'Keep it to 320 characters')
    .refine(
      (v) => v === '' || z.email().safeParse(v).success,
      'Enter a whole e-mail address, like name@example.com',
    ),
  phone: text(40),
  billingAddress: text(500),
  notes: text(2000),
});

type CustomerValues = z.infer<typeof customerSchema>;

const blank: CustomerValues = {
  name: '',
  contactName: '',
  email: '',
  phone: '',
  billingAddress: '',
  notes: '',
};

function valuesOf(c: Customer | null): CustomerValues {
  return c
    ? {
        name: c.name,
        contactName: c.contactName ?? '',
        email: c.email ?? '',
        phone: c.phone ?? '',
        billingAddress: c.billingAddress ?? '',
        notes: c.notes ?? '',
      }
    : blank;
}

const orNull = (v: string) => (v.trim() === '' ? null : v.trim());

interface CustomerFormModalProps {
  opened: boolean;
  onClose: () => void;
  /** null: a new customer */
  customer: Customer | null;
  onSaved?: (customer: Customer) => void;
}

/** Add a customer, or edit one: the name, who to speak to, and where the invoice goes. */
export function CustomerFormModal({ opened, onClose, customer, onSaved }: CustomerFormModalProps) {
  const form = useForm<CustomerValues>({
    initialValues: valuesOf(customer),
    validate: zod4Resolver(customerSchema, { errorPriority: 'first' }),
  });
  const create = useCreateCustomer();
  const update = useUpdateCustomer();
  const busy = create.isPending || update.isPending;

  useEffect(() => {
    if (opened) {
      form.setValues(valuesOf(customer));
      form.resetDirty(valuesOf(customer));
      form.clearErrors();
    }
    // Refill when the modal opens.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [opened]);

  const submit = form.onSubmit((values) => {
    const body: CustomerBody = {
      name: values.name.trim(),
      contactName: orNull(values.contactName),
      email: orNull(values.email),
      phone: orNull(values.phone),
      billingAddress: orNull(values.billingAddress),
      notes: orNull(values.notes),
    };
    const done = (saved: Customer) => {
      notifications.show({
        color: 'green',
        message: customer ? `${saved.name} saved.` : `${saved.name} added.`,
      });
      onClose();
      onSaved?.(saved);
    };
    if (customer) {
      update.mutate({ id: customer.id, ...body }, { onSuccess: done });
    } else {
      create.mutate(body, { onSuccess: done });
    }
  });

  const title = customer ? `Edit ${customer.name}` : 'New customer';
  return (
    <Modal opened={opened} onClose={onClose} title={title} size="lg">
      <form onSubmit={submit} noValidate aria-label={title}>
        <Stack gap="sm">
          <TextInput
            label="Name"
            placeholder="A person or a firm"
            data-autofocus
            {...form.getInputProps('name')}
          />
          <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
            <TextInput label="Contact" {...form.getInputProps('contactName')} />
            <TextInput label="E-mail" type="email" inputMode="email" {...form.getInputProps('email')} />
            <TextInput label="Phone" type="tel" {...form.getInputProps('phone')} />
          </SimpleGrid>
          <Textarea
            label="Billing address"
            rows={2}
            autosize
            maxRows={5}
            {...form.getInputProps('billingAddress')}
          />
          <Textarea label="Notes" rows={2} autosize maxRows={6} {...form.getInputProps('notes')} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose} disabled={busy}>
              Cancel
            </Button>
            <Button type="submit" loading={busy}>
              {customer ? 'Save' : 'Add customer'}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
