import { Accordion, Text, Timeline } from '@mantine/core';
import { formatDateTime } from '../../../lib/format';
import type { StatusChange } from '../api/types';
import { statusLabels } from '../utils/labels';

/** Every change of the job's status: when, by whom, and why. */
export function StatusHistory({ history }: { history: StatusChange[] }) {
  if (history.length === 0) {
    return null;
  }
  const newestFirst = [...history].sort((a, b) => b.changedAt.localeCompare(a.changedAt));
  return (
    <Accordion variant="contained" radius="md">
      <Accordion.Item value="history">
        <Accordion.Control>
          <Text size="sm" fw={600}>
            Status history ({history.length})
          </Text>
        </Accordion.Control>
        <Accordion.Panel>
          <Timeline bulletSize={14} lineWidth={2} active={newestFirst.length}>
            {newestFirst.map((change) => (
              <Timeline.Item
                key={`${change.changedAt}-${change.to}`}
                title={
                  change.from
                    ? `${statusLabels[change.from]} → ${statusLabels[change.to]}`
                    : statusLabels[change.to]
                }
              >
                <Text size="xs" c="dimmed">
                  {formatDateTime(change.changedAt)}
                  {change.changedBy ? ` · ${change.changedBy.name}` : ''}
                </Text>
                {change.reason ? <Text size="sm">{change.reason}</Text> : null}
              </Timeline.Item>
            ))}
          </Timeline>
        </Accordion.Panel>
      </Accordion.Item>
    </Accordion>
  );
}
