import { Anchor, Badge, CloseButton, Group, Stack, Text, TextInput } from '@mantine/core';
import { IconPaperclip, IconSearch } from '@tabler/icons-react';
import { DataTable, type DataTableSortStatus } from 'mantine-datatable';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { hrefs } from '../../../config/paths';
import { compareValues, formatDateTime } from '../../../lib/format';
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

function matches(message: MailMessageSummary, query: string): boolean {
  const haystack = [message.from, message.to, message.subject].join(' ').toLowerCase();
  return query
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
}

export function MessagesTable({ messages }: { messages: MailMessageSummary[] }) {
  const [query, setQuery] = useState('');
  const [sortStatus, setSortStatus] = useState<DataTableSortStatus<MailMessageSummary>>({
    columnAccessor: 'receivedAt',
    direction: 'desc',
  });
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(PAGE_SIZES[0] ?? 15);

  const sorted = useMemo(() => {
    const column = String(sortStatus.columnAccessor);
    const direction = sortStatus.direction === 'asc' ? 1 : -1;
    return messages
      .filter((message) => matches(message, query))
      .sort((a, b) => direction * compareValues(sortValue(a, column), sortValue(b, column)));
  }, [messages, query, sortStatus]);

  const lastPage = Math.max(1, Math.ceil(sorted.length / pageSize));
  const currentPage = Math.min(page, lastPage);
  const records = sorted.slice((currentPage - 1) * pageSize, currentPage * pageSize);

  const emptyText =
    messages.length === 0
      ? 'No mail caught yet. Messages appear here as Potlife sends them, for example when you invite a user.'
      : `No message matches "${query.trim()}". Clear the filter to see them all.`;

  return (
    <Stack gap="sm">
      <TextInput
        aria-label="Filter messages"
        placeholder="Filter by sender, recipient or subject"
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
      <DataTable<MailMessageSummary>
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
        recordsPerPageLabel="Messages per page"
        paginationText={({ from, to, totalRecords }) => `${from}–${to} of ${totalRecords}`}
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
