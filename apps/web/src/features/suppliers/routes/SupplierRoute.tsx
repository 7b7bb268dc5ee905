import {
  ActionIcon,
  Anchor,
  Badge,
  Button,
  Card,
  Group,
  SimpleGrid,
  Stack,
  Table,
  Text,
  Title,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import {
  IconArchive,
  IconArrowBackUp,
  IconArrowLeft,
  IconPencil,
  IconTrash,
  IconUserPlus,
} from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { paths } from '../../../config/paths';
import { useSessionUser } from '../../../lib/session';
import { useDeleteContact } from '../api/contacts';
import { useSupplier } from '../api/get-supplier';
import { useSetSupplierActive } from '../api/save-supplier';
import type { Contact } from '../api/types';
import { canEditSuppliers } from '../components/can-edit';
import { ContactFormModal } from '../components/ContactFormModal';
import { PricesCard } from '../components/PricesCard';
import { SupplierFormModal } from '../components/SupplierFormModal';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" fw={600} tt="uppercase">
        {label}
      </Text>
      <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
        {children}
      </Text>
    </div>
  );
}

export function SupplierRoute() {
  const { supplierId = '' } = useParams();
  const user = useSessionUser();
  const canEdit = canEditSuppliers(user.role);
  const supplier = useSupplier(supplierId);
  const setActive = useSetSupplierActive();
  const removeContact = useDeleteContact(supplierId);
  const [formOpened, formModal] = useDisclosure(false);
  const [contactOpened, contactModal] = useDisclosure(false);
  const [contact, setContact] = useState<Contact | undefined>();

  if (supplier.isPending) {
    return <PageLoader label="Loading the supplier…" />;
  }
  if (supplier.isError) {
    return (
      <QueryError
        what="the supplier"
        error={supplier.error}
        onRetry={() => void supplier.refetch()}
        retrying={supplier.isFetching}
      />
    );
  }
  const s = supplier.data;

  const editContact = (chosen?: Contact) => {
    setContact(chosen);
    contactModal.open();
  };

  const confirmRemoveContact = (chosen: Contact) =>
    modals.openConfirmModal({
      title: `Remove ${chosen.name}?`,
      children: (
        <Text size="sm">
          They are taken off {s.name}&apos;s contacts. Orders already sent are not changed.
        </Text>
      ),
      labels: { confirm: 'Remove', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        removeContact.mutate(chosen.id, {
          onSuccess: () => notifications.show({ color: 'green', message: `${chosen.name} is removed.` }),
        }),
    });

  const archive = () =>
    modals.openConfirmModal({
      title: `Archive ${s.name}?`,
      children: (
        <Text size="sm">
          {s.name} is no longer offered for orders and receipts. Their prices and history stay, and you can
          restore them later.
        </Text>
      ),
      labels: { confirm: 'Archive', cancel: 'Cancel' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        setActive.mutate(
          { id: s.id, active: false },
          { onSuccess: () => notifications.show({ color: 'green', message: `${s.name} is archived.` }) },
        ),
    });

  return (
    <>
      <PageHeader
        title={s.name}
        description={`Delivers in about ${s.leadTimeDays} day${s.leadTimeDays === 1 ? '' : 's'} from an order.`}
        actions={
          <>
            <Button
              component={Link}
              to={paths.suppliers}
              variant="default"
              leftSection={<IconArrowLeft size={18} />}
            >
              Suppliers
            </Button>
            {canEdit ? (
              <>
                {s.active ? (
                  <Button
                    variant="default"
                    color="red"
                    leftSection={<IconArchive size={18} />}
                    loading={setActive.isPending}
                    onClick={archive}
                  >
                    Archive
                  </Button>
                ) : (
                  <Button
                    variant="default"
                    leftSection={<IconArrowBackUp size={18} />}
                    loading={setActive.isPending}
                    onClick={() =>
                      setActive.mutate(
                        { id: s.id, active: true },
                        {
                          onSuccess: () =>
                            notifications.show({ color: 'green', message: `${s.name} is restored.` }),
                        },
                      )
                    }
                  >
                    Restore
                  </Button>
                )}
                <Button leftSection={<IconPencil size={18} />} onClick={formModal.open}>
                  Change
                </Button>
              </>
            ) : null}
          </>
        }
      />
      <Stack gap="lg">
        {s.active ? null : (
          <Badge
            color="gray"
            variant="outline"
            size="lg"
            styles={{ label: { textTransform: 'none', overflow: 'visible' } }}
          >
            Archived: not offered for orders or receipts
          </Badge>
        )}
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
          <Card>
            <Title order={2} fz="lg" mb="sm">
              Details
            </Title>
            <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="md">
              <Fact label="Order e-mail">
                {s.orderEmail ? (
                  <Anchor href={`mailto:${s.orderEmail}`} size="sm">
                    {s.orderEmail}
                  </Anchor>
                ) : (
                  'None yet: add it before ordering'
                )}
              </Fact>
              <Fact label="Phone">{s.phone ?? '—'}</Fact>
              <Fact label="Lead time">{`${s.leadTimeDays} day${s.leadTimeDays === 1 ? '' : 's'}`}</Fact>
              <Fact label="Address">{s.address ?? '—'}</Fact>
            </SimpleGrid>
            {s.notes ? (
              <Stack mt="md">
                <Fact label="Notes">{s.notes}</Fact>
              </Stack>
            ) : null}
          </Card>
          <Card>
            <Group justify="space-between" mb="sm">
              <Title order={2} fz="lg">
                Contacts
              </Title>
              {canEdit ? (
                <Button
                  size="xs"
                  variant="light"
                  leftSection={<IconUserPlus size={14} />}
                  onClick={() => editContact()}
                >
                  Add a contact
                </Button>
              ) : null}
            </Group>
            {s.contacts.length === 0 ? (
              <Text size="sm" c="dimmed">
                {canEdit ? 'No contacts yet. Add the people you deal with there.' : 'No contacts yet.'}
              </Text>
            ) : (
              <Table.ScrollContainer minWidth={420}>
                <Table fz="sm" verticalSpacing={6}>
                  <Table.Thead>
                    <Table.Tr>
                      <Table.Th>Name</Table.Th>
                      <Table.Th>E-mail</Table.Th>
                      <Table.Th>Phone</Table.Th>
                      {canEdit ? <Table.Th /> : null}
                    </Table.Tr>
                  </Table.Thead>
                  <Table.Tbody>
                    {s.contacts.map((c) => (
                      <Table.Tr key={c.id}>
                        <Table.Td>
                          <Text size="sm" fw={600}>
                            {c.name}
                          </Text>
                          {c.role ? (
                            <Text size="xs" c="dimmed">
                              {c.role}
                            </Text>
                          ) : null}
                        </Table.Td>
                        <Table.Td>
                          {c.email ? (
                            <Anchor href={`mailto:${c.email}`} size="sm">
                              {c.email}
                            </Anchor>
                          ) : (
                            '—'
                          )}
                        </Table.Td>
                        <Table.Td>{c.phone ?? '—'}</Table.Td>
                        {canEdit ? (
                          <Table.Td>
                            <Group gap={2} justify="flex-end" wrap="nowrap">
                              <ActionIcon aria-label={`Change ${c.name}`} onClick={() => editContact(c)}>
                                <IconPencil size={16} />
                              </ActionIcon>
                              <ActionIcon
                                aria-label={`Remove ${c.name}`}
                                color="red"
                                onClick={() => confirmRemoveContact(c)}
                              >
                                <IconTrash size={16} />
                              </ActionIcon>
                            </Group>
                          </Table.Td>
                        ) : null}
                      </Table.Tr>
                    ))}
                  </Table.Tbody>
                </Table>
              </Table.ScrollContainer>
            )}
          </Card>
        </SimpleGrid>
        <PricesCard supplier={s} canEdit={canEdit} />
      </Stack>
      {canEdit ? (
        <>
          <SupplierFormModal opened={formOpened} onClose={formModal.close} supplier={s} />
          <ContactFormModal
            supplierId={s.id}
            opened={contactOpened}
            onClose={contactModal.close}
            contact={contact}
          />
        </>
      ) : null}
    </>
  );
}
