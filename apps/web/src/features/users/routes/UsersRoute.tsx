import { Button, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconUserPlus } from '@tabler/icons-react';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { roleLabels, withArticle, type Role } from '../../../lib/roles';
import { useSessionUser } from '../../../lib/session';
import { useUsers, type CompanyUser } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { InviteUserModal } from '../components/InviteUserModal';
import { roleDuties } from '../components/role-duties';
import { UsersTable } from '../components/UsersTable';

export function UsersRoute() {
  const me = useSessionUser();
  const users = useUsers();
  const update = useUpdateUser();
  const [inviteOpened, invite] = useDisclosure(false);

  const confirmRoleChange = (user: CompanyUser, role: Role) => {
    const self = user.id === me.id;
    modals.openConfirmModal({
      title: self ? `Make yourself ${withArticle(role)}?` : `Make ${user.name} ${withArticle(role)}?`,
      children: (
        <>
          <Text size="sm">
            {self ? 'You' : user.name} will be {withArticle(role)} instead of {withArticle(user.role)}:{' '}
            {roleDuties[role].charAt(0).toLowerCase() + roleDuties[role].slice(1)}
          </Text>
          {self && role !== 'owner' ? (
            <Text size="sm" mt="sm" c="red.8" fw={600}>
              You will no longer see Users or the Mail outbox. Another owner can change you back.
            </Text>
          ) : null}
        </>
      ),
      labels: { confirm: `Make ${roleLabels[role].toLowerCase()}`, cancel: 'Cancel' },
      confirmProps: { color: self && role !== 'owner' ? 'red' : undefined },
      onConfirm: () =>
        update.mutate(
          { id: user.id, role },
          {
            onSuccess: (changed) =>
              notifications.show({
                color: 'green',
                message: `${changed.name} is now ${withArticle(changed.role)}.`,
              }),
          },
        ),
    });
  };

  const setActive = (user: CompanyUser, active: boolean) => {
    const save = () =>
      update.mutate(
        { id: user.id, active },
        {
          onSuccess: (changed) =>
            notifications.show({
              color: 'green',
              message: active
                ? `${changed.name} can sign in again.`
                : `${changed.name} can no longer sign in.`,
            }),
        },
      );
    if (active) {
      save();
      return;
    }
    modals.openConfirmModal({
      title: `Deactivate ${user.name}?`,
      children: (
        <Text size="sm">
          {user.name} will no longer be able to sign in. Everything they recorded stays, and you can
          reactivate them later.
        </Text>
      ),
      labels: { confirm: 'Deactivate', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: save,
    });
  };

  return (
    <>
      <PageHeader
        title="Users"
        description={`Everyone at ${me.companyName} who can sign in to Potlife. Each person has one role, which decides what they see.`}
        actions={
          <Button leftSection={<IconUserPlus size={18} />} onClick={invite.open}>
            Invite a user
          </Button>
        }
      />
      {users.isPending ? (
        <PageLoader label="Loading users…" />
      ) : users.isError ? (
        <QueryError
          what="the users"
          error={users.error}
          onRetry={() => void users.refetch()}
          retrying={users.isFetching}
        />
      ) : (
        <UsersTable
          users={users.data}
          currentUserId={me.id}
          busyUserId={update.isPending ? update.variables.id : undefined}
          onChangeRole={confirmRoleChange}
          onSetActive={setActive}
        />
      )}
      <InviteUserModal opened={inviteOpened} onClose={invite.close} />
    </>
  );
}
