import { Alert, Button, Grid, Group, Paper, Select, Stack, Text, TextInput } from '@mantine/core';
import { modals } from '@mantine/modals';
import { notifications } from '@mantine/notifications';
import { IconCalculator, IconRuler2 } from '@tabler/icons-react';
import { useState } from 'react';
import { PageLoader } from '../../../../components/PageLoader';
import { QueryError } from '../../../../components/QueryError';
import { useAcceptEstimate } from '../../api/accept-estimate';
import { useCreateEstimate } from '../../api/create-estimate';
import { useDownloadQuote } from '../../api/download-quote';
import { useBuildUps } from '../../api/get-build-ups';
import { useEstimate } from '../../api/get-estimate';
import { useEstimates } from '../../api/get-estimates';
import type { LineRole } from '@potlife/domain';
import type { CostBasis, EstimateSummary, JobDetail } from '../../api/types';
import { ESTIMATING_STATUSES, statusLabels } from '../../utils/labels';
import { formatMoney } from '../../utils/format';
import { EstimateView } from './EstimateView';
import { LayingCheckCard } from './LayingCheckCard';
import { chosenMaterials, RunOptions } from './RunOptions';
import { runRoles } from './run-materials';
import { VersionsTable } from './VersionsTable';

const AIR = /^-?\d{1,2}(\.\d)?$/;

interface EstimateTabProps {
  job: JobDetail;
  onGoToRoof: () => void;
  /** the roof form has changes not saved yet: an estimate now would not see them */
  roofUnsaved?: boolean;
}

