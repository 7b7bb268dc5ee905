import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import { location, lot } from '../test-data';

const byMaterial = {
  by: 'material',
  totalValue: '160.00',
  rows: [
    {
      materialId: 'm-res',
      materialCode: 'RES-25',
      materialName: 'Base resin',
      materialKind: 'base-resin',
      stockUnit: 'kg',
      quantity: '50.000',
      usableQuantity: '50.000',
      value: '160.00',
      lotCount: 1,
      nextExpiry: { expiresOn: '2025-06-20', daysToExpiry: 12, badge: 'expiring' },
      reorderLevel: '75.000',
      reorderQuantity: '100.000',
      belowReorder: true,
    },
  ],
};

function setUp() {
  setAccessToken('token-storeman');
  return mockApi({
    'GET /api/auth/me': json(sessionUser('storeman')),
    'GET /api/stock': json(byMaterial),
    'GET /api/lots': json([
      lot(),
      lot({
        id: 'lot-2',
        batchNumber: 'B24-0602',
        status: 'quarantined',
        expiry: { expiresOn: '2025-05-30', daysToExpiry: -9, badge: 'expired' },
      }),
    ]),
    'GET /api/locations': json([location()]),
  });
}

describe('stock', () => {
  // The screen is a lazy chunk: load it once before the tests, not inside the first one's wait.
  beforeAll(() => import('./StockRoute'));

  it('shows stock by material with the reorder warning and next expiry in words', async () => {
    setUp();
    renderWithProviders(<AppRoutes />, { route: '/stock' });
    const row = (await screen.findByText('RES-25')).closest('tr')!;
    expect(within(row).getByText('50 kg')).toBeInTheDocument(); // in stock (usable shows on wider screens)
    expect(within(row).getByText('Below reorder level')).toBeInTheDocument();
    expect(within(row).getByText('Expires in 12 days')).toBeInTheDocument();
    expect(screen.getByText('£160.00')).toBeInTheDocument();
  });

  it('lists lots with their badges, filtered from the address', async () => {
    const { fetchMock } = setUp();
    renderWithProviders(<AppRoutes />, { route: '/stock?view=lot&expiring=30' });
    expect(await screen.findByText('B24-0602')).toBeInTheDocument();
    const row = screen.getByText('B24-0602').closest('tr')!;
    expect(within(row).getByText('Quarantined')).toBeInTheDocument();
    expect(within(row).getByText('Expired 9 days ago')).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Expiring within 30 days' })).toBeChecked();
    await waitFor(() =>
      expect(fetchMock.mock.calls.some(([url]) => String(url).includes('/lots?expiringWithinDays=30'))).toBe(
        true,
      ),
    );
  });

  it('asks before deleting a location that never held stock', async () => {
    setAccessToken('token-storeman');
    const deleted: string[] = [];
    mockApi({
      'GET /api/auth/me': json(sessionUser('storeman')),
      'GET /api/locations': json([
        location({ id: 'loc-van', name: 'Van 2', kind: 'van', parentId: null, path: 'Van 2', lotCount: 0 }),
      ]),
      'DELETE /api/locations/loc-van': (request) => {
        deleted.push(request.path);
        return { status: 204 };
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/stock?view=layout' });
    await user.click(await screen.findByRole('button', { name: 'Delete Van 2' }));
    const confirm = await screen.findByRole('dialog', { name: 'Delete Van 2?' });
    expect(deleted).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Delete' }));
    await waitFor(() => expect(deleted).toEqual(['/api/locations/loc-van']));
  });
});
