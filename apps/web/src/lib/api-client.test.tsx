import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../app/routes';
import { apiError, json, mockApi } from '../test/mock-api';
import { currentLocation, renderWithProviders } from '../test/render';
import { apiGet, apiPost, ApiError } from './api-client';
import { getAccessToken, getAuthSnapshot, SESSION_EXPIRED_NOTICE, setAccessToken } from './auth-token';

describe('api client', () => {
  it('sends the bearer token and parses JSON', async () => {
    setAccessToken('token-1');
    const { requests } = mockApi({ 'GET /api/health': json({ status: 'ok', database: 'up', redis: 'up' }) });
    await expect(apiGet('/health')).resolves.toEqual({ status: 'ok', database: 'up', redis: 'up' });
    expect(requests[0]?.headers.get('Authorization')).toBe('Bearer token-1');
  });

  it("throws the server's message and code", async () => {
    setAccessToken('token-1');
    mockApi({
      'POST /api/users/invitations': apiError(400, 'email must be an e-mail address', 'VALIDATION'),
    });
    const error = await apiPost('/users/invitations', { email: 'x' }).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      message: 'email must be an e-mail address',
      code: 'VALIDATION',
    });
    expect(getAccessToken()).toBe('token-1');
  });

  it('turns a 401 on a signed-in request into a sign-out with a notice', async () => {
    setAccessToken('expired-token');
    mockApi({ 'GET /api/users': apiError(401, 'Token expired', 'UNAUTHORIZED') });
    await expect(apiGet('/users')).rejects.toMatchObject({ status: 401 });
    expect(getAuthSnapshot()).toEqual({ token: null, notice: SESSION_EXPIRED_NOTICE });
    expect(window.localStorage.getItem('potlife.accessToken')).toBeNull();
  });

  it('leaves a 401 on a public call (wrong password) to the caller', async () => {
    mockApi({ 'POST /api/auth/login': apiError(401, 'Wrong e-mail or password', 'INVALID_CREDENTIALS') });
    await expect(apiPost('/auth/login', {}, { auth: false })).rejects.toMatchObject({
      message: 'Wrong e-mail or password',
    });
    expect(getAuthSnapshot().notice).toBeNull();
  });

  it('explains a server that cannot be reached, or answers without JSON', async () => {
    mockApi({ 'GET /api/health': { status: 502 } });
    await expect(apiGet('/health')).rejects.toMatchObject({
      status: 502,
      message: expect.stringContaining('502'),
    });
  });

  it('returns an expired session to sign-in with the notice', async () => {
    setAccessToken('expired-token');
    mockApi({ 'GET /api/auth/me': apiError(401, 'Token expired', 'UNAUTHORIZED') });
    renderWithProviders(<AppRoutes />, { route: '/users' });
    expect(await screen.findByText(SESSION_EXPIRED_NOTICE)).toBeInTheDocument();
    expect(currentLocation()).toBe('/sign-in');
    expect(screen.getByLabelText('E-mail')).toBeInTheDocument();
  });
});
