import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import type { Role } from '../../../lib/roles';
import { sessionUser } from '../../../test/fixtures';
import { apiError, json, mockApi, type MockHandler, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import { location, lot, movementsPage } from '../test-data';

function signedIn(role: Role, extra: Record<string, MockHandler> = {}) {
  setAccessToken(`token-${role}`);
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    'GET /api/lots/lot-1': json(lot()),
    'GET /api/stock-movements': json(movementsPage),
    'GET /api/locations': json([
      location(),
      location({ id: 'loc-van', name: 'Van 1', kind: 'van', parentId: null, path: 'Van 1' }),
    ]),
    ...extra,
  });
}

describe('a lot', () => {
  // The screen is a lazy chunk: load it once before the tests, not inside the first one's wait.
  beforeAll(() => import('./LotRoute'));

  it('shows its state in words and its cautions', async () => {
    signedIn('storeman', {
      'GET /api/lots/lot-1': json(
        lot({ exposureFlagged: true, exposureReason: 'Bay A read 27.5 °C, above the 25 °C allowed' }),
      ),
    });
    renderWithProviders(<AppRoutes />, { route: '/stock/lots/lot-1' });
    expect(await screen.findByRole('heading', { name: 'Base resin · batch B24-0917' })).toBeInTheDocument();
    expect(screen.getByText('Available')).toBeInTheDocument();
    expect(screen.getAllByText('Check before use').length).toBeGreaterThan(0);
    expect(screen.getByText('Expires in 12 days')).toBeInTheDocument();
    expect(screen.getByText('Styrene vapour')).toBeInTheDocument();
    expect(screen.queryByText('Work at height and open roof edges')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Clear the flag' })).toBeInTheDocument();
  });

  it('writes off only after the storeman confirms, once, with the reason', async () => {
    const posted: MockRequest[] = [];
    signedIn('storeman', {
      'POST /api/stock-movements': (request) => {
        posted.push(request);
        return json(
          { operationId: 'op-1', movements: [], lot: lot({ quantity: '25.000' }), warnings: [] },
          201,
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/stock/lots/lot-1' });
    await user.click(await screen.findByRole('button', { name: 'Write off' }));
    const dialog = await screen.findByRole('dialog', { name: 'Write off Base resin B24-0917' });
    const quantity = within(dialog).getByLabelText('Quantity (kg)');
    expect(quantity).toHaveValue('50');
    await user.clear(quantity);
    await user.type(quantity, '60');
    await user.click(within(dialog).getByRole('button', { name: 'Next' }));
    expect(await within(dialog).findByText('Only 50 kg of it is there')).toBeInTheDocument();

    await user.clear(quantity);
    await user.type(quantity, '25');
    await user.click(within(dialog).getByRole('button', { name: 'Next' }));
    expect(
      await within(dialog).findByText(
        /Write off 25 kg of Base resin \(batch B24-0917\) at Bay A, as damaged/,
      ),
    ).toBeInTheDocument();
    expect(posted).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Write it off' }));

    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]?.body).toEqual({
      kind: 'write-off',
      lotId: 'lot-1',
      locationId: 'loc-bay',
      quantity: '25',
      reason: 'damaged',
    });
    expect(posted[0]?.headers.get('Idempotency-Key')).toMatch(/.{8,}/);
    expect(await screen.findByText('25 kg written off.')).toBeInTheDocument();
  });

  it('moves stock to another location, showing the refusal when the API gives one', async () => {
    signedIn('storeman', {
      'POST /api/stock-movements': apiError(
        409,
        'Base resin (class 3) may not go to Van 1 while catalyst (class 5.2) is there: keep them apart (HSE CS21).',
        'segregation',
      ),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/stock/lots/lot-1' });
    await user.click(await screen.findByRole('button', { name: 'Move' }));
    const dialog = await screen.findByRole('dialog', { name: 'Move Base resin B24-0917' });
    await user.click(within(dialog).getByRole('combobox', { name: 'To' }));
    await user.click(await screen.findByRole('option', { name: 'Van 1' }));
    await user.click(within(dialog).getByRole('button', { name: 'Next' }));
    await user.click(await within(dialog).findByRole('button', { name: 'Move it' }));
    expect(await within(dialog).findByText(/keep them apart \(HSE CS21\)/)).toBeInTheDocument();
  });

  it('shows the estimator the lot without the buttons that change it', async () => {
    signedIn('estimator');
    renderWithProviders(<AppRoutes />, { route: '/stock/lots/lot-1' });
    expect(await screen.findByRole('heading', { name: 'Base resin · batch B24-0917' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Write off' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Move' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Print label' })).toBeInTheDocument();
  });
});
