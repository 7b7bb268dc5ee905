import { Button, Tabs } from '@mantine/core';
import type { MaterialKind } from '@potlife/domain';
import { IconTruckDelivery } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router-dom';
import type { LotStatusValue } from '../../../components/LotBadges';
import { PageHeader } from '../../../components/PageHeader';
import { paths } from '../../../config/paths';
import { useSessionUser } from '../../../lib/session';
import type { LotFilters } from '../api/types';
import { canChangeStock } from '../components/can-change-stock';
import { LocationsPanel } from '../components/LocationsPanel';
import { LotsTable } from '../components/LotsTable';
import { StockByLocationTable } from '../components/StockByLocationTable';
import { StockByMaterialTable } from '../components/StockByMaterialTable';

type View = 'material' | 'location' | 'lot' | 'layout';
const VIEWS: readonly View[] = ['material', 'location', 'lot', 'layout'];
const STATUSES: readonly string[] = ['available', 'quarantined', 'expired', 'written-off'];

/** The view and its filters live in the address, so Home can link straight to "lots expiring soon". */
function filtersFrom(params: URLSearchParams): LotFilters {
  const status = params.get('status');
  const expiring = params.get('expiring');
  return {
    materialId: params.get('material') ?? undefined,
    locationId: params.get('location') ?? undefined,
    status: status && STATUSES.includes(status) ? (status as LotStatusValue) : undefined,
    expiringWithinDays: expiring && /^\d+$/.test(expiring) ? Number(expiring) : undefined,
    flagged: params.get('flagged') === 'true' ? true : undefined,
    includeEmpty: params.get('empty') === 'true' ? true : undefined,
  };
}

function paramsFrom(view: View, filters: LotFilters, kind?: string): Record<string, string> {
  const out: Record<string, string> = { view };
  if (view === 'lot') {
    if (filters.materialId) {
      out.material = filters.materialId;
    }
    if (filters.locationId) {
      out.location = filters.locationId;
    }
    if (filters.status) {
      out.status = filters.status;
    }
    if (filters.expiringWithinDays !== undefined) {
      out.expiring = String(filters.expiringWithinDays);
    }
    if (filters.flagged) {
      out.flagged = 'true';
    }
    if (filters.includeEmpty) {
      out.empty = 'true';
    }
  }
  if (view === 'material' && kind) {
    out.kind = kind;
  }
  return out;
}

export function StockRoute() {
  const user = useSessionUser();
  const canChange = canChangeStock(user.role);
  const [params, setParams] = useSearchParams();
  const rawView = params.get('view');
  const view: View =
    rawView && (VIEWS as readonly string[]).includes(rawView) ? (rawView as View) : 'material';
  const filters = filtersFrom(params);
  const kind = (params.get('kind') ?? undefined) as MaterialKind | undefined;

  return (
    <>
      <PageHeader
        title="Stock"
        description="What is in the store: by material, by location, and lot by lot with expiry and status. Every change is a movement in the ledger."
        actions={
          canChange ? (
            <Button component={Link} to={paths.receiptNew} leftSection={<IconTruckDelivery size={18} />}>
              Receive a delivery
            </Button>
          ) : null
        }
      />
      <Tabs
        value={view}
        onChange={(value) =>
          setParams(paramsFrom((value as View) ?? 'material', view === 'lot' ? filters : {}, kind), {
            replace: true,
          })
        }
        keepMounted={false}
      >
        <Tabs.List mb="md">
          <Tabs.Tab value="material">By material</Tabs.Tab>
          <Tabs.Tab value="location">By location</Tabs.Tab>
          <Tabs.Tab value="lot">Lots</Tabs.Tab>
          <Tabs.Tab value="layout">Store layout</Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="material">
          <StockByMaterialTable
            kind={kind}
            onKindChange={(next) => setParams(paramsFrom('material', {}, next), { replace: true })}
          />
        </Tabs.Panel>
        <Tabs.Panel value="location">
          <StockByLocationTable />
        </Tabs.Panel>
        <Tabs.Panel value="lot">
          <LotsTable
            filters={filters}
            onFiltersChange={(next) => setParams(paramsFrom('lot', next), { replace: true })}
          />
        </Tabs.Panel>
        <Tabs.Panel value="layout">
          <LocationsPanel canEdit={canChange} />
        </Tabs.Panel>
      </Tabs>
    </>
  );
}
