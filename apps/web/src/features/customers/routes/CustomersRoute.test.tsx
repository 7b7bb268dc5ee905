import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { apiError, json, mockApi, type MockRequest } from '../../../test/mock-api';
import { currentLocation, renderWithProviders } from '../../../test/render';
import { customer, customerJob } from '../test-fixtures';
// Loaded up front, so the first test does not wait for the lazy screens.
import './CustomersRoute';
import './CustomerRoute';

const page = (items: unknown[]) => json({ items, total: items.length, page: 1, pageSize: 25 });

describe('the customers screen', () => {
  it('lists customers with contact and jobs, and searches and sorts through the API', async () => {
    setAccessToken('token');
    const { fetchMock } = mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers': page([
        customer(),
        customer({
          id: 'cust-2',
          name: 'Oriel Mews Lettings',
          contactName: null,
          phone: null,
          email: null,
          jobCount: 0,
        }),
      ]),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/customers' });
    const row = (await screen.findByText('Harrow Lane Surgery')).closest('tr')!;
    expect(within(row).getByText('Priya Lennox')).toBeInTheDocument();
    expect(within(row).getByText('01632 960 118 · practice@harrowlane.test')).toBeInTheDocument();
    expect(within(row).getByText('2')).toBeInTheDocument();
    const urls = () =>
      fetchMock.mock.calls.map((c) => String(c[0])).filter((u) => u.includes('/api/customers?'));
    expect(urls()[0]).toContain('sort=name');

    await user.type(screen.getByRole('textbox', { name: 'Search customers' }), 'harrow');
    await waitFor(() => expect(urls().some((u) => u.includes('q=harrow'))).toBe(true));
    await user.click(within(screen.getByRole('table')).getByText('Jobs'));
    await waitFor(() => expect(urls().some((u) => u.includes('sort=jobCount'))).toBe(true));
    expect(currentLocation()).toContain('q=harrow');

    await user.click(screen.getByText('Harrow Lane Surgery'));
    await waitFor(() => expect(currentLocation()).toBe('/customers/cust-1'));
  }, 30_000);

  it('says what to do when there are none, and shows Customers to owners and estimators only', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers': page([]),
    });
    renderWithProviders(<AppRoutes />, { route: '/customers' });
    expect(
      await screen.findByText('No customers yet. Add one with “New customer”, or with a new job.'),
    ).toBeInTheDocument();
    expect(screen.getAllByRole('link', { name: /Customers/ }).length).toBeGreaterThan(0);
  });

  it('keeps the storeman out', async () => {
    setAccessToken('token');
    mockApi({ 'GET /api/auth/me': json(sessionUser('storeman')) });
    renderWithProviders(<AppRoutes />, { route: '/customers' });
    expect(await screen.findByTestId('needs-role')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Customers' })).not.toBeInTheDocument();
  });

  it('adds a customer, refusing a bad e-mail first, then opens their page', async () => {
    setAccessToken('token');
    const posted: MockRequest[] = [];
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers': page([]),
      'POST /api/customers': (request) => {
        posted.push(request);
        return json(customer({ id: 'cust-9', name: 'Quayside Chandlery', jobCount: 0 }), 201);
      },
      'GET /api/customers/cust-9': json(customer({ id: 'cust-9', name: 'Quayside Chandlery', jobCount: 0 })),
      'GET /api/jobs': page([]),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/customers' });
    await user.click(await screen.findByRole('button', { name: 'New customer' }));
    const form = await screen.findByRole('form', { name: 'New customer' });
    await user.click(within(form).getByRole('button', { name: 'Add customer' }));
    expect(await within(form).findByText('Enter the customer’s name')).toBeInTheDocument();
    await user.type(within(form).getByLabelText('Name'), 'Quayside Chandlery');
    await user.type(within(form).getByLabelText('E-mail'), 'not-an-address');
    await user.click(within(form).getByRole('button', { name: 'Add customer' }));
    expect(
      await within(form).findByText('Enter a whole e-mail address, like name@example.com'),
    ).toBeInTheDocument();
    expect(posted).toHaveLength(0);
    await user.clear(within(form).getByLabelText('E-mail'));
    await user.type(within(form).getByLabelText('E-mail'), 'orders@quayside.test');
    await user.type(within(form).getByLabelText('Billing address'), '1 Quay Steps, Hollowmere');
    await user.click(within(form).getByRole('button', { name: 'Add customer' }));
    await waitFor(() => expect(currentLocation()).toBe('/customers/cust-9'));
    expect(posted[0]!.body).toEqual({
      name: 'Quayside Chandlery',
      contactName: null,
      email: 'orders@quayside.test',
      phone: null,
      billingAddress: '1 Quay Steps, Hollowmere',
      notes: null,
    });
    expect(
      await screen.findByText('No jobs for this customer yet. Start one from Jobs with “New job”.'),
    ).toBeInTheDocument();
  }, 30_000);
});

