import { Button, Group, Menu, Modal, Stack, Text, Textarea } from '@mantine/core';
import type { JobStatus } from '@potlife/domain';
import { notifications } from '@mantine/notifications';
import { IconChevronDown } from '@tabler/icons-react';
import { useState } from 'react';
import { useChangeJobStatus } from '../api/change-job-status';
import type { JobDetail } from '../api/types';
import { statusActions, statusLabels } from '../utils/labels';

const ENDINGS: readonly JobStatus[] = ['lost', 'cancelled'];

/** The states the job may move to next; lost and cancelled ask first, with a reason. */
export function StatusMenu({ job }: { job: JobDetail }) {
  const change = useChangeJobStatus();
  const [pending, setPending] = useState<JobStatus | null>(null);
  const [reason, setReason] = useState('');

  if (job.nextStatuses.length === 0) {
    return null;
  }

  const move = (status: JobStatus, why: string | null) =>
    change.mutate(
      { id: job.id, status, reason: why },
      {
        onSuccess: (changed) => {
          notifications.show({
            color: 'green',
            message: `${changed.reference} is now ${statusLabels[changed.status].toLowerCase()}.`,
          });
          setPending(null);
          setReason('');
        },
      },
    );

  return (
    <>
      <Menu position="bottom-end" withinPortal>
        <Menu.Target>
          <Button
            variant="light"
            rightSection={<IconChevronDown size={16} />}
            loading={change.isPending && pending === null}
          >
            Change status
          </Button>
        </Menu.Target>
        <Menu.Dropdown>
          {job.nextStatuses.map((status) => (
            <Menu.Item
              key={status}
              color={ENDINGS.includes(status) ? 'red' : undefined}
              onClick={() =>
                ENDINGS.includes(status) || status === 'won' ? setPending(status) : move(status, null)
              }
            >
              {statusActions[status]}
            </Menu.Item>
          ))}
        </Menu.Dropdown>
      </Menu>
      <Modal
        opened={pending !== null}
        onClose={() => setPending(null)}
        title={pending ? `${statusActions[pending]}: ${job.reference}?` : ''}
      >
        <Stack gap="sm">
          <Text size="sm">
            {pending && ENDINGS.includes(pending)
              ? `The job becomes ${statusLabels[pending].toLowerCase()} for good, and any stock reserved for it is released for other jobs.`
              : job.status === 'scheduled'
                ? 'The job goes back to won: its date stays, and you can schedule it again.'
                : 'The customer has accepted the quote.'}
          </Text>
          <Textarea
            label="Reason (optional)"

            rows={2}
            maxLength={1000}
            value={reason}
            onChange={(e) => setReason(e.currentTarget.value)}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={() => setPending(null)} disabled={change.isPending}>
              Keep it {statusLabels[job.status].toLowerCase()}
            </Button>
            <Button
              color={pending && ENDINGS.includes(pending) ? 'red' : undefined}
              loading={change.isPending}
              onClick={() => pending && move(pending, reason.trim() === '' ? null : reason.trim())}
            >
              {pending ? statusActions[pending] : ''}
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}
