import { DEFAULT_BUILD_UP } from '@potlife/domain';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import type { BuildUp } from '../api/get-build-ups';
import { defaultValues, valuesOf } from '../components/rate-fields';
import './BuildUpsRoute';

const standard: BuildUp = {
  ...(Object.fromEntries(Object.entries(defaultValues()).map(([k, v]) => [k, v])) as unknown as BuildUp),
  id: 'bu-1',
  name: 'Standard deck, one layer 450 g',
  description: 'A sound deck',
  active: true,
  labourRate: '32.00',
  markupPct: '25',
  vatRatePct: '20',
  createdAt: '2026-01-05T09:00:00Z',
  updatedAt: '2026-03-01T09:00:00Z',
};

describe('build-ups', () => {
  it('starts a new build-up from the domain’s defaults, refuses bad rates beside them, then creates it', async () => {
    const posts: MockRequest[] = [];
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'GET /api/build-ups': json([standard]),
      'POST /api/build-ups': (request) => {
        posts.push(request);
        return json({ ...standard, id: 'bu-2', name: 'Walkway, two layers' }, 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/build-ups' });
    expect(await screen.findByText('Standard deck, one layer 450 g')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'New build-up' }));
    const dialog = await screen.findByRole('dialog', { name: 'New build-up' });
    expect(within(dialog).getByLabelText('Mat weight (g/m²)')).toHaveValue(String(DEFAULT_BUILD_UP.matGsm));
    expect(within(dialog).getByLabelText('Resin to glass (: 1)')).toHaveValue(
      String(DEFAULT_BUILD_UP.resinToGlass),
    );

    await user.click(within(dialog).getByRole('button', { name: 'Create build-up' }));
    expect(await within(dialog).findByText(/Name the build-up/)).toBeInTheDocument();
    expect(within(dialog).getAllByText('Enter a value')).toHaveLength(2);

    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Walkway, two layers' } });
    fireEvent.change(within(dialog).getByLabelText('Labour rate (£ an hour)'), {
      target: { value: '34.50' },
    });
    fireEvent.change(within(dialog).getByLabelText('Markup (%)'), { target: { value: '30' } });
    const layers = within(dialog).getByLabelText('Layers of mat');
    fireEvent.change(layers, { target: { value: '12' } });
    await user.click(within(dialog).getByRole('button', { name: 'Create build-up' }));
    expect(await within(dialog).findByText('From 1 to 10 layers')).toBeInTheDocument();
    fireEvent.change(layers, { target: { value: '2' } });

    // Catalyst bands out of order are the domain's refusal, shown before anything is sent.
    const firstFrom = within(dialog).getByRole('textbox', { name: 'Band 1 from (°C)' });
    fireEvent.change(firstFrom, { target: { value: '40' } });
    await user.click(within(dialog).getByRole('button', { name: 'Create build-up' }));
    expect(await within(dialog).findByText('The build-up does not hold together')).toBeInTheDocument();
    expect(posts).toHaveLength(0);
    fireEvent.change(firstFrom, { target: { value: '5' } });

    await user.click(within(dialog).getByRole('button', { name: 'Create build-up' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]?.body).toMatchObject({
      name: 'Walkway, two layers',
      labourRate: '34.50',
      markupPct: '30',
      vatRatePct: '20',
      layers: '2',
      matGsm: '450',
      battenMPerEdgeM: { drip: '2', kerb: '1', wall: '0', angle: '0' },
    });
    expect(await screen.findByText('Walkway, two layers saved.')).toBeInTheDocument();
  }, 60_000);

  it('asks before retiring a build-up', async () => {
    const patches: MockRequest[] = [];
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'GET /api/build-ups': json([standard]),
      'PATCH /api/build-ups/bu-1': (request) => {
        patches.push(request);
        return json({ ...standard, active: false });
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/build-ups' });
    await user.click(await screen.findByRole('button', { name: 'Retire Standard deck, one layer 450 g' }));
    const confirm = await screen.findByRole('dialog', { name: 'Retire Standard deck, one layer 450 g?' });
    expect(patches).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Retire' }));
    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]?.body).toEqual({ active: false });
  });

  it('shows an estimator the rates without letting them change', async () => {
    setAccessToken('token');
    mockApi({ 'GET /api/auth/me': json(sessionUser('estimator')), 'GET /api/build-ups': json([standard]) });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/build-ups' });
    await user.click(await screen.findByRole('button', { name: 'Rates of Standard deck, one layer 450 g' }));
    const dialog = await screen.findByRole('dialog', { name: 'Standard deck, one layer 450 g' });
    expect(within(dialog).getByLabelText('Labour rate (£ an hour)')).toBeDisabled();
    expect(within(dialog).queryByRole('button', { name: /Save|Create/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New build-up' })).not.toBeInTheDocument();
  });

  it('lets the owner set the expiry margin for reservations and how long a quote holds', async () => {
    const patches: MockRequest[] = [];
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'GET /api/build-ups': json([standard]),
      'GET /api/settings/jobs': json({ reservationMarginDays: 7, quoteValidityDays: 30, updatedAt: null }),
      'PATCH /api/settings/jobs': (request) => {
        patches.push(request);
        return json({ reservationMarginDays: 14, quoteValidityDays: 30, updatedAt: '2026-05-05T10:00:00Z' });
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/build-ups' });
    const card = await screen.findByRole('region', { name: 'Reservations and quotes' });
    const margin = within(card).getByLabelText('Expiry margin (days)');
    await waitFor(() => expect(margin).toHaveValue('7'));
    await user.clear(margin);
    await user.type(margin, '400');
    await user.click(within(card).getByRole('button', { name: 'Save' }));
    expect(await within(card).findByText('A whole number of days from 0 to 365')).toBeInTheDocument();
    await user.clear(margin);
    await user.type(margin, '14');
    await user.click(within(card).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]?.body).toEqual({ reservationMarginDays: 14, quoteValidityDays: 30 });
  }, 30_000);

  it('fills the form from a saved build-up', () => {
    expect(valuesOf(standard).catalystBands).toEqual(
      DEFAULT_BUILD_UP.catalystBands.map((b) => ({ fromC: String(b.fromC), percent: String(b.percent) })),
    );
  });
});
