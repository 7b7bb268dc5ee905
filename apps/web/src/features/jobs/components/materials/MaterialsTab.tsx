import { Stack } from '@mantine/core';
import { PageLoader } from '../../../../components/PageLoader';
import { QueryError } from '../../../../components/QueryError';
import type { Role } from '../../../../lib/roles';
import { usePickList } from '../../api/get-pick-list';
import { useReservations } from '../../api/get-reservations';
import type { JobDetail } from '../../api/types';
import { PickListPanel } from './PickListPanel';
import { ReservationsPanel } from './ReservationsPanel';
import { ReconciliationPanel } from './ReconciliationPanel';
import { ReturnsPanel } from './ReturnsPanel';
import { statusLabels } from '../../utils/labels';

const ISSUABLE: readonly string[] = ['won', 'scheduled', 'in-progress'];

interface MaterialsTabProps {
  job: JobDetail;
  role: Role;
  onGoToEstimate?: () => void;
  onEditJob?: () => void;
}

/** Reserved, issued and returned: the estimator reserves, the storeman picks, issues and takes back. */
export function MaterialsTab({ job, role, onGoToEstimate, onEditJob }: MaterialsTabProps) {
  const reservations = useReservations(job.id);
  const pickList = usePickList(job.id);
  const store = role === 'storeman' || role === 'owner';
  // The API sends stock only to work that is going ahead.
  const issuing = ISSUABLE.includes(job.status);

  if (reservations.isPending) {
    return <PageLoader label="Loading the materials…" />;
  }
  if (reservations.isError) {
    return (
      <QueryError
        what="the materials"
        error={reservations.error}
        onRetry={() => void reservations.refetch()}
        retrying={reservations.isFetching}
      />
    );
  }
  const pick = pickList.isSuccess ? (
    <PickListPanel
      job={job}
      pickList={pickList.data}
      canIssue={store && issuing}
      issueNote={
        store && !issuing
          ? `Stock goes out once the job is won, scheduled or in progress; it is ${statusLabels[job.status].toLowerCase()}.`
          : null
      }
    />
  ) : pickList.isError ? (
    <QueryError
      what="the pick list"
      error={pickList.error}
      onRetry={() => void pickList.refetch()}
      retrying={pickList.isFetching}
    />
  ) : (
    <PageLoader label="Loading the pick list…" />
  );
  const reserved = (
    <ReservationsPanel
      job={job}
      reservations={reservations.data}
      canReserve={role !== 'storeman'}
      onGoToEstimate={onGoToEstimate}
      onEditJob={onEditJob}
    />
  );
  const returns = (
    <ReturnsPanel job={job} reservations={reservations.data} pickList={pickList.data} canReturn={store} />
  );

  // Once something has gone out, the estimate can be held against what was used (prices: not for the storeman).
  const anyIssued = (pickList.data?.issued ?? []).some((i) => Number(i.issued) > 0);
  const compared =
    role !== 'storeman' && anyIssued && reservations.data.estimate !== null ? (
      <ReconciliationPanel jobId={job.id} />
    ) : null;

  // A finished job is about what it used; the storeman's work first for the storeman.
  if (job.status === 'complete' || job.status === 'invoiced') {
    return (
      <Stack gap="md">
        {compared}
        {returns}
        {reserved}
        {pick}
      </Stack>
    );
  }
  return role === 'storeman' ? (
    <Stack gap="md">
      {pick}
      {returns}
      {reserved}
    </Stack>
  ) : (
    <Stack gap="md">
      {reserved}
      {pick}
      {returns}
      {compared}
    </Stack>
  );
}
