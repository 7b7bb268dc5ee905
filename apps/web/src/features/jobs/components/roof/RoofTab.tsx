import { Alert, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { useMemo } from 'react';
import { PageLoader } from '../../../../components/PageLoader';
import { QueryError } from '../../../../components/QueryError';
import { useBuildUp } from '../../api/get-build-up';
import { useRoof } from '../../api/get-roof';
import type { JobDetail, RoofRecord } from '../../api/types';
import { CLOSED_STATUSES, statusLabels } from '../../utils/labels';
import { RoofEditor } from './RoofEditor';
import { RoofPlan } from './RoofPlan';
import { RoofTotals } from './RoofTotals';
import { fromStoredRoof, previewRoof } from './roof-model';

/** The saved roof, drawn, with the API's totals: for the storeman, and for closed jobs. */
export function RoofView({ record }: { record: RoofRecord }) {
  const draft = useMemo(() => fromStoredRoof(record.roof), [record.roof]);
  const preview = useMemo(() => previewRoof(draft), [draft]);
  if (record.roof === null) {
    return (
      <Text size="sm" c="dimmed">
        The roof has not been measured yet. The estimator draws it here.
      </Text>
    );
  }
  return (
    <Stack gap="sm" maw={760}>
      <RoofPlan draft={draft} preview={preview} />
      <RoofTotals figures={record.summary} />
      {(record.summary?.warnings ?? []).map((w) => (
        <Alert key={w} color="yellow" variant="light" icon={<IconAlertTriangle size={18} />}>
          {w}
        </Alert>
      ))}
      {record.roof.notes ? (
        <Text size="sm">
          <b>Notes:</b> {record.roof.notes}
        </Text>
      ) : null}
    </Stack>
  );
}

interface RoofTabProps {
  job: JobDetail;
  canEdit: boolean;
  onDirtyChange?: (dirty: boolean) => void;
}

export function RoofTab({ job, canEdit, onDirtyChange }: RoofTabProps) {
  const roof = useRoof(job.id);
  const buildUp = useBuildUp(job.buildUp?.id, canEdit);

  if (roof.isPending || (canEdit && !!job.buildUp && buildUp.isPending)) {
    return <PageLoader label="Loading the roof…" />;
  }
  if (roof.isError) {
    return (
      <QueryError
        what="the roof"
        error={roof.error}
        onRetry={() => void roof.refetch()}
        retrying={roof.isFetching}
      />
    );
  }
  if (!canEdit) {
    return <RoofView record={roof.data} />;
  }
  const closed = CLOSED_STATUSES.includes(job.status);
  return (
    <RoofEditor
      // One working copy per job: a save keeps the editor (it takes the saved roof itself).
      key={job.id}
      jobId={job.id}
      record={roof.data}
      upstandM={buildUp.data?.upstandM}
      onDirtyChange={onDirtyChange}
      readOnlyReason={
        closed
          ? `The job is ${statusLabels[job.status].toLowerCase()}: its roof is kept as it was measured.`
          : null
      }
    />
  );
}
