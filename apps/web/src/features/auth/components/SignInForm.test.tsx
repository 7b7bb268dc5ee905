import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { getAccessToken } from '../../../lib/auth-token';
import { currentLocation, renderWithProviders } from '../../../test/render';
import { apiError, json, mockApi } from '../../../test/mock-api';
import { sessionUser } from '../../../test/fixtures';

describe('sign-in', () => {
  it('refuses empty and malformed input without calling the API', async () => {
    const { requests } = mockApi({});
    const { user } = renderWithProviders(<AppRoutes />, { route: '/sign-in' });

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();

    await user.type(screen.getByLabelText('E-mail'), 'owner-at-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(
      await screen.findByText('Enter a whole e-mail address, like name@example.com'),
    ).toBeInTheDocument();
    expect(requests).toHaveLength(0);
  });

  it("shows the server's message when the sign-in is refused", async () => {
    const { requests } = mockApi({
      'POST /api/auth/login': apiError(
        401,
        'That e-mail and password do not match an account',
        'INVALID_CREDENTIALS',
      ),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/sign-in' });

    await user.type(await screen.findByLabelText('E-mail'), 'owner@demo.test');
    await user.type(screen.getByLabelText('Password'), 'wrong-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'That e-mail and password do not match an account',
    );
    expect(requests[0]?.body).toEqual({ email: 'owner@demo.test', password: 'wrong-password' });
    expect(requests[0]?.headers.has('Authorization')).toBe(false);
    expect(getAccessToken()).toBeNull();
  });

  it('shows the throttling message on 429', async () => {
    mockApi({
      'POST /api/auth/login': apiError(
        429,
        'Too many sign-in attempts. Try again in a minute.',
        'TOO_MANY_REQUESTS',
      ),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/sign-in' });
    await user.type(await screen.findByLabelText('E-mail'), 'owner@demo.test');
    await user.type(screen.getByLabelText('Password'), 'whatever-it-is');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in attempts');
  });

  it('keeps the token and goes home once signed in', async () => {
    const owner = sessionUser('owner');
    mockApi({ 'POST /api/auth/login': json({ accessToken: 'token-1', user: owner }) });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/sign-in' });

    await user.type(await screen.findByLabelText('E-mail'), ' owner@demo.test ');
    await user.type(screen.getByLabelText('Password'), 'potlife-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: /, Dana$/ })).toBeInTheDocument();
    expect(getAccessToken()).toBe('token-1');
    await waitFor(() => expect(currentLocation()).toBe('/'));
  });
});