describe('a customer’s page', () => {
  it('shows their details and their jobs with status and value, linking to each job', async () => {
    setAccessToken('token');
    const { fetchMock } = mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'GET /api/customers/cust-1': json(customer()),
      'GET /api/jobs': json({
        items: [
          customerJob(),
          customerJob({
            id: 'job-2',
            reference: 'J-0007',
            title: 'Porch roof',
            status: 'enquiry',
            value: null,
            scheduledOn: null,
          }),
        ],
        total: 2,
        page: 1,
        pageSize: 10,
      }),
    });
    renderWithProviders(<AppRoutes />, { route: '/customers/cust-1' });
    expect(await screen.findByRole('heading', { name: 'Harrow Lane Surgery' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'practice@harrowlane.test' })).toHaveAttribute(
      'href',
      'mailto:practice@harrowlane.test',
    );
    const row = (await screen.findByText('J-0012 · Rear extension flat roof')).closest('tr')!;
    expect(within(row).getByText('Won')).toBeInTheDocument();
    expect(within(row).getByText('£2,417.33')).toBeInTheDocument();
    expect(within(row).getByText('15 Jun 2026')).toBeInTheDocument();
    const other = screen.getByText('J-0007 · Porch roof').closest('tr')!;
    expect(within(other).getByText('Not accepted')).toBeInTheDocument();
    expect(within(other).getByText('Enquiry')).toBeInTheDocument();
    expect(fetchMock.mock.calls.some((c) => String(c[0]).includes('/api/jobs?customerId=cust-1'))).toBe(true);
    expect(screen.getByRole('link', { name: 'J-0012 · Rear extension flat roof' })).toHaveAttribute(
      'href',
      '/jobs/job-1',
    );
  });

  it('edits the customer and sends only what the form holds', async () => {
    setAccessToken('token');
    const patched: MockRequest[] = [];
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers/cust-1': json(customer()),
      'GET /api/jobs': page([]),
      'PATCH /api/customers/cust-1': (request) => {
        patched.push(request);
        return json(customer({ phone: null }));
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/customers/cust-1' });
    await user.click(await screen.findByRole('button', { name: 'Edit customer' }));
    const form = await screen.findByRole('form', { name: 'Edit Harrow Lane Surgery' });
    await user.clear(within(form).getByLabelText('Phone'));
    await user.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patched).toHaveLength(1));
    expect(patched[0]!.body).toMatchObject({
      name: 'Harrow Lane Surgery',
      phone: null,
      contactName: 'Priya Lennox',
    });
  });

  it('says so when the customer is not there', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers/nope': apiError(404, 'Customer not found'),
      'GET /api/jobs': page([]),
    });
    renderWithProviders(<AppRoutes />, { route: '/customers/nope' });
    expect(await screen.findByRole('heading', { name: 'Customer not found' })).toBeInTheDocument();
  });

  it('starts a new job for the customer from their page, with them chosen', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/customers/cust-1': json(customer()),
      'GET /api/customers': page([]),
      'GET /api/jobs': page([]),
      'GET /api/build-ups': json([]),
      'GET /api/users/estimators': json([]),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/customers/cust-1' });
    await user.click(await screen.findByRole('link', { name: 'New job for Harrow Lane Surgery' }));
    const dialog = await screen.findByRole('dialog');
    await waitFor(() =>
      expect(within(dialog).getByPlaceholderText('Type to search by name, contact or e-mail')).toHaveValue(
        'Harrow Lane Surgery',
      ),
    );
    expect(currentLocation()).toMatch(/^\/jobs/);
  });
});
