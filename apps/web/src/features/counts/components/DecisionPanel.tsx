import { Alert, Button, Card, Group, SegmentedControl, Stack, Text, Textarea, Title } from '@mantine/core';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconArrowBackUp, IconCheck } from '@tabler/icons-react';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { formatSignedMoney } from '../../../lib/amounts';
import { newIdempotencyKey } from '../../../lib/upload';
import { useApproveCount, useRejectCount } from '../api/count-actions';
import type { Count } from '../api/types';

/** The owner's decision on a submitted count: approve (post the differences) or send it back. */
export function DecisionPanel({ count }: { count: Count }) {
  const approve = useApproveCount(count.id);
  const reject = useRejectCount(count.id);
  const [approveKey] = useState(newIdempotencyKey);
  const [rejectKey] = useState(newIdempotencyKey);
  const [note, setNote] = useState('');
  const [backAction, setBackAction] = useState<'reopen' | 'cancel'>('reopen');
  const [backNote, setBackNote] = useState('');
  const [backTried, setBackTried] = useState(false);
  const [backError, setBackError] = useState<string | null>(null);
  const differences = count.lines.filter((l) => l.varianceKind !== null && l.varianceKind !== 'match').length;

  const askApprove = () =>
    modals.openConfirmModal({
      title: `Approve count ${count.number}?`,
      children: (
        <Text size="sm">
          {differences === 0
            ? 'Every line matches the ledger: nothing is adjusted.'
            : `${differences} difference${differences === 1 ? '' : 's'} will be posted as adjustments with the reason "count ${count.number}", worth ${formatSignedMoney(count.totals.varianceValue)} in all. The ledger keeps them; a mistake is put right by a reversal.`}
        </Text>
      ),
      labels: { confirm: 'Approve', cancel: 'Cancel' },
      onConfirm: () =>
        approve.mutate(
          { note: note.trim() || undefined, key: approveKey },
          {
            onSuccess: () =>
              notifications.show({ color: 'green', message: `Count ${count.number} is approved.` }),
          },
        ),
    });

  const askBack = () => {
    setBackTried(true);
    setBackError(null);
    if (backNote.trim() === '') {
      return;
    }
    modals.openConfirmModal({
      title:
        backAction === 'reopen'
          ? `Send count ${count.number} back to be counted again?`
          : `Cancel count ${count.number}?`,
      children: (
        <Text size="sm">
          {backAction === 'reopen'
            ? 'The counted figures are cleared and the expected ones taken afresh from the ledger; the locations are counted again.'
            : 'Nothing is adjusted and the locations are free again. The count stays in the list as cancelled.'}
        </Text>
      ),
      labels: { confirm: backAction === 'reopen' ? 'Send back' : 'Cancel the count', cancel: 'Keep it' },
      confirmProps: { color: 'red' },
      onConfirm: () =>
        reject.mutate(
          { action: backAction, note: backNote.trim(), key: rejectKey },
          {
            onSuccess: () =>
              notifications.show({
                color: 'green',
                message: backAction === 'reopen' ? 'Sent back for a recount.' : 'The count is cancelled.',
              }),
            onError: (failure) => setBackError(errorMessage(failure)),
          },
        ),
    });
  };

  return (
    <Card>
      <Title order={2} fz="lg" mb="sm">
        Your decision
      </Title>
      <Stack gap="lg">
        <Stack gap="xs">
          <Textarea
            label="Note with the approval"
            description="Optional"
            autosize
            minRows={1}
            value={note}
            onChange={(e) => setNote(e.currentTarget.value)}
          />
          <Group>
            <Button leftSection={<IconCheck size={18} />} loading={approve.isPending} onClick={askApprove}>
              Approve and post {differences} adjustment{differences === 1 ? '' : 's'}
            </Button>
          </Group>
        </Stack>
        <Stack gap="xs">
          <Text size="sm" fw={600}>
            Or send it back
          </Text>
          <SegmentedControl
            value={backAction}
            onChange={(value) => setBackAction(value as 'reopen' | 'cancel')}
            data={[
              { value: 'reopen', label: 'Count again' },
              { value: 'cancel', label: 'Cancel the count' },
            ]}
            w="fit-content"
            aria-label="Send back how"
          />
          <Textarea
            label="Why"
            autosize
            minRows={1}
            value={backNote}
            onChange={(e) => setBackNote(e.currentTarget.value)}
            error={backTried && backNote.trim() === '' ? 'Say why, for whoever counts' : undefined}
          />
          {backError ? (
            <Alert color="red" variant="light" role="alert">
              {backError}
            </Alert>
          ) : null}
          <Group>
            <Button
              variant="default"
              color="red"
              leftSection={<IconArrowBackUp size={18} />}
              loading={reject.isPending}
              onClick={askBack}
            >
              {backAction === 'reopen' ? 'Send back' : 'Cancel the count'}
            </Button>
          </Group>
        </Stack>
      </Stack>
    </Card>
  );
}
