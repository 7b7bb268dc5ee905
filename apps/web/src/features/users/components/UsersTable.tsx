import { Button, Select, Stack, Text } from '@mantine/core';
import { IconUserOff, IconUserCheck } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { SearchInput } from '../../../components/SearchInput';
import { formatDate } from '../../../lib/format';
import { isRole, ROLES, roleLabels, type Role } from '../../../lib/roles';
import { useClientTable } from '../../../lib/use-client-table';
import type { CompanyUser } from '../api/get-users';
import { statusLabels, UserStatusBadge } from './UserStatusBadge';

const PAGE_SIZES = [10, 25, 50];
const roleOptions = ROLES.map((role) => ({ value: role, label: roleLabels[role] }));

interface UsersTableProps {
  users: CompanyUser[];
  currentUserId: string;
  /** The user a change is being saved for, whose controls wait meanwhile. */
  busyUserId?: string;
  onChangeRole: (user: CompanyUser, role: Role) => void;
  onSetActive: (user: CompanyUser, active: boolean) => void;
}

function sortValue(user: CompanyUser, column: string): string | number {
  switch (column) {
    case 'email':
      return user.email;
    case 'role':
      return roleLabels[user.role];
    case 'status':
      return statusLabels[user.status];
    case 'createdAt':
      return new Date(user.createdAt).getTime() || 0;
    default:
      return user.name;
  }
}

const searchText = (user: CompanyUser) =>
  [user.name, user.email, roleLabels[user.role], statusLabels[user.status]].join(' ');

export function UsersTable({ users, currentUserId, busyUserId, onChangeRole, onSetActive }: UsersTableProps) {
  const table = useClientTable<CompanyUser>(users, {
    searchText,
    sortValue,
    initialSort: { columnAccessor: 'name', direction: 'asc' },
    pageSizes: PAGE_SIZES,
  });
  const { query, records } = table;

  const emptyText =
    users.length === 0
      ? 'No users yet. Invite your estimators and storemen with "Invite a user".'
      : `No user matches "${query.trim()}". Clear the filter, or invite them with "Invite a user".`;

  return (
    <Stack gap="sm">
      <SearchInput
        label="Filter users"
        placeholder="Filter by name, e-mail, role or status"
        value={query}
        onChange={table.setQuery}
        width={420}
      />
      <DataTable<CompanyUser>
        withTableBorder
        borderRadius="lg"
        highlightOnHover
        verticalSpacing="sm"
        minHeight={records.length === 0 ? 220 : undefined}
        records={records}
        idAccessor="id"
        noRecordsText={emptyText}
        {...table.tableProps}
        recordsPerPageLabel="Users per page"
        columns={[
          {
            accessor: 'name',
            title: 'Name',
            sortable: true,
            render: (user) => (
              <Text size="sm" fw={600}>
                {user.name}
                {user.id === currentUserId ? (
                  <Text span size="sm" fw={400} c="dimmed">
                    {' '}
                    (you)
                  </Text>
                ) : null}
              </Text>
            ),
          },
          { accessor: 'email', title: 'E-mail', sortable: true },
          {
            accessor: 'role',
            title: 'Role',
            sortable: true,
            width: 170,
            render: (user) => (
              <Select
                aria-label={`Role of ${user.name}`}
                data={roleOptions}
                value={user.role}
                size="xs"
                w={140}
                disabled={busyUserId === user.id}
                comboboxProps={{ withinPortal: true }}
                onChange={(value) => {
                  if (isRole(value) && value !== user.role) {
                    onChangeRole(user, value);
                  }
                }}
              />
            ),
          },
          {
            accessor: 'status',
            title: 'Status',
            sortable: true,
            render: (user) => <UserStatusBadge status={user.status} />,
          },
          {
            accessor: 'createdAt',
            title: 'Created',
            sortable: true,
            render: (user) => formatDate(user.createdAt),
          },
          {
            accessor: 'actions',
            title: 'Actions',
            textAlign: 'right',
            render: (user) => {
              if (user.id === currentUserId) {
                return (
                  <Text size="xs" c="dimmed">
                    Signed in
                  </Text>
                );
              }
              const deactivate = user.status !== 'inactive';
              return (
                <Button
                  size="xs"
                  variant="light"
                  color={deactivate ? 'red' : 'green'}
                  leftSection={deactivate ? <IconUserOff size={14} /> : <IconUserCheck size={14} />}
                  loading={busyUserId === user.id}
                  aria-label={`${deactivate ? 'Deactivate' : 'Reactivate'} ${user.name}`}
                  onClick={() => onSetActive(user, !deactivate)}
                >
                  {deactivate ? 'Deactivate' : 'Reactivate'}
                </Button>
              );
            },
          },
        ]}
      />
    </Stack>
  );
}
