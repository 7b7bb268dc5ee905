import { Alert, Badge, Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import { PageLoader } from '../../../../components/PageLoader';
import { QueryError } from '../../../../components/QueryError';
import { useLabour } from '../../api/get-labour';
import { useReconciliation } from '../../api/get-reconciliation';
import type { JobDetail } from '../../api/types';
import { formatMoney, formatNumber } from '../../utils/format';
import { LabourCostLine } from './LabourCostLine';
import { LabourEntriesTable } from './LabourEntriesTable';
import { LabourForm } from './LabourForm';

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={700}>
        {label}
      </Text>
      <Text fw={700}>{value}</Text>
    </div>
  );
}

interface LabourTabProps {
  job: JobDetail;
  /** owners and estimators record hours and see what they cost; the storeman reads the hours */
  canEdit: boolean;
}

/** The hours the crew actually worked: recorded day by day, and (for those who price) what they cost. */
export function LabourTab({ job, canEdit }: LabourTabProps) {
  const labour = useLabour(job.id);
  const rec = useReconciliation(job.id, canEdit && job.acceptedEstimate !== null);

  if (labour.isPending) {
    return <PageLoader label="Loading the hours…" />;
  }
  if (labour.isError) {
    return (
      <QueryError
        what="the hours"
        error={labour.error}
        onRetry={() => void labour.refetch()}
        retrying={labour.isFetching}
      />
    );
  }
  const sheet = labour.data;
  const names = [
    ...sheet.byCrewMember.map((c) => c.crewMember),
    ...(job.crew ?? '')
      .split(/,|\band\b|&/)
      .map((n) => n.trim())
      .filter(Boolean),
  ];

  return (
    <Stack gap="md">
      <Paper withBorder p="md" radius="md" component="section" aria-label="Hours on the job">
        <Stack gap="sm">
          <SimpleGrid cols={{ base: 2, sm: canEdit ? 4 : 2 }} spacing="sm">
            <Figure
              label="Estimated"
              value={
                sheet.estimatedHours === null
                  ? 'No estimate accepted'
                  : `${formatNumber(sheet.estimatedHours)} h`
              }
            />
            <Figure label="Recorded" value={`${formatNumber(sheet.recordedHours)} h`} />
            {canEdit && rec.data ? (
              <>
                <Figure label="Rate" value={`${formatMoney(rec.data.labour.rate)}/h`} />
                <Figure
                  label="Labour in the margin"
                  value={`${formatMoney(rec.data.totals.labour)} (${rec.data.labour.basis === 'recorded' ? 'recorded' : 'estimate'})`}
                />
              </>
            ) : null}
          </SimpleGrid>
          {canEdit && rec.data ? <LabourCostLine reconciliation={rec.data} /> : null}
          {canEdit && job.acceptedEstimate === null ? (
            <Text size="sm" c="dimmed">
              Accept an estimate to see what the hours cost at its labour rate.
            </Text>
          ) : null}
          {sheet.byCrewMember.length > 0 ? (
            <Group gap="xs" aria-label="Hours by crew member">
              {sheet.byCrewMember.map((c) => (
                <Badge key={c.crewMember} variant="light" color="gray" tt="none">
                  {c.crewMember}: {formatNumber(c.hours)} h
                </Badge>
              ))}
            </Group>
          ) : null}
        </Stack>
      </Paper>
      {!sheet.open ? (
        <Alert color="gray" icon={<IconLock size={18} />} title="Hours cannot be changed now">
          {sheet.closedReason}
        </Alert>
      ) : canEdit ? (
        <LabourForm jobId={job.id} names={names} />
      ) : null}
      <LabourEntriesTable jobId={job.id} entries={sheet.entries} canStrike={canEdit && sheet.open} />
    </Stack>
  );
}
