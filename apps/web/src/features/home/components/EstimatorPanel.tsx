import { Anchor, Badge, Card, Group, Loader, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { hrefs, paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { UPCOMING_DAYS, useEstimatorOverview, type MaterialState } from '../api/get-upcoming-jobs';

const STATE_LABELS: Record<MaterialState, string> = {
  'no-estimate': 'No estimate',
  'not-reserved': 'Not reserved',
  reserved: 'All reserved',
  short: 'Short',
  issued: 'Issued',
};

const STATE_COLOURS: Record<MaterialState, string> = {
  'no-estimate': 'gray',
  'not-reserved': 'yellow',
  reserved: 'green',
  short: 'red',
  issued: 'blue',
};

/** The estimator's next jobs and what needs doing for them. */
export function EstimatorPanel() {
  const overview = useEstimatorOverview();
  const short = overview.data?.upcoming.filter((j) => j.materialState === 'short').length ?? 0;
  const notReserved = overview.data?.upcoming.filter((j) => j.materialState === 'not-reserved').length ?? 0;

  return (
    <Card component="section" aria-label="Your next jobs">
      <Group justify="space-between" mb="xs">
        <Title order={2} fz="lg">
          The next {UPCOMING_DAYS} days
        </Title>
        <Anchor component={Link} to={paths.calendar} size="sm">
          Calendar
        </Anchor>
      </Group>
      {overview.isPending ? (
        <Group gap="xs">
          <Loader size="xs" />
          <Text size="sm" c="dimmed">
            Loading your jobs…
          </Text>
        </Group>
      ) : overview.isError ? (
        <Text size="sm" c="red.8">
          Potlife could not load your jobs: {errorMessage(overview.error)}
        </Text>
      ) : (
        <Stack gap="sm">
          <Text size="sm" c="dimmed">
            {overview.data.upcoming.length === 0
              ? 'No job is scheduled in the next month. Give a won job its date on its page.'
              : `${overview.data.upcoming.length} scheduled${short > 0 ? `, ${short} short of stock` : ''}${notReserved > 0 ? `, ${notReserved} not reserved yet` : ''}.`}{' '}
            {overview.data.enquiries > 0 ? (
              <Anchor component={Link} to={`${paths.jobs}?status=enquiry`} size="sm">
                {overview.data.enquiries} enquir{overview.data.enquiries === 1 ? 'y waits' : 'ies wait'} for
                an estimate.
              </Anchor>
            ) : null}
          </Text>
          {overview.data.upcoming.slice(0, 6).map((job) => (
            <Group key={job.id} justify="space-between" wrap="nowrap" gap="sm">
              <div style={{ minWidth: 0 }}>
                <Anchor component={Link} to={hrefs.job(job.id, 'materials')} size="sm" fw={700} lineClamp={1}>
                  {job.reference} · {job.customer.name}
                </Anchor>
                <Text size="xs" c="dimmed">
                  {formatDate(job.scheduledOn)} · {job.title}
                </Text>
              </div>
              <Badge
                color={STATE_COLOURS[job.materialState]}
                variant="light"
                size="sm"
                leftSection={job.materialState === 'short' ? <IconAlertTriangle size={11} /> : undefined}
                style={{ flexShrink: 0 }}
              >
                {STATE_LABELS[job.materialState]}
              </Badge>
            </Group>
          ))}
        </Stack>
      )}
    </Card>
  );
}
