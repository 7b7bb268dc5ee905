import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import type { Role } from '../../../lib/roles';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockHandler, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import type { Supplier, SupplierPrice } from '../api/types';

const supplier: Supplier = {
  id: 'sup-1',
  name: 'Brackwater Resins',
  orderEmail: 'orders@brackwater.test',
  phone: '01632 960 100',
  address: '4 Kiln Lane\nHollowmere',
  leadTimeDays: 3,
  active: true,
  notes: null,
  contacts: [
    {
      id: 'c-1',
      name: 'Nell Farrow',
      email: 'nell@brackwater.test',
      phone: null,
      role: 'Trade counter',
      createdAt: '2025-01-01T08:00:00Z',
    },
  ],
  createdAt: '2025-01-01T08:00:00Z',
  updatedAt: '2025-01-01T08:00:00Z',
};

const price: SupplierPrice = {
  id: 'p-2',
  supplierId: 'sup-1',
  supplierName: 'Brackwater Resins',
  supplierActive: true,
  materialId: 'm-res',
  materialCode: 'RES-25',
  materialName: 'Base resin',
  materialKind: 'base-resin',
  materialActive: true,
  stockUnit: 'kg',
  packSize: '25',
  packLabel: '25 kg drum',
  packPrice: '86.40',
  unitPrice: '3.4560',
  validFrom: '2025-04-01',
  supplierCode: 'BR-25',
  previous: { id: 'p-1', packPrice: '82.00', validFrom: '2025-01-06' },
  next: null,
  createdAt: '2025-03-20T08:00:00Z',
};

function signedIn(role: Role, extra: Record<string, MockHandler> = {}) {
  setAccessToken(`token-${role}`);
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    'GET /api/suppliers/sup-1': json(supplier),
    'GET /api/suppliers/sup-1/prices': json({
      items: [price],
      total: 1,
      page: 1,
      pageSize: 25,
      on: '2025-06-02',
    }),
    'GET /api/materials/m-res/prices': json({
      material: { id: 'm-res', code: 'RES-25', name: 'Base resin', stockUnit: 'kg' },
      on: '2025-06-02',
      packs: [
        {
          packSize: '25',
          packLabel: '25 kg drum',
          prices: [
            {
              ...price,
              history: [
                {
                  id: 'p-2',
                  packPrice: '86.40',
                  validFrom: '2025-04-01',
                  supplierCode: 'BR-25',
                  createdAt: '2025-03-20T08:00:00Z',
                },
                {
                  id: 'p-1',
                  packPrice: '82.00',
                  validFrom: '2025-01-06',
                  supplierCode: 'BR-25',
                  createdAt: '2025-01-02T08:00:00Z',
                },
              ],
            },
          ],
        },
      ],
    }),
    ...extra,
  });
}

describe('a supplier', () => {
  beforeAll(() => import('./SupplierRoute'));

  it('shows contacts and prices, and the history of a price when its row is opened', async () => {
    signedIn('storeman');
    const { user } = renderWithProviders(<AppRoutes />, { route: '/suppliers/sup-1' });
    expect(await screen.findByRole('heading', { name: 'Brackwater Resins' })).toBeInTheDocument();
    expect(screen.getByText('Nell Farrow')).toBeInTheDocument();
    const row = (await screen.findByText('RES-25')).closest('tr')!;
    expect(within(row).getByText('£86.40')).toBeInTheDocument();
    expect(within(row).getByText('(was £82.00)')).toBeInTheDocument();

    await user.click(within(row).getByText('Base resin'));
    const history = await screen.findByRole('table', { name: 'Price history of RES-25 25 kg drum' });
    expect(within(history).getByText('£82.00')).toBeInTheDocument();
    expect(within(history).getByText(/6 Jan 2025/)).toBeInTheDocument();

    // The storeman reads; only the owner and estimator change suppliers.
    expect(screen.queryByRole('button', { name: 'Add a price' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add a contact' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Change' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeInTheDocument();
  });

  it('asks before removing a contact', async () => {
    const deleted: MockRequest[] = [];
    signedIn('estimator', {
      'DELETE /api/suppliers/sup-1/contacts/c-1': (request) => {
        deleted.push(request);
        return { status: 204 };
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/suppliers/sup-1' });
    await user.click(await screen.findByRole('button', { name: 'Remove Nell Farrow' }));
    const confirm = await screen.findByRole('dialog', { name: 'Remove Nell Farrow?' });
    expect(deleted).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Remove' }));
    await waitFor(() => expect(deleted).toHaveLength(1));
  });

  it('adds a new price for a pack, keeping the old one as history', async () => {
    const posted: MockRequest[] = [];
    signedIn('owner', {
      'GET /api/materials': json({
        items: [
          {
            id: 'm-res',
            code: 'RES-25',
            name: 'Base resin',
            stockUnit: 'kg',
            packSizes: [{ size: '25', label: '25 kg drum' }],
          },
        ],
        total: 1,
        page: 1,
        pageSize: 200,
      }),
      'POST /api/suppliers/sup-1/prices': (request) => {
        posted.push(request);
        return json({ ...price, id: 'p-3', packPrice: '88.00', validFrom: '2025-07-01' }, 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/suppliers/sup-1' });
    await user.click(await screen.findByRole('button', { name: 'New price for RES-25 25 kg drum' }));
    const dialog = await screen.findByRole('dialog', { name: 'New price from Brackwater Resins' });
    await user.click(within(dialog).getByRole('button', { name: 'Save price' }));
    expect(await within(dialog).findByText('Enter the price per pack')).toBeInTheDocument();
    await user.type(within(dialog).getByLabelText('Price per pack (£)'), '88.005');
    await user.click(within(dialog).getByRole('button', { name: 'Save price' }));
    expect(await within(dialog).findByText('Write pounds and pence, like 86.40')).toBeInTheDocument();
    await user.clear(within(dialog).getByLabelText('Price per pack (£)'));
    await user.type(within(dialog).getByLabelText('Price per pack (£)'), '88.00');
    await user.clear(within(dialog).getByLabelText('Valid from'));
    await user.type(within(dialog).getByLabelText('Valid from'), '2025-07-01');
    await user.click(within(dialog).getByRole('button', { name: 'Save price' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]?.body).toEqual({
      materialId: 'm-res',
      packSize: '25',
      packPrice: '88.00',
      validFrom: '2025-07-01',
      supplierCode: 'BR-25',
    });
  });
});
