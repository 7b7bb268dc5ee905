import { Alert, Button, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import {
  IconAlertOctagon,
  IconArrowDownRight,
  IconCalendarExclamation,
  IconClipboardList,
  IconListCheck,
  IconTemperature,
  IconTemperatureSun,
  IconTruckDelivery,
} from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ExpiryBadge } from '../../../components/LotBadges';
import { PageHeader } from '../../../components/PageHeader';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { hrefs, paths } from '../../../config/paths';
import { formatQuantity } from '../../../lib/amounts';
import { formatDate, formatDateTime } from '../../../lib/format';
import { useSessionUser } from '../../../lib/session';
import { useOverview } from '../../../lib/stock-overview';
import { Panel, PanelItem } from '../components/Panel';

function greeting(now: Date): string {
  const hour = now.getHours();
  return hour < 12 ? 'Good morning' : hour < 18 ? 'Good afternoon' : 'Good evening';
}

const MAX_ITEMS = 6;

/** The storeman's day at a glance: each item links to the screen that deals with it. */
export function StoremanHomeRoute() {
  const user = useSessionUser();
  const overview = useOverview();
  const firstName = user.name.trim().split(/\s+/)[0] ?? user.name;

  return (
    <>
      <PageHeader
        title={`${greeting(new Date())}, ${firstName}`}
        description={`What needs doing in the store at ${user.companyName} today.`}
        actions={
          <>
            <Button component={Link} to={paths.receiptNew} leftSection={<IconTruckDelivery size={18} />}>
              Receive a delivery
            </Button>
            <Button
              component={Link}
              to={paths.counts}
              variant="default"
              leftSection={<IconListCheck size={18} />}
            >
              Counts
            </Button>
            <Button
              component={Link}
              to={paths.temperatures}
              variant="default"
              leftSection={<IconTemperature size={18} />}
            >
              Temperatures
            </Button>
          </>
        }
      />
      {overview.isPending ? (
        <PageLoader label="Looking through the store…" />
      ) : overview.isError ? (
        <QueryError
          what="the store's overview"
          error={overview.error}
          onRetry={() => void overview.refetch()}
          retrying={overview.isFetching}
        />
      ) : (
        <Stack gap="lg">
          {overview.data.segregationProblems.length > 0 ? (
            <Alert
              color="red"
              variant="filled"
              icon={<IconAlertOctagon size={22} />}
              title="Stored together that must be kept apart"
            >
              <Stack gap={4}>
                {overview.data.segregationProblems.map((problem) => (
                  <Group key={problem.locationId} gap="xs" wrap="wrap">
                    <Text size="sm">{problem.message}</Text>
                    <Button
                      component={Link}
                      to={hrefs.stockView('lot', { location: problem.locationId })}
                      size="compact-xs"
                      variant="white"
                      color="red"
                    >
                      See the lots at {problem.locationName}
                    </Button>
                  </Group>
                ))}
              </Stack>
            </Alert>
          ) : null}
          <SimpleGrid cols={{ base: 1, md: 2, xl: 3 }} spacing="lg">
            <Panel
              title="Deliveries due"
              icon={IconTruckDelivery}
              color="blue"
              count={overview.data.deliveriesDue.length}
              empty="Nothing is listed as due: purchase orders are not in Potlife yet. Book each delivery in as it comes with “Receive a delivery”."
              more={{ to: paths.receipts, label: 'See the receipts' }}
            >
              {null}
            </Panel>

            <Panel
              title="Counts open"
              icon={IconClipboardList}
              color="orange"
              count={overview.data.countsOpen.length}
              empty="No count is open. Open one when a location is due a check."
              more={{ to: paths.counts, label: 'All counts' }}
            >
              {overview.data.countsOpen.slice(0, MAX_ITEMS).map((count) => (
                <PanelItem
                  key={count.id}
                  to={hrefs.count(count.id)}
                  title={`Count ${count.number}: ${count.scopeName}`}
                  detail={`${count.status === 'open' ? 'Being counted' : 'Awaiting the owner’s approval'} · opened ${formatDateTime(count.openedAt)}`}
                />
              ))}
            </Panel>

            <Panel
              title="Expiring within 30 days"
              icon={IconCalendarExclamation}
              color="red"
              count={overview.data.expiredInStock.length + overview.data.expiringSoon.length}
              empty="Nothing in stock expires in the next 30 days."
              more={{ to: hrefs.stockView('lot', { expiring: '30' }), label: 'See them in Stock' }}
            >
              {[...overview.data.expiredInStock, ...overview.data.expiringSoon]
                .slice(0, MAX_ITEMS)
                .map((lot) => (
                  <PanelItem
                    key={lot.id}
                    to={hrefs.lot(lot.id)}
                    title={`${lot.materialName}${lot.batchNumber ? ` · ${lot.batchNumber}` : ''}`}
                    detail={`${formatQuantity(lot.quantity, lot.stockUnit)} at ${lot.locationName}`}
                    badge={<ExpiryBadge expiry={lot.expiry} />}
                  />
                ))}
            </Panel>

            <Panel
              title="Temperature alerts"
              icon={IconTemperatureSun}
              color="yellow"
              count={overview.data.temperatureAlerts.length}
              empty="No lot is flagged “check before use”."
              more={{ to: paths.temperatures, label: 'Temperatures' }}
            >
              {overview.data.temperatureAlerts.slice(0, MAX_ITEMS).map((alert) => (
                <PanelItem
                  key={alert.lotId}
                  to={hrefs.lot(alert.lotId)}
                  title={`${alert.materialName}${alert.batchNumber ? ` · ${alert.batchNumber}` : ''}`}
                  detail={`${alert.reason ?? 'Stored outside its range'}${alert.locationNames.length ? ` · ${alert.locationNames.join(', ')}` : ''}`}
                />
              ))}
            </Panel>

            <Panel
              title="Below reorder level"
              icon={IconArrowDownRight}
              color="grape"
              count={overview.data.belowReorder.length}
              empty="Every material is above its reorder level."
              more={{ to: hrefs.stockView('material'), label: 'Stock by material' }}
            >
              {overview.data.belowReorder.slice(0, MAX_ITEMS).map((row) => (
                <PanelItem
                  key={row.materialId}
                  to={hrefs.stockView('lot', { material: row.materialId })}
                  title={`${row.materialCode} ${row.materialName}`}
                  detail={`${formatQuantity(row.usableQuantity, row.stockUnit)} usable; reorder at ${formatQuantity(row.reorderLevel, row.stockUnit)}, order ${formatQuantity(row.reorderQuantity, row.stockUnit)}`}
                />
              ))}
            </Panel>

            <Panel
              title="Segregation problems"
              icon={IconAlertOctagon}
              color="red"
              count={overview.data.segregationProblems.length}
              empty="Catalyst and flammables are kept apart everywhere."
              more={{ to: hrefs.stockView('layout'), label: 'Store layout' }}
            >
              {overview.data.segregationProblems.slice(0, MAX_ITEMS).map((problem) => (
                <PanelItem
                  key={problem.locationId}
                  to={hrefs.stockView('lot', { location: problem.locationId })}
                  title={problem.locationName}
                  detail={problem.materials.join(', ')}
                />
              ))}
            </Panel>
          </SimpleGrid>
          <Text size="xs" c="dimmed">
            As of {formatDate(overview.data.today)}.
          </Text>
        </Stack>
      )}
    </>
  );
}
