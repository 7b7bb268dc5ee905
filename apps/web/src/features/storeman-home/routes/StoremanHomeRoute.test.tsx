import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import type { StockOverview } from '../../../lib/stock-overview';

const overview: StockOverview = {
  today: '2025-06-02',
  deliveriesDue: [],
  countsOpen: [
    {
      id: 'count-1',
      number: 7,
      status: 'submitted',
      locationId: 'loc-bay',
      scopeName: 'Bay A',
      openedAt: '2025-06-01T08:00:00Z',
    },
  ],
  expiringSoon: [
    {
      id: 'lot-1',
      materialName: 'Topcoat, slate grey',
      materialCode: 'TOP-GRY',
      batchNumber: 'T-11',
      quantity: '10.000',
      stockUnit: 'kg',
      locationName: 'Bay A',
      expiry: { expiresOn: '2025-06-14', daysToExpiry: 12, badge: 'expiring' },
    },
  ],
  expiredInStock: [
    {
      id: 'lot-2',
      materialName: 'Base resin',
      materialCode: 'RES-25',
      batchNumber: 'B24-0602',
      quantity: '25.000',
      stockUnit: 'kg',
      locationName: 'Bay A',
      expiry: { expiresOn: '2025-05-28', daysToExpiry: -5, badge: 'expired' },
    },
  ],
  temperatureAlerts: [
    {
      lotId: 'lot-cat',
      materialName: 'Catalyst',
      batchNumber: 'PX-11',
      quantity: '10.000',
      stockUnit: 'kg',
      locationNames: ['Peroxide store'],
      reason: '27.5 °C, above the 25 °C allowed',
      flaggedAt: '2025-06-01T12:00:00Z',
    },
  ],
  segregationProblems: [
    {
      locationId: 'loc-van',
      locationName: 'Van 1',
      classes: ['3', '5.2'],
      materials: ['Catalyst', 'Acetone'],
      message:
        'Van 1 holds catalyst (class 5.2) with flammable liquid (class 3): keep them apart (HSE CS21).',
    },
  ],
  belowReorder: [
    {
      materialId: 'm-ace',
      materialCode: 'ACE',
      materialName: 'Acetone',
      stockUnit: 'L',
      usableQuantity: '10.000',
      reorderLevel: '25.000',
      reorderQuantity: '50.000',
    },
  ],
};

describe("the storeman's home", () => {
  beforeAll(() => import('./StoremanHomeRoute'));

  it('lists what needs doing, each item linking to the screen that deals with it', async () => {
    setAccessToken('token-storeman');
    mockApi({ 'GET /api/auth/me': json(sessionUser('storeman')), 'GET /api/stock/overview': json(overview) });
    renderWithProviders(<AppRoutes />, { route: '/' });

    const counts = await screen.findByRole('region', { name: 'Counts open' });
    expect(within(counts).getByRole('link', { name: 'Count 7: Bay A' })).toHaveAttribute(
      'href',
      '/counts/count-1',
    );

    const expiring = screen.getByRole('region', { name: 'Expiring within 30 days' });
    expect(within(expiring).getByRole('link', { name: 'Base resin · B24-0602' })).toHaveAttribute(
      'href',
      '/stock/lots/lot-2',
    );
    expect(within(expiring).getByText('Expired 5 days ago')).toBeInTheDocument();
    expect(within(expiring).getByText('Expires in 12 days')).toBeInTheDocument();
    expect(within(expiring).getByRole('link', { name: 'See them in Stock' })).toHaveAttribute(
      'href',
      '/stock?view=lot&expiring=30',
    );

    const alerts = screen.getByRole('region', { name: 'Temperature alerts' });
    expect(within(alerts).getByRole('link', { name: 'Catalyst · PX-11' })).toHaveAttribute(
      'href',
      '/stock/lots/lot-cat',
    );

    const reorder = screen.getByRole('region', { name: 'Below reorder level' });
    expect(within(reorder).getByText('10 L usable; reorder at 25 L, order 50 L')).toBeInTheDocument();

    expect(screen.getAllByText(/keep them apart \(HSE CS21\)/).length).toBeGreaterThan(0);
    expect(screen.getByRole('link', { name: 'See the lots at Van 1' })).toHaveAttribute(
      'href',
      '/stock?view=lot&location=loc-van',
    );

    const deliveries = screen.getByRole('region', { name: 'Deliveries due' });
    expect(within(deliveries).getByText(/purchase orders are not in Potlife yet/)).toBeInTheDocument();
  });

  it('keeps the general home for the owner (with a store panel of its own)', async () => {
    setAccessToken('token-owner');
    mockApi({ 'GET /api/auth/me': json(sessionUser('owner')) });
    renderWithProviders(<AppRoutes />, { route: '/' });
    expect(await screen.findByRole('heading', { name: 'Your work in Potlife' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Receive a delivery' })).not.toBeInTheDocument();
  });
});
