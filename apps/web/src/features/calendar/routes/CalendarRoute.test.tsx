import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { currentLocation, renderWithProviders } from '../../../test/render';
import type { CalendarEntry } from '../api/get-calendar';
import { monthDays } from '../components/month';
import './CalendarRoute';

const entries: CalendarEntry[] = [
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
  {
    id: 'job-2',
    reference: 'J-0009',
    title: 'Dormer',
    status: 'scheduled',
    scheduledOn: '2026-06-03',
    customer: { id: 'c2', name: 'Pell & Daughters' },
    siteAddress: '9 Quay St',
    crew: null,
    materialState: 'reserved',
    shortfalls: 0,
  },
];

describe('the calendar', () => {
  it.each([
    // June 2026 starts on a Monday and ends on a Tuesday: 1 Jun to 5 Jul (calendar arithmetic).
    ['2026-06', '2026-06-01', '2026-07-05', 35],
    // February 2026 starts on a Sunday: 26 Jan to 1 Mar.
    ['2026-02', '2026-01-26', '2026-03-01', 35],
  ])('shows %s from Monday %s to Sunday %s', (month, first, last, count) => {
    const days = monthDays(month);
    expect(days[0]?.date).toBe(first);
    expect(days[days.length - 1]?.date).toBe(last);
    expect(days).toHaveLength(count);
  });

  it('lists the month’s jobs with their material state, asks the API for the weeks shown, and moves by month', async () => {
    setAccessToken('token');
    const { fetchMock } = mockApi({
      'GET /api/auth/me': json(sessionUser('storeman')),
      'GET /api/jobs/calendar': json(entries),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/calendar?month=2026-06' });
    // jsdom is narrow: the list view.
    const list = await screen.findByRole('region', { name: 'Jobs in June 2026' });
    const days = within(list)
      .getAllByText(/June$/)
      .map((e) => e.textContent);
    expect(days).toEqual(['Wednesday 3 June', 'Monday 15 June']);
    expect(within(list).getByText('Short: 2 materials')).toBeInTheDocument();
    expect(within(list).getByText('All reserved')).toBeInTheDocument();
    expect(screen.getByText('1 short')).toBeInTheDocument();
    expect(String(fetchMock.mock.calls.at(-1)?.[0])).toContain('from=2026-06-01&to=2026-07-05');

    await user.click(screen.getByRole('radio', { name: 'Month' }));
    const grid = await screen.findByRole('region', { name: 'Jobs in June 2026' });
    const day = within(grid).getByRole('group', { name: '15 Jun 2026: 1 job' });
    expect(
      within(day).getByRole('link', { name: /J-0012 Rear extension flat roof, Harrow Lane Surgery: Short/ }),
    ).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Next month' }));
    await waitFor(() => expect(currentLocation()).toBe('/calendar?month=2026-07'));
    await waitFor(() =>
      expect(String(fetchMock.mock.calls.at(-1)?.[0])).toContain('from=2026-06-29&to=2026-08-02'),
    );

    expect(await screen.findByText(/No job is scheduled in July 2026/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Previous month' }));
    await user.click(await screen.findByRole('link', { name: /J-0012/ }));
    await waitFor(() => expect(currentLocation()).toBe('/jobs/job-1?tab=materials'));
  }, 30_000);
});
