import { Alert, Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { EDGE_KINDS, type Decimal } from '@potlife/domain';
import { IconAlertTriangle } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { EdgeSample } from './RoofPlan';
import { EDGE_STYLES } from './edge-styles';
import { formatArea, formatLength } from '../../utils/format';

/** The figures the plan shows, from the domain's take-off (live) or the API's summary (saved). */
export interface RoofFigures {
  deckAreaM2: string | Decimal;
  upstandAreaM2: string | Decimal;
  laminatedAreaM2: string | Decimal;
  trimM: string | Decimal;
  trimMByKind: Record<string, string | Decimal>;
  corners: { external: number; internal: number; derived: boolean };
  pipes: number;
  outlets: number;
}

function Figure({ label, value, strong = false }: { label: string; value: ReactNode; strong?: boolean }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={700} lts={0.4}>
        {label}
      </Text>
      <Text size={strong ? 'xl' : 'md'} fw={strong ? 800 : 600}>
        {value}
      </Text>
    </div>
  );
}

interface RoofTotalsProps {
  figures: RoofFigures | null;
  /** areas left out of the totals until their problem is fixed */
  leftOut?: string[];
  problem?: string | null;
}

export function RoofTotals({ figures, leftOut = [], problem = null }: RoofTotalsProps) {
  return (
    <Paper withBorder p="md" radius="md" aria-label="Roof totals" component="section">
      <Stack gap="sm">
        {problem ? (
          <Alert
            color="red"
            variant="light"
            icon={<IconAlertTriangle size={18} />}
            title="The roof cannot be totalled"
          >
            {problem}
          </Alert>
        ) : null}
        {leftOut.length > 0 && figures ? (
          <Text size="sm" c="orange.9">
            Not yet counted: {leftOut.join(', ')} (finish or fix {leftOut.length === 1 ? 'it' : 'them'} in the
            form).
          </Text>
        ) : null}
        {figures ? (
          <>
            <SimpleGrid cols={3} spacing="sm">
              <Figure label="Deck" value={formatArea(figures.deckAreaM2)} />
              <Figure label="Upstands" value={formatArea(figures.upstandAreaM2)} />
              <Figure label="Laminated" value={formatArea(figures.laminatedAreaM2)} strong />
            </SimpleGrid>
            <Group gap="lg" wrap="wrap">
              {EDGE_KINDS.map((kind) => (
                <Group key={kind} gap={6} wrap="nowrap">
                  <EdgeSample style={EDGE_STYLES[kind]} />
                  <Text size="sm">
                    {EDGE_STYLES[kind].label} {formatLength(figures.trimMByKind[kind] ?? '0')}
                  </Text>
                </Group>
              ))}
            </Group>
            <Text size="sm" c="dimmed">
              {formatLength(figures.trimM)} of trim · corner pieces {figures.corners.external} external,{' '}
              {figures.corners.internal} internal
              {figures.corners.derived ? ' (from the order of the edges)' : ''} · {figures.pipes} pipe
              {figures.pipes === 1 ? '' : 's'} · {figures.outlets} outlet
              {figures.outlets === 1 ? '' : 's'}
            </Text>
          </>
        ) : !problem ? (
          <Text size="sm" c="dimmed">
            The totals appear as soon as one area has its measurements.
          </Text>
        ) : null}
      </Stack>
    </Paper>
  );
}
