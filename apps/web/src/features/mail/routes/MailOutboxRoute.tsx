import { Alert, Button } from '@mantine/core';
import { IconInfoCircle, IconRefresh } from '@tabler/icons-react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { useMailMessages } from '../api/get-messages';
import { MessageDrawer } from '../components/MessageDrawer';
import { MessagesTable } from '../components/MessagesTable';

export function MailOutboxRoute() {
  const messages = useMailMessages();
  const [params, setParams] = useSearchParams();
  const messageId = params.get('message');

  const closeMessage = () => {
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        next.delete('message');
        return next;
      },
      { replace: true },
    );
  };

  return (
    <>
      <PageHeader
        title="Mail outbox"
        description="Every e-mail Potlife sends: invitations now, purchase orders to suppliers later."
        actions={
          <Button
            variant="default"
            leftSection={<IconRefresh size={16} />}
            loading={messages.isFetching && !messages.isPending}
            onClick={() => void messages.refetch()}
          >
            Refresh
          </Button>
        }
      />
      <Alert variant="light" color="topcoat" icon={<IconInfoCircle size={18} />} mb="md">
        This is the local mail catcher: it stands in for suppliers&apos; and users&apos; inboxes, so nothing
        here reached anyone outside. Open a message to see exactly what would have been sent.
      </Alert>
      {messages.isPending ? (
        <PageLoader label="Loading the mail…" />
      ) : messages.isError ? (
        <QueryError
          what="the mail"
          error={messages.error}
          onRetry={() => void messages.refetch()}
          retrying={messages.isFetching}
        />
      ) : (
        <MessagesTable messages={messages.data} />
      )}
      <MessageDrawer messageId={messageId} onClose={closeMessage} />
    </>
  );
}
