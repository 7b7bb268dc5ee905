import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import type { StockOverview } from '../../../lib/stock-overview';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';

const quiet: StockOverview = {
  today: '2026-12-01',
  deliveriesDue: [],
  countsOpen: [],
  expiringSoon: [],
  expiredInStock: [],
  temperatureAlerts: [],
  segregationProblems: [],
  belowReorder: [],
};

const base = {
  'GET /api/auth/me': json(sessionUser('owner')),
  'GET /api/jobs/calendar': json([]),
  'GET /api/jobs': json({ items: [], total: 0, page: 1, pageSize: 1 }),
};

describe('the owner’s store panel', () => {
  it('puts the count waiting for approval first, linking to it, and one line per other problem', async () => {
    setAccessToken('token');
    mockApi({
      ...base,
      'GET /api/stock/overview': json({
        ...quiet,
        countsOpen: [
          {
            id: 'count-7',
            number: 7,
            status: 'submitted',
            locationId: 'l1',
            scopeName: 'Bay A',
            openedAt: '2026-11-30T08:00:00Z',
          },
          {
            id: 'count-8',
            number: 8,
            status: 'open',
            locationId: 'l2',
            scopeName: 'Van 1',
            openedAt: '2026-11-30T09:00:00Z',
          },
        ],
        temperatureAlerts: [
          {
            lotId: 'lot-1',
            materialName: 'Catalyst',
            batchNumber: 'PX-1',
            quantity: '5',
            stockUnit: 'kg',
            locationNames: ['Peroxide store'],
            reason: 'warm',
            flaggedAt: null,
          },
          {
            lotId: 'lot-2',
            materialName: 'Catalyst',
            batchNumber: 'PX-2',
            quantity: '1',
            stockUnit: 'kg',
            locationNames: ['Peroxide store'],
            reason: 'warm',
            flaggedAt: null,
          },
        ],
      } satisfies StockOverview),
    });
    renderWithProviders(<AppRoutes />, { route: '/' });
    const panel = await screen.findByRole('region', { name: 'The store' });
    await within(panel).findByRole('link', { name: 'Count 7 (Bay A) waits for your approval' });
    const links = within(panel).getAllByRole('link');
    expect(links.map((a) => a.textContent)).toEqual([
      'Stock',
      'Count 7 (Bay A) waits for your approval',
      '2 lots are flagged by a temperature reading',
    ]);
    expect(links[1]).toHaveAttribute('href', '/counts/count-7');
    // the owner also sees the next jobs
    expect(screen.getByRole('region', { name: 'Your next jobs' })).toBeInTheDocument();
  });

  it('says so when nothing waits', async () => {
    setAccessToken('token');
    mockApi({ ...base, 'GET /api/stock/overview': json(quiet) });
    renderWithProviders(<AppRoutes />, { route: '/' });
    const panel = await screen.findByRole('region', { name: 'The store' });
    expect(await within(panel).findByText(/Nothing waits for you in the store/)).toBeInTheDocument();
  });
});
