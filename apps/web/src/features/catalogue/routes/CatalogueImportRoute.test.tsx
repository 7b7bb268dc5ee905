import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { installFakeXhr } from '../../../test/fake-xhr';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';

const CSV =
  'code,name,kind,stock_unit,pack_sizes\nRES-25,Base resin,base-resin,kg,25:25 kg drum\nMAT-X,Mat,mat,m2,64:64 m² roll\n';

const withErrors = {
  rows: [
    { row: 2, action: 'update', code: 'RES-25', name: 'Base resin', errors: [] },
    {
      row: 3,
      action: 'create',
      code: 'MAT-X',
      name: 'Mat',
      errors: [
        { field: 'mat_gsm', message: 'a mat needs its weight in g/m² (e.g. 300, 450, 600)' },
        { field: 'roll_width_m', message: 'a mat needs its roll width in metres (e.g. 1.04)' },
      ],
    },
  ],
  valid: 1,
  invalid: 1,
  created: 0,
  updated: 1,
  unchanged: 0,
  committed: false,
};

const clean = {
  rows: [
    { row: 2, action: 'update', code: 'RES-25', name: 'Base resin', errors: [] },
    { row: 3, action: 'create', code: 'MAT-X', name: 'Mat', errors: [] },
  ],
  valid: 2,
  invalid: 0,
  created: 1,
  updated: 1,
  unchanged: 0,
  committed: false,
};

function csvFile(text: string) {
  return new File([text], 'catalogue.csv', { type: 'text/csv' });
}

describe('catalogue import', () => {
  // The screen is a lazy chunk: load it once before the tests, not inside the first one's wait.
  beforeAll(() => import('./CatalogueImportRoute'));

  it('lists each bad row with its number and reason, and imports nothing while any is bad', async () => {
    setAccessToken('token-owner');
    const { sent } = installFakeXhr();
    mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'POST /api/materials/import': json(withErrors),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue/import' });

    await user.upload(await screen.findByLabelText('Choose the catalogue CSV'), csvFile(CSV));

    expect(await screen.findByText('1 of 2 rows have problems')).toBeInTheDocument();
    const bad = screen.getByText('MAT-X').closest('tr')!;
    expect(within(bad).getByText('3')).toBeInTheDocument();
    expect(
      within(bad).getByText('mat_gsm: a mat needs its weight in g/m² (e.g. 300, 450, 600)'),
    ).toBeInTheDocument();
    expect(
      within(bad).getByText('roll_width_m: a mat needs its roll width in metres (e.g. 1.04)'),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Fix the rows first' })).toBeDisabled();

    expect(sent).toHaveLength(1);
    expect(sent[0]?.url).toContain('/api/materials/import?mode=preview');
    expect(JSON.parse(String(sent[0]?.body))).toEqual({ csv: CSV });
  });

  it('previews a clean file, then commits it', async () => {
    setAccessToken('token-estimator');
    const { sent } = installFakeXhr();
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'POST /api/materials/import': () =>
        json(sent[sent.length - 1]?.url.includes('mode=commit') ? { ...clean, committed: true } : clean),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue/import' });

    await user.upload(await screen.findByLabelText('Choose the catalogue CSV'), csvFile(CSV));
    expect(await screen.findByText('Every row can be imported')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Import 2 materials' }));

    expect(await screen.findByText('Imported')).toBeInTheDocument();
    expect(screen.getByText(/1 new, 1 changed, 0 unchanged/)).toBeInTheDocument();
    await waitFor(() =>
      expect(sent.map((s) => s.url.split('?')[1])).toEqual(['mode=preview', 'mode=commit']),
    );
  });

  it('tells the storeman the import needs another role', async () => {
    setAccessToken('token-storeman');
    mockApi({ 'GET /api/auth/me': json(sessionUser('storeman')) });
    renderWithProviders(<AppRoutes />, { route: '/catalogue/import' });
    expect(
      await screen.findByRole('heading', { name: 'This page needs the owner or estimator role' }),
    ).toBeInTheDocument();
  });
});
