import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../test/mock-api';
import { currentLocation, renderWithProviders } from '../../../test/render';
import { buildUp, JOB_ID, jobDetail } from '../test-fixtures';
// Loaded up front, so the first test does not wait for the lazy screen.
import './JobsRoute';

const won = jobDetail({
  status: 'won',
  value: '2417.33',
  materialState: 'reserved',
  acceptedEstimate: { id: 'e', version: 2 },
});
const enquiry = jobDetail({
  id: 'job-2',
  reference: 'J-0011',
  number: 11,
  title: 'Garage roof',
  status: 'enquiry',
  customer: { id: 'cust-2', name: 'Oriel Mews Lettings' },
  scheduledOn: null,
});

describe('the jobs list', () => {
  it('lists jobs with status, date, customer and value, and filters and sorts through the API', async () => {
    const lists: string[] = [];
    setAccessToken('token');
    const { fetchMock } = mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/jobs': () => json({ items: [won, enquiry], total: 2, page: 1, pageSize: 25 }),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/jobs' });
    const row = (await screen.findByText('J-0012 · Rear extension flat roof')).closest('tr')!;
    expect(within(row).getByText('Harrow Lane Surgery')).toBeInTheDocument();
    expect(within(row).getByText('Won')).toBeInTheDocument();
    expect(within(row).getByText('15 Jun 2026')).toBeInTheDocument();
    expect(within(row).getByText('£2,417.33')).toBeInTheDocument();
    expect(within(row).getByText('All reserved')).toBeInTheDocument();
    const other = screen.getByText('J-0011 · Garage roof').closest('tr')!;
    expect(within(other).getByText('Not set')).toBeInTheDocument();
    expect(within(other).getByText('Not accepted')).toBeInTheDocument();

    for (const call of fetchMock.mock.calls) {
      const url = String(call[0]);
      if (url.includes('/api/jobs?')) {
        lists.push(url);
      }
    }
    expect(lists[0]).toContain('sort=-number');

    await user.click(screen.getByRole('combobox', { name: 'Filter by status' }));
    await user.click(await screen.findByRole('option', { name: 'Won' }));
    await waitFor(() =>
      expect(fetchMock.mock.calls.some((c) => String(c[0]).includes('status=won'))).toBe(true),
    );
    await user.click(screen.getByText('Date'));
    await waitFor(() =>
      expect(fetchMock.mock.calls.some((c) => String(c[0]).includes('sort=-scheduledOn'))).toBe(true),
    );
    expect(currentLocation()).toContain('status=won');

    await user.click(screen.getByText('J-0012 · Rear extension flat roof'));
    await waitFor(() => expect(currentLocation()).toBe(`/jobs/${JOB_ID}`));
  }, 30_000);

  it('shows the storeman no value and no New job', async () => {
    setAccessToken('token');
    const { value: _value, ...withoutValue } = won;
    mockApi({
      'GET /api/auth/me': json(sessionUser('storeman')),
      'GET /api/jobs': json({ items: [withoutValue], total: 1, page: 1, pageSize: 25 }),
    });
    renderWithProviders(<AppRoutes />, { route: '/jobs' });
    expect(await screen.findByText('J-0012 · Rear extension flat roof')).toBeInTheDocument();
    expect(screen.queryByRole('columnheader', { name: /Value/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New job' })).not.toBeInTheDocument();
    expect(screen.queryByText(/£/)).not.toBeInTheDocument();
  });

  it('says what to do when there are no jobs yet', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/jobs': json({ items: [], total: 0, page: 1, pageSize: 25 }),
    });
    renderWithProviders(<AppRoutes />, { route: '/jobs' });
    expect(await screen.findByText('No jobs yet. Start one with “New job”.')).toBeInTheDocument();
  });

  it('creates a job for a new customer: the customer first, then the job, then opens it', async () => {
    const posted: MockRequest[] = [];
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/jobs': json({ items: [], total: 0, page: 1, pageSize: 25 }),
      'GET /api/customers': json({ items: [], total: 0, page: 1, pageSize: 50 }),
      'GET /api/build-ups': json([buildUp]),
      'POST /api/customers': (request) => {
        posted.push(request);
        return json(
          {
            id: 'cust-9',
            name: 'Quayside Chandlery',
            contactName: null,
            email: null,
            phone: null,
            billingAddress: null,
            notes: null,
            jobCount: 0,
            createdAt: '',
            updatedAt: '',
          },
          201,
        );
      },
      'POST /api/jobs': (request) => {
        posted.push(request);
        return json(
          jobDetail({
            id: 'job-9',
            reference: 'J-0013',
            title: 'Boat store roof',
            customer: { id: 'cust-9', name: 'Quayside Chandlery' },
          }),
          201,
        );
      },
      'GET /api/jobs/job-9': json(jobDetail({ id: 'job-9', reference: 'J-0013' })),
      'GET /api/jobs/job-9/roof': json({ jobId: 'job-9', updatedAt: null, roof: null, summary: null }),
      'GET /api/build-ups/bu-1': json(buildUp),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/jobs' });
    await user.click(await screen.findByRole('button', { name: 'New job' }));
    const dialog = await screen.findByRole('dialog', { name: 'New job' });

    await user.click(within(dialog).getByRole('button', { name: 'Create job' }));
    expect(await within(dialog).findByText('Choose the customer, or add a new one')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the site address')).toBeInTheDocument();
    expect(within(dialog).getByText('Choose what the roof is laid on')).toBeInTheDocument();

    await user.click(within(dialog).getByRole('radio', { name: 'New customer' }));
    await user.type(within(dialog).getByLabelText('Customer name'), 'Quayside Chandlery');
    await user.type(within(dialog).getByLabelText('E-mail'), 'not-an-address');
    await user.type(within(dialog).getByLabelText('Site address'), 'Unit 4, Quayside, Hollowmere');
    await user.click(within(dialog).getByRole('combobox', { name: 'Laid on' }));
    await user.click(await screen.findByRole('option', { name: 'Timber deck' }));
    await user.click(within(dialog).getByRole('button', { name: 'Create job' }));
    expect(
      await within(dialog).findByText('Enter a whole e-mail address, like name@example.com'),
    ).toBeInTheDocument();
    expect(posted).toHaveLength(0);

    await user.clear(within(dialog).getByLabelText('E-mail'));
    await user.click(within(dialog).getByRole('button', { name: 'Create job' }));
    await waitFor(() => expect(posted).toHaveLength(2));
    expect(posted[0]?.path).toBe('/api/customers');
    expect(posted[0]?.body).toMatchObject({ name: 'Quayside Chandlery', email: null });
    expect(posted[1]?.body).toMatchObject({
      customerId: 'cust-9',
      siteAddress: 'Unit 4, Quayside, Hollowmere',
      substrate: 'timber-deck',
      scheduledOn: null,
    });
    await waitFor(() => expect(currentLocation()).toBe('/jobs/job-9'));
  }, 40_000);
});
