import { Alert, Button, Group, Modal, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useState } from 'react';
import { z } from 'zod';
import { splitFieldErrors } from '../../../lib/field-errors';
import { useSaveContact } from '../api/contacts';
import type { Contact } from '../api/types';

const contactSchema = z.object({
  name: z.string().trim().min(1, 'Enter their name').max(120, 'Keep it to 120 characters'),
  email: z
    .string()
    .trim()
    .refine(
      (value) => value === '' || z.email().safeParse(value).success,
      'Enter a whole e-mail address, like name@supplier.test',
    ),
  phone: z.string().trim().max(40, 'Keep it to 40 characters'),
  role: z.string().trim().max(60, 'Keep it to 60 characters'),
});

type ContactValues = { name: string; email: string; phone: string; role: string };
const orNull = (value: string) => (value.trim() === '' ? null : value.trim());

interface ContactFormModalProps {
  supplierId: string;
  opened: boolean;
  onClose: () => void;
  contact?: Contact;
}

export function ContactFormModal({ supplierId, opened, onClose, contact }: ContactFormModalProps) {
  const title = contact ? `Change ${contact.name}` : 'Add a contact';
  return (
    <Modal opened={opened} onClose={onClose} title={title}>
      {opened ? (
        <ContactForm
          key={contact?.id ?? 'new'}
          supplierId={supplierId}
          contact={contact}
          onClose={onClose}
          title={title}
        />
      ) : null}
    </Modal>
  );
}

function ContactForm({
  supplierId,
  contact,
  onClose,
  title,
}: Omit<ContactFormModalProps, 'opened'> & { title: string }) {
  const save = useSaveContact(supplierId);
  const [other, setOther] = useState<string | null>(null);
  const form = useForm<ContactValues>({
    initialValues: {
      name: contact?.name ?? '',
      email: contact?.email ?? '',
      phone: contact?.phone ?? '',
      role: contact?.role ?? '',
    },
    validate: zod4Resolver(contactSchema, { errorPriority: 'first' }),
  });
  const submit = form.onSubmit((values) => {
    setOther(null);
    save.mutate(
      {
        contactId: contact?.id,
        body: {
          name: values.name.trim(),
          email: orNull(values.email),
          phone: orNull(values.phone),
          role: orNull(values.role),
        },
      },
      {
        onSuccess: (saved) => {
          notifications.show({ color: 'green', message: `${saved.name} is saved.` });
          onClose();
        },
        onError: (error) => {
          const split = splitFieldErrors(error, ['name', 'email', 'phone', 'role']);
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
        <TextInput label="Role" placeholder="Trade counter, accounts…" {...form.getInputProps('role')} />
        <TextInput label="E-mail" type="email" inputMode="email" {...form.getInputProps('email')} />
        <TextInput label="Phone" type="tel" {...form.getInputProps('phone')} />
        {other ? (
          <Alert color="red" variant="light" role="alert" title="The contact was not saved">
            {other}
          </Alert>
        ) : null}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            {contact ? 'Save changes' : 'Add contact'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
