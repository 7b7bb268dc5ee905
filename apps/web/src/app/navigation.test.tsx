import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { navigationFor } from '../config/navigation';
import { setAccessToken } from '../lib/auth-token';
import type { Role } from '../lib/roles';
import { sessionUser } from '../test/fixtures';
import { json, mockApi } from '../test/mock-api';
import { currentLocation, renderWithProviders } from '../test/render';
import { AppRoutes } from './routes';

function signInAs(role: Role) {
  setAccessToken(`token-${role}`);
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    'GET /api/users': json([]),
    'GET /api/mail/messages': json([]),
  });
}

async function navLabels(): Promise<string[]> {
  const nav = await screen.findByRole('navigation', { name: 'Main navigation' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

// The store's screens (Receive, Stock, Counts, Temperatures), the estimator's (Jobs, Calendar,
// Customers, Build-ups), the catalogue and suppliers, and the owner's (Users, Mail outbox).
const OWNER_NAV = [
  'Home',
  'Receive',
  'Stock',
  'Counts',
  'Temperatures',
  'Jobs',
  'Calendar',
  'Customers',
  'Build-ups',
  'Catalogue',
  'Suppliers',
  'Users',
  'Mail outbox',
];
const ESTIMATOR_NAV = [
  'Home',
  'Stock',
  'Jobs',
  'Calendar',
  'Customers',
  'Build-ups',
  'Catalogue',
  'Suppliers',
];
const STOREMAN_NAV = [
  'Home',
  'Receive',
  'Stock',
  'Counts',
  'Temperatures',
  'Jobs',
  'Calendar',
  'Catalogue',
  'Suppliers',
];

describe('navigation by role', () => {
  it.each([
    ['owner', OWNER_NAV],
    ['estimator', ESTIMATOR_NAV],
    ['storeman', STOREMAN_NAV],
  ] as const)('the table gives the %s %j', (role, labels) => {
    expect(navigationFor(role).map((entry) => entry.label)).toEqual(labels);
  });

  it('shows the owner every screen, with the company, name, role and sign-out', async () => {
    signInAs('owner');
    renderWithProviders(<AppRoutes />, { route: '/' });
    expect(await navLabels()).toEqual(OWNER_NAV);
    expect(screen.getByTestId('header-company')).toHaveTextContent('Ridgeline Flat Roofing');
    expect(screen.getByTestId('header-user')).toHaveTextContent('Dana Whitlow');
    expect(screen.getByTestId('header-user')).toHaveTextContent('Owner');
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });

  it('shows the storeman the store, jobs, catalogue and suppliers, without Users or the Mail outbox', async () => {
    signInAs('storeman');
    renderWithProviders(<AppRoutes />, { route: '/' });
    expect(await navLabels()).toEqual(STOREMAN_NAV);
    expect(screen.queryByRole('link', { name: 'Users' })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Mail outbox' })).not.toBeInTheDocument();
  });

  it('tells a storeman who opens Users that it needs the owner role', async () => {
    const { requests } = signInAs('storeman');
    renderWithProviders(<AppRoutes />, { route: '/users' });
    expect(
      await screen.findByRole('heading', { name: 'This page needs the owner role' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/signed in as a storeman/)).toBeInTheDocument();
    expect(requests.some((request) => request.path === '/api/users')).toBe(false);
  });

  it('sends a signed-out visitor to sign-in', async () => {
    const { requests } = mockApi({});
    renderWithProviders(<AppRoutes />, { route: '/users' });
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(currentLocation()).toBe('/sign-in');
    expect(requests).toHaveLength(0);
  });

  it('signs out: the token goes and the sign-in page shows', async () => {
    signInAs('owner');
    const { user } = renderWithProviders(<AppRoutes />, { route: '/' });
    await user.click(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.localStorage.getItem('potlife.accessToken')).toBeNull();
  });
});
