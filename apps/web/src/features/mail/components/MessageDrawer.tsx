import { Button, Divider, Drawer, Group, Stack, Table, Text, Title } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconDownload } from '@tabler/icons-react';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { formatBytes, formatDateTime } from '../../../lib/format';
import { useDownloadAttachment } from '../api/download-attachment';
import { useMailMessage, type MailMessage } from '../api/get-message';
import { MessageBody } from './MessageBody';

function Headers({ message }: { message: MailMessage }) {
  const rows: [string, string][] = [
    ['From', message.from],
    ['To', message.to],
    ['Subject', message.subject || '(no subject)'],
    ['Received', formatDateTime(message.receivedAt)],
  ];
  return (
    <Table withRowBorders={false} verticalSpacing={4} horizontalSpacing={0} layout="fixed">
      <Table.Tbody>
        {rows.map(([label, value]) => (
          <Table.Tr key={label}>
            <Table.Th w={96} c="dimmed" fw={600} fz="sm" style={{ verticalAlign: 'top' }}>
              {label}
            </Table.Th>
            <Table.Td fz="sm" style={{ wordBreak: 'break-word' }}>
              {value}
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}

function Attachments({ message }: { message: MailMessage }) {
  const download = useDownloadAttachment();
  if (message.attachments.length === 0) {
    return null;
  }
  return (
    <Stack gap="xs">
      <Title order={3} fz="sm">
        Attachments
      </Title>
      <Group gap="sm">
        {message.attachments.map((attachment) => {
          const busy = download.isPending && download.variables.index === attachment.index;
          return (
            <Button
              key={attachment.index}
              variant="light"
              size="sm"
              leftSection={<IconDownload size={16} />}
              loading={busy}
              aria-label={`Download ${attachment.filename}`}
              onClick={() =>
                download.mutate({
                  messageId: message.id,
                  index: attachment.index,
                  filename: attachment.filename,
                })
              }
            >
              {attachment.filename}
              <Text span size="xs" c="dimmed" ml={6}>
                {formatBytes(attachment.size)}
              </Text>
            </Button>
          );
        })}
      </Group>
    </Stack>
  );
}

function MessageView({ messageId }: { messageId: string }) {
  const message = useMailMessage(messageId);
  if (message.isPending) {
    return <PageLoader label="Opening the message…" />;
  }
  if (message.isError) {
    return (
      <QueryError
        what="this message"
        error={message.error}
        onRetry={() => void message.refetch()}
        retrying={message.isFetching}
      />
    );
  }
  return (
    <Stack gap="md">
      <Headers message={message.data} />
      <Attachments message={message.data} />
      <Divider />
      <MessageBody subject={message.data.subject} text={message.data.text} html={message.data.html} />
    </Stack>
  );
}

interface MessageDrawerProps {
  messageId: string | null;
  onClose: () => void;
}

export function MessageDrawer({ messageId, onClose }: MessageDrawerProps) {
  const phone = useMediaQuery('(max-width: 48em)');
  return (
    <Drawer
      opened={messageId !== null}
      onClose={onClose}
      position="right"
      size={phone ? '100%' : 'xl'}
      title="Message"
      closeButtonProps={{ 'aria-label': 'Close the message' }}
    >
      {messageId !== null ? <MessageView messageId={messageId} /> : null}
    </Drawer>
  );
}
