import {
  Anchor,
  Badge,
  Breadcrumbs,
  Button,
  Group,
  Paper,
  SimpleGrid,
  Stack,
  Tabs,
  Text,
  Title,
} from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import {
  IconCalculator,
  IconClockHour4,
  IconFiles,
  IconPackages,
  IconPencil,
  IconRuler2,
} from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { PageLoader } from '../../../components/PageLoader';
import { RecordError } from '../../../components/RecordError';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useJob } from '../api/get-job';
import { DocumentsTab } from '../components/DocumentsTab';
import { EditJobModal } from '../components/EditJobModal';
import { JobStatusBadge, MaterialStateBadge } from '../components/JobStatusBadge';
import { StatusHistory } from '../components/StatusHistory';
import { StatusMenu } from '../components/StatusMenu';
import { EstimateTab } from '../components/estimate/EstimateTab';
import { LabourTab } from '../components/labour/LabourTab';
import { MaterialsTab } from '../components/materials/MaterialsTab';
import { RoofTab } from '../components/roof/RoofTab';
import { formatMoney } from '../utils/format';
import { substrateLabels } from '../utils/labels';

const TABS = ['roof', 'estimate', 'materials', 'labour', 'documents'] as const;
type Tab = (typeof TABS)[number];

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={700} lts={0.4}>
        {label}
      </Text>
      <Text size="sm">{children}</Text>
    </div>
  );
}

/** One job: who and where, its status, and tabs for the roof, the estimate, the materials and the papers. */
export function JobRoute() {
  const { jobId = '' } = useParams();
  const user = useSessionUser();
  const job = useJob(jobId);
  const [params, setParams] = useSearchParams();
  const [editOpened, edit] = useDisclosure(false);
  const [roofDirty, setRoofDirty] = useState(false);
  const seesPrices = user.role !== 'storeman';
  const canEdit = user.role !== 'storeman';

  const asked = params.get('tab');
  const available: Tab[] = seesPrices ? [...TABS] : ['roof', 'materials', 'labour', 'documents'];
  const fallback: Tab = seesPrices ? 'roof' : 'materials';
  const tab: Tab = available.find((t) => t === asked) ?? fallback;
  const go = (next: Tab) => setParams({ tab: next }, { replace: true });

  if (job.isPending) {
    return <PageLoader label="Loading the job…" />;
  }
  if (job.isError) {
    return (
      <RecordError
        what="the job"
        notFoundTitle="Job not found"
        backTo={paths.jobs}
        backLabel="the jobs"
        error={job.error}
        onRetry={() => void job.refetch()}
        retrying={job.isFetching}
      />
    );
  }
  const j = job.data;

  return (
    <Stack gap="md">
      <Breadcrumbs>
        <Anchor component={Link} to={paths.jobs} size="sm">
          Jobs
        </Anchor>
        <Text size="sm">{j.reference}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start" wrap="wrap" gap="md">
        <Stack gap={6}>
          <Group gap="sm" wrap="wrap">
            <Title order={1}>
              {j.reference} · {j.title}
            </Title>
            <JobStatusBadge status={j.status} size="lg" />
          </Group>
          <Group gap="xs">
            <MaterialStateBadge state={j.materialState} />
            {seesPrices && j.value ? (
              <Badge variant="light" color="topcoat">
                {formatMoney(j.value)} net
              </Badge>
            ) : null}
          </Group>
        </Stack>
        {canEdit ? (
          <Group gap="sm">
            <Button variant="default" leftSection={<IconPencil size={16} />} onClick={edit.open}>
              Edit details
            </Button>
            <StatusMenu job={j} />
          </Group>
        ) : null}
      </Group>

      <Paper withBorder p="md" radius="md">
        <SimpleGrid cols={{ base: 2, sm: 4, lg: 7 }} spacing="md">
          <Fact label="Customer">
            {j.customer.name}
            {j.customerContact.contactName ? ` (${j.customerContact.contactName})` : ''}
            {j.customerContact.phone ? (
              <>
                <br />
                <Anchor href={`tel:${j.customerContact.phone}`} size="sm">
                  {j.customerContact.phone}
                </Anchor>
              </>
            ) : null}
          </Fact>
          <Fact label="Site">{j.siteAddress}</Fact>
          <Fact label="Date">{j.scheduledOn ? formatDate(j.scheduledOn) : 'Not set'}</Fact>
          <Fact label="Laid on">{substrateLabels[j.substrate]}</Fact>
          <Fact label="Build-up">{j.buildUp?.name ?? 'Not chosen'}</Fact>
          <Fact label="Crew">{j.crew ?? '—'}</Fact>
          <Fact label="Estimator">{j.estimator?.name ?? 'Not chosen'}</Fact>
        </SimpleGrid>
        {j.notes ? (
          <Text size="sm" mt="sm">
            {j.notes}
          </Text>
        ) : null}
      </Paper>
      <StatusHistory history={j.statusHistory} />

      <Tabs value={tab} onChange={(v) => v && go(v as Tab)} keepMounted={false}>
        <Tabs.List>
          <Tabs.Tab value="roof" leftSection={<IconRuler2 size={16} />}>
            Roof plan
          </Tabs.Tab>
          {seesPrices ? (
            <Tabs.Tab value="estimate" leftSection={<IconCalculator size={16} />}>
              Estimate &amp; quote
            </Tabs.Tab>
          ) : null}
          <Tabs.Tab value="materials" leftSection={<IconPackages size={16} />}>
            Materials
          </Tabs.Tab>
          <Tabs.Tab value="labour" leftSection={<IconClockHour4 size={16} />}>
            Labour
          </Tabs.Tab>
          <Tabs.Tab value="documents" leftSection={<IconFiles size={16} />}>
            Documents
          </Tabs.Tab>
        </Tabs.List>
        {/* Kept mounted so a roof half-drawn survives a look at another tab. */}
        <Tabs.Panel value="roof" pt="md" keepMounted>
          <RoofTab job={j} canEdit={canEdit} onDirtyChange={setRoofDirty} />
        </Tabs.Panel>
        {seesPrices ? (
          <Tabs.Panel value="estimate" pt="md">
            <EstimateTab job={j} onGoToRoof={() => go('roof')} roofUnsaved={roofDirty} />
          </Tabs.Panel>
        ) : null}
        <Tabs.Panel value="materials" pt="md">
          <MaterialsTab
            job={j}
            role={user.role}
            onGoToEstimate={seesPrices ? () => go('estimate') : undefined}
            onEditJob={canEdit ? edit.open : undefined}
          />
        </Tabs.Panel>
        <Tabs.Panel value="labour" pt="md">
          <LabourTab job={j} canEdit={canEdit} />
        </Tabs.Panel>
        <Tabs.Panel value="documents" pt="md">
          <DocumentsTab
            job={j}
            seesPrices={seesPrices}
            onGoToEstimate={seesPrices ? () => go('estimate') : undefined}
          />
        </Tabs.Panel>
      </Tabs>
      {canEdit ? <EditJobModal job={j} opened={editOpened} onClose={edit.close} /> : null}
    </Stack>
  );
}
