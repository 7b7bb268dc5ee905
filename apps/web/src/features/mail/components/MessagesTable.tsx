import { Anchor, Badge, Group, Stack, Text } from '@mantine/core';
import { IconPaperclip } from '@tabler/icons-react';
import { DataTable } from 'mantine-datatable';
import { Link } from 'react-router-dom';
import { SearchInput } from '../../../components/SearchInput';
import { hrefs } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useClientTable } from '../../../lib/use-client-table';
import type { MailMessageSummary } from '../api/get-messages';

const PAGE_SIZES = [15, 30, 60];

function sortValue(message: MailMessageSummary, column: string): string | number {
  switch (column) {
    case 'from':
      return message.from;
    case 'to':
      return message.to;
    case 'subject':
      return message.subject;
    case 'attachmentCount':
      return message.attachmentCount;
    default:
      return new Date(message.receivedAt).getTime() || 0;
  }
}

const searchText = (message: MailMessageSummary) => [message.from, message.to, message.subject].join(' ');

export function MessagesTable({ messages }: { messages: MailMessageSummary[] }) {
  const table = useClientTable<MailMessageSummary>(messages, {
    searchText,
    sortValue,
    initialSort: { columnAccessor: 'receivedAt', direction: 'desc' },
    pageSizes: PAGE_SIZES,
  });
  const { query, records } = table;

  const emptyText =
    messages.length === 0
      ? 'No mail caught yet. Messages appear here as Potlife sends them, for example when you invite a user.'
      : `No message matches "${query.trim()}". Clear the filter to see them all.`;

  return (
    <Stack gap="sm">
      <SearchInput
        label="Filter messages"
        placeholder="Filter by sender, recipient or subject"
        value={query}
        onChange={table.setQuery}
        width={420}
      />
      <DataTable<MailMessageSummary>
        withTableBorder
        borderRadius="lg"
        highlightOnHover
        verticalSpacing="sm"
        minHeight={records.length === 0 ? 220 : undefined}
        records={records}
        idAccessor="id"
        noRecordsText={emptyText}
        {...table.tableProps}
        recordsPerPageLabel="Messages per page"
        columns={[
          {
            accessor: 'receivedAt',
            title: 'Received',
            sortable: true,
            noWrap: true,
            render: (message) => formatDateTime(message.receivedAt),
          },
          {
            accessor: 'subject',
            title: 'Subject',
            sortable: true,
            render: (message) => (
              <Anchor component={Link} to={hrefs.mailMessage(message.id)} fw={600} size="sm">
                {message.subject.trim() || '(no subject)'}
              </Anchor>
            ),
          },
          { accessor: 'from', title: 'From', sortable: true, ellipsis: true },
          { accessor: 'to', title: 'To', sortable: true, ellipsis: true },
          {
            accessor: 'attachmentCount',
            title: 'Attachments',
            sortable: true,
            textAlign: 'right',
            render: (message) =>
              message.attachmentCount > 0 ? (
                <Group gap={4} justify="flex-end" wrap="nowrap">
                  <IconPaperclip size={14} aria-hidden />
                  <Badge
                    variant="light"
                    color="topcoat"
                    aria-label={`${message.attachmentCount} attachments`}
                  >
                    {message.attachmentCount}
                  </Badge>
                </Group>
              ) : (
                <Text size="sm" c="dimmed" aria-label="No attachments">
                  –
                </Text>
              ),
          },
        ]}
      />
    </Stack>
  );
}
