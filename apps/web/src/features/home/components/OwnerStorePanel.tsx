import { Anchor, Badge, Card, Group, Loader, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { hrefs, paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { useOverview } from '../../../lib/stock-overview';

interface Line {
  key: string;
  count: number;
  label: string;
  to: string;
  colour: string;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * What in the store waits for the owner: counts to approve first, then what the storeman's home
 * also shows (temperature flags, expired lots, segregation, reorder levels), as one line each.
 */
export function OwnerStorePanel() {
  const overview = useOverview();

  return (
    <Card component="section" aria-label="The store">
      <Group justify="space-between" mb="xs">
        <Title order={2} fz="lg">
          The store
        </Title>
        <Anchor component={Link} to={paths.stock} size="sm">
          Stock
        </Anchor>
      </Group>
      {overview.isPending ? (
        <Group gap="xs">
          <Loader size="xs" />
          <Text size="sm" c="dimmed">
            Looking through the store…
          </Text>
        </Group>
      ) : overview.isError ? (
        <Text size="sm" c="red.8">
          Potlife could not load the store: {errorMessage(overview.error)}
        </Text>
      ) : (
        (() => {
          const o = overview.data;
          const submitted = o.countsOpen.filter((c) => c.status === 'submitted');
          const lines: Line[] = [
            {
              key: 'counts',
              count: submitted.length,
              label:
                submitted.length === 1
                  ? `Count ${submitted[0]!.number} (${submitted[0]!.scopeName}) waits for your approval`
                  : `${submitted.length} counts wait for your approval`,
              to: submitted.length === 1 ? hrefs.count(submitted[0]!.id) : paths.counts,
              colour: 'blue',
            },
            {
              key: 'segregation',
              count: o.segregationProblems.length,
              label: `${plural(o.segregationProblems.length, 'location breaks', 'locations break')} the storage rules`,
              to: hrefs.stockView('layout'),
              colour: 'red',
            },
            {
              key: 'temperature',
              count: o.temperatureAlerts.length,
              label: `${plural(o.temperatureAlerts.length, 'lot is', 'lots are')} flagged by a temperature reading`,
              to: paths.temperatures,
              colour: 'orange',
            },
            {
              key: 'expired',
              count: o.expiredInStock.length,
              label: `${plural(o.expiredInStock.length, 'lot is', 'lots are')} past its date and still in stock`,
              to: hrefs.stockView('lot', { expiring: '0' }),
              colour: 'red',
            },
            {
              key: 'reorder',
              count: o.belowReorder.length,
              label: `${plural(o.belowReorder.length, 'material is', 'materials are')} below the reorder level`,
              to: hrefs.stockView('material'),
              colour: 'yellow',
            },
          ].filter((l) => l.count > 0);
          return lines.length === 0 ? (
            <Text size="sm" c="dimmed">
              Nothing waits for you in the store: no count to approve, no flagged or expired lot, and every
              material is above its reorder level.
            </Text>
          ) : (
            <Stack gap="xs">
              {lines.map((l) => (
                <Group key={l.key} gap="sm" wrap="nowrap">
                  <Badge color={l.colour} variant="light" size="sm" style={{ flexShrink: 0 }}>
                    {l.count}
                  </Badge>
                  <Anchor component={Link} to={l.to} size="sm">
                    {l.label}
                  </Anchor>
                </Group>
              ))}
            </Stack>
          );
        })()
      )}
    </Card>
  );
}
