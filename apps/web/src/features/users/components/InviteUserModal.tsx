import { Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { z } from 'zod';
import { ROLES, roleLabels, type Role } from '../../../lib/roles';
import { emailField, nameField } from '../../../lib/validation';
import { useInviteUser } from '../api/invite-user';
import { roleDuties } from './role-duties';

export const inviteSchema = z.object({
  name: nameField('their name'),
  email: emailField('their'),
  role: z.enum(ROLES, { error: 'Choose a role' }),
});

// A type (not an interface) so it fits the resolver's Record<string, unknown>.
type InviteValues = {
  name: string;
  email: string;
  role: Role | null;
};

const roleOptions = ROLES.map((role) => ({ value: role, label: roleLabels[role] }));

interface InviteUserModalProps {
  opened: boolean;
  onClose: () => void;
}

export function InviteUserModal({ opened, onClose }: InviteUserModalProps) {
  const invite = useInviteUser();
  const form = useForm<InviteValues>({
    initialValues: { name: '', email: '', role: null },
    validate: zod4Resolver(inviteSchema, { errorPriority: 'first' }),
  });

  const close = () => {
    form.reset();
    invite.reset();
    onClose();
  };

  const submit = form.onSubmit((values) => {
    if (values.role === null) {
      return;
    }
    const body = { name: values.name.trim(), email: values.email.trim(), role: values.role };
    invite.mutate(body, {
      onSuccess: (user) => {
        notifications.show({
          color: 'green',
          title: 'Invitation sent',
          message: `${user.name} will receive an e-mail at ${user.email} with a link to set their password.`,
        });
        close();
      },
    });
  });

  const chosenRole = form.values.role;

  return (
    <Modal opened={opened} onClose={close} title="Invite a user" size="md">
      <form onSubmit={submit} noValidate aria-label="Invite a user">
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            They get an e-mail with a one-time link to set their password and sign in.
          </Text>
          <TextInput label="Name" data-autofocus autoComplete="off" {...form.getInputProps('name')} />
          <TextInput
            label="E-mail"
            type="email"
            inputMode="email"
            autoComplete="off"
            {...form.getInputProps('email')}
          />
          <Select
            label="Role"
            placeholder="Choose a role"
            data={roleOptions}
            description={
              chosenRole ? roleDuties[chosenRole] : 'Each person has one role; you can change it later.'
            }
            comboboxProps={{ withinPortal: true }}
            {...form.getInputProps('role')}
          />
          <Group justify="flex-end" gap="sm" mt="xs">
            <Button variant="default" onClick={close} disabled={invite.isPending}>
              Cancel
            </Button>
            <Button type="submit" loading={invite.isPending}>
              Send invitation
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
