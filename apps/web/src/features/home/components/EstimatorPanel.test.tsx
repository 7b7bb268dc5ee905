import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';

describe('the estimator’s home panel', () => {
  it('lists the next scheduled jobs with their material state and the enquiries waiting', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/jobs/calendar': json([
        {
          id: 'job-1',
          reference: 'J-0012',
          title: 'Rear extension flat roof',
          status: 'scheduled',
          scheduledOn: '2026-06-15',
          customer: { id: 'c1', name: 'Harrow Lane Surgery' },
          siteAddress: '3 Harrow Lane',
          crew: null,
          materialState: 'short',
          shortfalls: 2,
        },
      ]),
      'GET /api/jobs': json({ items: [], total: 3, page: 1, pageSize: 1 }),
    });
    renderWithProviders(<AppRoutes />, { route: '/' });
    const panel = await screen.findByRole('region', { name: 'Your next jobs' });
    expect(await within(panel).findByText('1 scheduled, 1 short of stock.')).toBeInTheDocument();
    expect(within(panel).getByRole('link', { name: '3 enquiries wait for an estimate.' })).toHaveAttribute(
      'href',
      '/jobs?status=enquiry',
    );
    expect(within(panel).getByRole('link', { name: 'J-0012 · Harrow Lane Surgery' })).toHaveAttribute(
      'href',
      '/jobs/job-1?tab=materials',
    );
    expect(within(panel).getByText('Short')).toBeInTheDocument();
  });

  it('is not shown to the storeman', async () => {
    setAccessToken('token');
    mockApi({ 'GET /api/auth/me': json(sessionUser('storeman')) });
    renderWithProviders(<AppRoutes />, { route: '/' });
    expect(await screen.findByRole('heading', { level: 1 })).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Your next jobs' })).not.toBeInTheDocument();
  });
});