/** Run an estimate from the roof and a build-up, compare the versions, accept one, send its quote. */
export function EstimateTab({ job, onGoToRoof, roofUnsaved = false }: EstimateTabProps) {
  const estimates = useEstimates(job.id);
  const buildUps = useBuildUps();
  const create = useCreateEstimate(job.id);
  const accept = useAcceptEstimate(job.id);
  const quote = useDownloadQuote();
  const [buildUpId, setBuildUpId] = useState<string | null>(job.buildUp?.id ?? null);
  const [airC, setAirC] = useState('');
  const [airError, setAirError] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const [chosen, setChosen] = useState<number | null>(null);
  const [costBasis, setCostBasis] = useState<CostBasis>('supplier');
  /** the estimator's material choices for the next run, by role (else the last version's) */
  const [overrides, setOverrides] = useState<Partial<Record<LineRole, string>>>({});

  const versions = estimates.data ?? [];
  const latest = versions.reduce<number | null>(
    (max, v) => (max === null || v.version > max ? v.version : max),
    null,
  );
  const shown = chosen ?? job.acceptedEstimate?.version ?? latest;
  const estimate = useEstimate(job.id, shown);
  const last = useEstimate(job.id, latest);
  const open = ESTIMATING_STATUSES.includes(job.status);

  const run = () => {
    const air = airC.trim();
    if (air !== '' && (!AIR.test(air) || Number(air) < -30 || Number(air) > 50)) {
      setAirError('A temperature from -30 to 50 °C, like 12');
      return;
    }
    setAirError(null);
    const materials = chosenMaterials(runRoles(last.data), overrides);
    create.mutate(
      {
        ...(buildUpId ? { buildUpId } : {}),
        ...(air !== '' ? { airC: air } : {}),
        ...(note.trim() !== '' ? { note: note.trim() } : {}),
        costBasis,
        ...(materials.length > 0 ? { materials } : {}),
      },
      {
        onSuccess: (made) => {
          setChosen(made.version);
          setNote('');
          // the new version is now the starting point of the next run
          setOverrides({});
          notifications.show({
            color: 'green',
            title: `Version ${made.version} made`,
            message: `${formatMoney(made.price.gross)} including VAT, ${made.costBasis === 'stock' ? 'on stock cost' : 'at supplier prices'}${made.unpriced > 0 ? `; ${made.unpriced} without a price` : ''}.`,
          });
        },
      },
    );
  };

  const confirmAccept = (v: EstimateSummary) =>
    modals.openConfirmModal({
      title: `Accept version ${v.version}?`,
      children: (
        <Text size="sm">
          Version {v.version} ({formatMoney(v.gross)} including VAT) becomes the price of the quote, the basis
          for reserving materials and for comparing with what the job really used.
          {job.acceptedEstimate ? ` It replaces version ${job.acceptedEstimate.version}.` : ''}
        </Text>
      ),
      labels: { confirm: `Accept version ${v.version}`, cancel: 'Cancel' },
      onConfirm: () =>
        accept.mutate(v.version, {
          onSuccess: () => {
            setChosen(v.version);
            notifications.show({ color: 'green', message: `Version ${v.version} accepted.` });
          },
        }),
    });

  if (estimates.isPending) {
    return <PageLoader label="Loading the estimates…" />;
  }
  if (estimates.isError) {
    return (
      <QueryError
        what="the estimates"
        error={estimates.error}
        onRetry={() => void estimates.refetch()}
        retrying={estimates.isFetching}
      />
    );
  }

  const buildUpOptions = (buildUps.data ?? []).map((b) => ({ value: b.id, label: b.name }));

  return (
    <Grid gap="lg">
      <Grid.Col span={{ base: 12, xl: 8 }}>
        <Stack gap="md">
          {roofUnsaved ? (
            <Alert
              color="orange"
              variant="light"
              icon={<IconRuler2 size={18} />}
              title="The roof has unsaved changes"
            >
              <Text size="sm">
                An estimate is made from the saved roof. Save the roof first so it counts your changes.
              </Text>
              <Button size="xs" mt="sm" variant="white" onClick={onGoToRoof}>
                Back to the roof plan
              </Button>
            </Alert>
          ) : null}
          {!job.hasRoof ? (
            <Alert
              color="blue"
              variant="light"
              icon={<IconRuler2 size={18} />}
              title="Measure the roof first"
            >
              <Text size="sm">An estimate is worked out from the roof&apos;s areas and edges.</Text>
              <Button size="xs" mt="sm" variant="white" onClick={onGoToRoof}>
                Open the roof plan
              </Button>
            </Alert>
          ) : open ? (
            <Paper withBorder p="md" radius="md" component="section" aria-label="Run an estimate">
              <Stack gap="sm">
                <Text fw={700}>Run an estimate</Text>
                <Group align="flex-end" gap="sm" wrap="wrap">
                  <Select
                    label="Build-up"
                    placeholder={buildUps.isPending ? 'Loading…' : 'Choose a build-up'}
                    data={buildUpOptions}
                    value={buildUpId}
                    onChange={setBuildUpId}
                    w={{ base: '100%', sm: 280 }}
                    comboboxProps={{ withinPortal: true }}
                    error={
                      buildUps.isSuccess && buildUpOptions.length === 0
                        ? 'The owner has not set up a build-up yet'
                        : undefined
                    }
                  />
                  <TextInput
                    label="Air on the day (°C)"
                    placeholder="20"
                    title="The expected air temperature sets the catalyst dose"
                    inputMode="decimal"
                    value={airC}
                    error={airError}
                    onChange={(e) => setAirC(e.currentTarget.value)}
                    w={160}
                  />
                  <TextInput
                    label="Note"
                    placeholder="e.g. with the porch"
                    maxLength={2000}
                    value={note}
                    onChange={(e) => setNote(e.currentTarget.value)}
                    w={{ base: '100%', sm: 220 }}
                  />
                </Group>
                <RunOptions
                  hasDate={job.scheduledOn !== null}
                  costBasis={costBasis}
                  onCostBasis={setCostBasis}
                  last={last.data}
                  lastLoading={latest !== null && last.isPending}
                  overrides={overrides}
                  onChoose={(role, value) => setOverrides((o) => ({ ...o, [role]: value }))}
                />
                <Group justify="flex-end">
                  <Button
                    leftSection={<IconCalculator size={18} />}
                    loading={create.isPending}
                    disabled={!buildUpId || (latest !== null && last.isPending)}
                    onClick={run}
                  >
                    Run estimate
                  </Button>
                </Group>
              </Stack>
            </Paper>
          ) : (
            <Alert color="gray" variant="light">
              The job is {statusLabels[job.status].toLowerCase()}: its estimates are kept as they were.
            </Alert>
          )}

          <Stack gap="xs">
            <Text fw={700}>Versions</Text>
            <VersionsTable
              versions={versions}
              selected={shown}
              canAccept={open}
              accepting={accept.isPending ? (accept.variables ?? null) : null}
              downloading={quote.isPending ? (quote.variables?.version ?? null) : null}
              onSelect={setChosen}
              onAccept={confirmAccept}
              onQuote={(version) => quote.mutate({ jobId: job.id, version, reference: job.reference })}
            />
          </Stack>

          {shown === null ? null : estimate.isPending ? (
            <PageLoader label={`Loading version ${shown}…`} />
          ) : estimate.isError ? (
            <QueryError
              what={`version ${shown}`}
              error={estimate.error}
              onRetry={() => void estimate.refetch()}
              retrying={estimate.isFetching}
            />
          ) : (
            <EstimateView estimate={estimate.data} />
          )}
        </Stack>
      </Grid.Col>
      <Grid.Col span={{ base: 12, xl: 4 }}>
        <LayingCheckCard />
      </Grid.Col>
    </Grid>
  );
}
