import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { getAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { apiError, json, mockApi } from '../../../test/mock-api';
import { currentLocation, renderWithProviders } from '../../../test/render';

const storeman = sessionUser('storeman');
const invitation = {
  email: storeman.email,
  name: storeman.name,
  role: 'storeman',
  companyName: storeman.companyName,
};

describe('accepting an invitation', () => {
  it('shows the company and e-mail, checks the password, then signs in', async () => {
    const { requests } = mockApi({
      'GET /api/auth/invitations/abc123': json(invitation),
      'POST /api/auth/invitations/abc123/accept': json({ accessToken: 'token-s', user: storeman }),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/invitation/abc123' });

    expect(await screen.findByRole('heading', { name: 'Join Ridgeline Flat Roofing' })).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveValue(storeman.email);

    await user.type(screen.getByLabelText('Password'), 'tenletters');
    await user.type(screen.getByLabelText('Confirm password'), 'tenletterz');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));
    expect(await screen.findByText('The two passwords are not the same')).toBeInTheDocument();

    await user.clear(screen.getByLabelText('Confirm password'));
    await user.type(screen.getByLabelText('Confirm password'), 'tenletters');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));

    await waitFor(() => expect(currentLocation()).toBe('/'));
    expect(getAccessToken()).toBe('token-s');
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({ password: 'tenletters' });
  });

  it('explains a used or expired link', async () => {
    mockApi({ 'GET /api/auth/invitations/used': apiError(404, 'Invitation not found', 'NOT_FOUND') });
    renderWithProviders(<AppRoutes />, { route: '/invitation/used' });
    expect(await screen.findByText('This link no longer works')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to sign-in' })).toBeInTheDocument();
  });
});
