import { screen, waitFor, within } from '@testing-library/react';
import type { UserEvent } from '@testing-library/user-event';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import type { Role } from '../../../lib/roles';
import { sessionUser } from '../../../test/fixtures';
import { apiError, json, mockApi, type MockHandler, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import { material, materials, page } from '../test-data';

/** Puts text into a field in one go (typing key by key re-renders the whole form each time). */
async function fill(user: UserEvent, field: HTMLElement, text: string) {
  await user.click(field);
  await user.paste(text);
}

function signedIn(role: Role, extra: Record<string, MockHandler> = {}) {
  setAccessToken(`token-${role}`);
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    'GET /api/materials': json(page(materials)),
    ...extra,
  });
}

describe('catalogue', () => {
  // The screen is a lazy chunk: load it once before the tests, not inside the first one's wait.
  beforeAll(() => import('./CatalogueRoute'));

  it('lists the materials and filters by kind through the API', async () => {
    const { fetchMock } = signedIn('estimator');
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue' });

    const row = (await screen.findByText('RES-25')).closest('tr')!;
    expect(within(row).getByText('Base resin, 25 kg drum')).toBeInTheDocument();
    expect(within(row).getByText('Base resin')).toBeInTheDocument();
    expect(within(row).getByText('Class 3')).toBeInTheDocument();
    expect(screen.getByText('MAT-450')).toBeInTheDocument();

    await user.click(screen.getByRole('combobox', { name: 'Kind' }));
    await user.click(await screen.findByRole('option', { name: 'Mat' }));
    await waitFor(() =>
      expect(
        fetchMock.mock.calls.some(
          ([url]) => String(url).includes('/materials?') && String(url).includes('kind=mat'),
        ),
      ).toBe(true),
    );
  });

  it('shows the storeman no buttons that change the catalogue', async () => {
    signedIn('storeman');
    renderWithProviders(<AppRoutes />, { route: '/catalogue' });
    expect(await screen.findByText('RES-25')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Export CSV' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add a material' })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Import CSV' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Change / })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Archive / })).not.toBeInTheDocument();
  });

  it('refuses a mat without its weight and width, then sends the kind-specific fields', async () => {
    const posted: MockRequest[] = [];
    signedIn('owner', {
      'POST /api/materials': (request) => {
        posted.push(request);
        return json(material({ id: 'mat-600', code: 'MAT-600', kind: 'mat' }), 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue' });
    await user.click(await screen.findByRole('button', { name: 'Add a material' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a material' });

    await fill(user, within(dialog).getByLabelText('Code'), 'MAT-600');
    await fill(user, within(dialog).getByLabelText('Name'), 'Chopped strand mat 600 g/m²');
    await user.click(within(dialog).getByRole('combobox', { name: 'Kind' }));
    await user.click(await screen.findByRole('option', { name: 'Mat' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Stock unit' }));
    await user.click(await screen.findByRole('option', { name: 'm² (square metres)' }));
    await fill(user, within(dialog).getByLabelText('Pack 1 size'), '48');
    await fill(user, within(dialog).getByLabelText('Pack 1 name'), '48 m² roll');
    await user.click(within(dialog).getByRole('button', { name: 'Add material' }));

    expect(
      await within(dialog).findByText('A mat needs its weight in g/m² (e.g. 300, 450, 600)'),
    ).toBeInTheDocument();
    expect(within(dialog).getByText('A mat needs its roll width in metres (e.g. 1.04)')).toBeInTheDocument();
    expect(posted).toHaveLength(0);

    await fill(user, within(dialog).getByLabelText('Weight (g/m²)'), '600');
    await fill(user, within(dialog).getByLabelText('Roll width (m)'), '1.04');
    await user.click(within(dialog).getByRole('button', { name: 'Add material' }));

    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]?.body).toMatchObject({
      code: 'MAT-600',
      kind: 'mat',
      stockUnit: 'm2',
      packSizes: [{ size: '48', label: '48 m² roll' }],
      matGsm: 600,
      rollWidthM: '1.04',
      trimKind: null,
      trimPiece: null,
      topcoatColour: null,
      hazardClass: 'none',
      unNumber: null,
    });
  });

  it('sends a trim as a straight length unless the piece says it is a corner', async () => {
    const posted: MockRequest[] = [];
    signedIn('owner', {
      'GET /api/materials': json(
        page([...materials, material({ id: 'trm-x', code: 'CRN-X', name: 'Outside drip piece', kind: 'trim', trimKind: 'drip', trimLengthM: '0.3', trimPiece: 'external-corner', hazardClass: 'none', unNumber: null })]),
      ),
      'POST /api/materials': (request) => {
        posted.push(request);
        return json(material({ id: 'trm-int', code: 'CRN-IN', kind: 'trim' }), 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue' });
    // The list says what each trim is.
    expect(await screen.findByText('External corner piece')).toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Add a material' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a material' });
    await fill(user, within(dialog).getByLabelText('Code'), 'CRN-IN');
    await fill(user, within(dialog).getByLabelText('Name'), 'Inside drip piece');
    await user.click(within(dialog).getByRole('combobox', { name: 'Kind' }));
    await user.click(await screen.findByRole('option', { name: 'Trim' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Stock unit' }));
    await user.click(await screen.findByRole('option', { name: 'each' }));
    await fill(user, within(dialog).getByLabelText('Pack 1 size'), '1');
    await fill(user, within(dialog).getByLabelText('Pack 1 name'), 'piece');
    await user.click(within(dialog).getByRole('combobox', { name: 'Trim kind' }));
    await user.click(await screen.findByRole('option', { name: 'Drip trim' }));
    await fill(user, within(dialog).getByLabelText('Length (m)'), '0.3');
    const piece = within(dialog).getByRole('combobox', { name: 'Piece' });
    expect(piece).toHaveValue('Straight length');
    await user.click(piece);
    await user.click(await screen.findByRole('option', { name: 'Internal corner piece' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add material' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]?.body).toMatchObject({ kind: 'trim', trimKind: 'drip', trimLengthM: '0.3', trimPiece: 'internal-corner' });
  });

  it("puts the API's refusal beside the field it names", async () => {
    signedIn('owner', {
      'POST /api/materials': apiError(
        409,
        'The code RES-25 is already used by another material; codes are unique in the company',
        'duplicate_code',
      ),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue' });
    await user.click(await screen.findByRole('button', { name: 'Add a material' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a material' });
    await fill(user, within(dialog).getByLabelText('Code'), 'RES-25');
    await fill(user, within(dialog).getByLabelText('Name'), 'Another resin');
    await user.click(within(dialog).getByRole('combobox', { name: 'Kind' }));
    await user.click(await screen.findByRole('option', { name: 'Other' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Stock unit' }));
    await user.click(await screen.findByRole('option', { name: 'each' }));
    await fill(user, within(dialog).getByLabelText('Pack 1 size'), '1');
    await fill(user, within(dialog).getByLabelText('Pack 1 name'), 'single');
    await user.click(within(dialog).getByRole('button', { name: 'Add material' }));
    expect(await within(dialog).findByText(/The code RES-25 is already used/)).toBeInTheDocument();
    expect(within(dialog).getByLabelText('Code')).toHaveAttribute('aria-invalid', 'true');
  });

  it('asks before archiving a material', async () => {
    const patches: MockRequest[] = [];
    signedIn('owner', {
      'PATCH /api/materials/mat-res': (request) => {
        patches.push(request);
        return json(material({ active: false }));
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/catalogue' });
    await user.click(await screen.findByRole('button', { name: 'Archive RES-25' }));
    const confirm = await screen.findByRole('dialog', { name: 'Archive RES-25 Base resin, 25 kg drum?' });
    expect(patches).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Archive' }));
    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]?.body).toEqual({ active: false });
  });
});
