import { Button, CloseButton, Select, Stack, Text, TextInput } from '@mantine/core';
import { IconSearch, IconUserOff, IconUserCheck } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { compareValues, formatDate } from '../../../lib/format';
import { isRole, ROLES, roleLabels, type Role } from '../../../lib/roles';
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

function matches(user: CompanyUser, query: string): boolean {
  const haystack = [user.name, user.email, roleLabels[user.role], statusLabels[user.status]]
    .join(' ')
    .toLowerCase();
  return query
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
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

export function UsersTable({ users, currentUserId, busyUserId, onChangeRole, onSetActive }: UsersTableProps) {
  const [query, setQuery] = useState('');
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<CompanyUser>>({
    columnAccessor: 'name',
    direction: 'asc',
  });
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(PAGE_SIZES[0] ?? 10);

  const sorted = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    return users
      .filter((user) => matches(user, query))
      .sort((a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)));
  }, [users, query, sortStatus]);

  const lastPage = Math.max(1, Math.ceil(sorted.length / pageSize));
  const currentPage = Math.min(page, lastPage);
  const records = sorted.slice((currentPage - 1) * pageSize, currentPage * pageSize);

  const emptyText =
    users.length === 0
      ? 'No users yet. Invite your estimators and storemen with "Invite a user".'
      : `No user matches "${query.trim()}". Clear the filter, or invite them with "Invite a user".`;

  return (
    <Stack gap="sm">
      <TextInput
        aria-label="Filter users"
        placeholder="Filter by name, e-mail, role or status"
        leftSection={<IconSearch size={16} />}
        value={query}
        onChange={(event) => {
          setQuery(event.currentTarget.value);
          setPage(1);
        }}
        rightSection={
          query ? (
            <CloseButton
              aria-label="Clear the filter"
              onClick={() => {
                setQuery('');
                setPage(1);
              }}
            />
          ) : null
        }
        maw={420}
        size="sm"
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
        sortStatus={sortStatus}
        onSortStatusChange={(status) => {
          setSortStatus(status);
          setPage(1);
        }}
        totalRecords={sorted.length}
        recordsPerPage={pageSize}
        page={currentPage}
        onPageChange={setPage}
        recordsPerPageOptions={PAGE_SIZES}
        onRecordsPerPageChange={(size) => {
          setPageSize(size);
          setPage(1);
        }}
        recordsPerPageLabel="Users per page"
        paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
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
