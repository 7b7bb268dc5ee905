import {
  Alert,
  Card,
  Group,
  SegmentedControl,
  Select,
  SimpleGrid,
  Skeleton,
  Stack,
  Tabs,
  Text,
  Title,
} from '@mantine/core';
import { lazy, Suspense } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { useSessionUser } from '../../../lib/session';
import { useTempLocations } from '../api/get-choices';
import { useReadings } from '../api/get-readings';
import { FlaggedLotsCard } from '../components/FlaggedLotsCard';
import { LoggerImport } from '../components/LoggerImport';
import { ReadingsTable } from '../components/ReadingsTable';
import { RecordReadingForm } from '../components/RecordReadingForm';

// The chart library is large: it is fetched only when a chart is first shown.
const ReadingsChart = lazy(() => import('../components/ReadingsChart'));

const PERIODS = [
  { value: '7', label: '7 days' },
  { value: '30', label: '30 days' },
  { value: '90', label: '90 days' },
];

const canRecord = (role: string) => role === 'owner' || role === 'storeman';

export function TemperaturesRoute() {
  const user = useSessionUser();
  const locations = useTempLocations();
  const [params, setParams] = useSearchParams();
  const active = (locations.data ?? []).filter((l) => l.active);
  const chosen = active.find((l) => l.id === params.get('location')) ?? active[0];
  const days = Number(params.get('days') ?? '30') || 30;
  const readings = useReadings(chosen?.id ?? '', days);

  const set = (change: Record<string, string>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(change)) {
      next.set(key, value);
    }
    setParams(next, { replace: true });
  };

  return (
    <>
      <PageHeader
        title="Temperatures"
        description="Store readings per location, typed in or from a data logger. A reading outside a material's storage range flags the lots kept there as “check before use”."
      />
      {locations.isPending ? (
        <PageLoader label="Loading locations…" />
      ) : locations.isError ? (
        <QueryError
          what="the locations"
          error={locations.error}
          onRetry={() => void locations.refetch()}
          retrying={locations.isFetching}
        />
      ) : !chosen ? (
        <Alert color="gray" variant="light" title="No locations yet">
          Set up the store&apos;s locations under Stock › Store layout; then record their temperatures here.
        </Alert>
      ) : (
        <Stack gap="lg">
          <Group gap="sm" wrap="wrap" align="flex-end">
            <Select
              size="md"
              label="Location"
              data={active.map((l) => ({ value: l.id, label: l.path }))}
              value={chosen.id}
              onChange={(value) => value && set({ location: value })}
              searchable
              w={{ base: '100%', sm: 300 }}
            />
            <SegmentedControl
              aria-label="Period"
              value={String(days)}
              onChange={(value) => set({ days: value })}
              data={PERIODS}
            />
          </Group>

          <Card>
            <Title order={2} fz="lg" mb={4}>
              {chosen.path}
            </Title>
            {readings.data?.band && readings.data.band.materials.length > 0 ? (
              <Text size="sm" c="dimmed" mb="sm">
                Kept here now: {readings.data.band.materials.join(', ')}.
              </Text>
            ) : null}
            {readings.isError ? (
              <QueryError
                what="the readings"
                error={readings.error}
                onRetry={() => void readings.refetch()}
                retrying={readings.isFetching}
              />
            ) : readings.isPending ? (
              <Skeleton h={280} />
            ) : readings.data.readings.length === 0 ? (
              <Text size="sm" c="dimmed">
                No readings in the last {days} days.{' '}
                {canRecord(user.role) ? 'Record one below, or import the logger’s file.' : ''}
              </Text>
            ) : (
              <Stack gap="md">
                <Suspense fallback={<Skeleton h={280} />}>
                  <ReadingsChart readings={readings.data.readings} band={readings.data.band} />
                </Suspense>
                <ReadingsTable readings={readings.data.readings} />
              </Stack>
            )}
          </Card>

          {canRecord(user.role) ? (
            <Card>
              <Tabs defaultValue="type">
                <Tabs.List mb="md">
                  <Tabs.Tab value="type">Type a reading</Tabs.Tab>
                  <Tabs.Tab value="import">Import a logger&apos;s file</Tabs.Tab>
                </Tabs.List>
                <Tabs.Panel value="type">
                  <RecordReadingForm key={chosen.id} locationId={chosen.id} locationName={chosen.path} />
                </Tabs.Panel>
                <Tabs.Panel value="import">
                  <LoggerImport key={chosen.id} locationId={chosen.id} locationName={chosen.path} />
                </Tabs.Panel>
              </Tabs>
            </Card>
          ) : null}

          <SimpleGrid cols={1}>
            <FlaggedLotsCard canChange={canRecord(user.role)} />
          </SimpleGrid>
        </Stack>
      )}
    </>
  );
}
