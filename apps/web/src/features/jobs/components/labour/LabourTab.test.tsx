import { screen, waitFor, within } from '@testing-library/react';
import dayjs from 'dayjs';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../../app/routes';
import { setAccessToken } from '../../../../lib/auth-token';
import { sessionUser } from '../../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../../test/mock-api';
import { renderWithProviders } from '../../../../test/render';
import type { JobLabour, LabourEntry, Reconciliation } from '../../api/types';
import { buildUp, JOB_ID, jobDetail } from '../../test-fixtures';
// Loaded up front, so the first test does not wait for the lazy screens.
import '../../routes/JobRoute';
import '../../routes/JobsRoute';

const inProgress = jobDetail({
  status: 'in-progress',
  nextStatuses: ['complete'],
  value: '2417.33',
  acceptedEstimate: { id: 'est-2', version: 2 },
  materialState: 'issued',
});

const entry = (overrides: Partial<LabourEntry> = {}): LabourEntry => ({
  id: 'lab-1',
  workedOn: '2026-06-15',
  hours: '6.5',
  crewMember: 'Jonah Pell',
  note: 'Deck prep and first lay',
  createdBy: { id: 'user-estimator', name: 'Ravi Okafor' },
  createdAt: '2026-06-15T17:00:00Z',
  removed: null,
  ...overrides,
});

function sheet(entries: LabourEntry[], overrides: Partial<JobLabour> = {}): JobLabour {
  return {
    jobId: JOB_ID,
    open: true,
    closedReason: null,
    estimatedHours: '9.7',
    recordedHours: '6.5',
    byCrewMember: [{ crewMember: 'Jonah Pell', hours: '6.5' }],
    entries,
    ...overrides,
  };
}

// 6.5 h × £32.00 = £208.00; the estimate's 9.7 h × £32.00 = £310.40 (worked by hand).
const reconciliation = (basis: 'recorded' | 'estimate'): Reconciliation => ({
  jobId: JOB_ID,
  estimate: { id: 'est-2', version: 2 },
  materials: [],
  labour: {
    basis,
    estimatedHours: '9.7',
    recordedHours: basis === 'recorded' ? '6.5' : '0',
    entries: basis === 'recorded' ? 1 : 0,
    rate: '32.00',
    estimatedCost: '310.40',
    recordedCost: basis === 'recorded' ? '208.00' : null,
  },
  totals: {
    price: '2417.33',
    estimatedMaterials: '900.00',
    actualMaterials: '0.00',
    labour: basis === 'recorded' ? '208.00' : '310.40',
    labourBasis: basis,
    margin: basis === 'recorded' ? '2209.33' : '2106.93',
    marginPct: null,
  },
});

describe('the labour tab', () => {
  it('records a crew member’s hours, refusing bad hours first, and the reconciliation follows', async () => {
    setAccessToken('token');
    const posted: MockRequest[] = [];
    let recorded = false;
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      [`GET /api/jobs/${JOB_ID}`]: json(inProgress),
      [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
      [`GET /api/jobs/${JOB_ID}/labour`]: json(sheet([], { recordedHours: '0', byCrewMember: [] })),
      [`GET /api/jobs/${JOB_ID}/reconciliation`]: () =>
        json(reconciliation(recorded ? 'recorded' : 'estimate')),
      [`POST /api/jobs/${JOB_ID}/labour`]: (request) => {
        posted.push(request);
        recorded = true;
        return json(sheet([entry({ workedOn: dayjs().format('YYYY-MM-DD') })]), 201);
      },
      'GET /api/build-ups/bu-1': json(buildUp),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=labour` });
    expect(
      await screen.findByText('No hours recorded yet. Record each crew member’s hours for each day above.'),
    ).toBeInTheDocument();
    expect(await screen.findByTestId('labour-basis')).toHaveTextContent(
      'Labour: no hours recorded yet, so the estimate’s 9.7 h (£310.40) stands in.',
    );
    const form = screen.getByRole('form', { name: 'Record hours' });
    await user.type(within(form).getByLabelText('Hours'), '25');
    await user.click(within(form).getByRole('button', { name: 'Record hours' }));
    expect(await within(form).findByText('A day has at most 24 hours')).toBeInTheDocument();
    expect(within(form).getByText('Enter who worked')).toBeInTheDocument();
    await user.clear(within(form).getByLabelText('Hours'));
    await user.type(within(form).getByLabelText('Hours'), '7.555');
    await user.click(within(form).getByRole('button', { name: 'Record hours' }));
    expect(
      await within(form).findByText('Enter hours like 7.5 (at most 2 decimal places)'),
    ).toBeInTheDocument();
    expect(posted).toHaveLength(0);

    await user.clear(within(form).getByLabelText('Hours'));
    await user.type(within(form).getByLabelText('Hours'), '6.5');
    await user.type(within(form).getByPlaceholderText('Crew member’s name'), 'Jonah Pell');
    await user.type(within(form).getByLabelText('Note'), 'Deck prep and first lay');
    await user.click(within(form).getByRole('button', { name: 'Record hours' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]!.body).toEqual({
      workedOn: dayjs().format('YYYY-MM-DD'),
      hours: '6.5',
      crewMember: 'Jonah Pell',
      note: 'Deck prep and first lay',
    });
    expect(await screen.findByText('Jonah Pell: 6.5 h')).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.getByTestId('labour-basis')).toHaveTextContent(
        'Labour: 6.5 h recorded × £32.00/h = £208.00 (the estimate allowed 9.7 h, £310.40).',
      ),
    );
  }, 40_000);

  it('asks before striking an entry out, sends the reason, and shows it crossed through', async () => {
    setAccessToken('token');
    const struck: MockRequest[] = [];
    mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      [`GET /api/jobs/${JOB_ID}`]: json(inProgress),
      [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
      [`GET /api/jobs/${JOB_ID}/labour`]: json(sheet([entry()])),
      [`GET /api/jobs/${JOB_ID}/reconciliation`]: json(reconciliation('recorded')),
      [`DELETE /api/jobs/${JOB_ID}/labour/lab-1`]: (request) => {
        struck.push(request);
        return json(
          sheet(
            [
              entry({
                removed: {
                  at: '2026-06-16T08:00:00Z',
                  by: { id: 'user-owner', name: 'Dana Whitlow' },
                  reason: 'Booked twice',
                },
              }),
            ],
            {
              recordedHours: '0',
              byCrewMember: [],
            },
          ),
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=labour` });
    await user.click(
      await screen.findByRole('button', { name: 'Strike out 6.5 h for Jonah Pell on 15 Jun 2026' }),
    );
    const dialog = await screen.findByRole('dialog', { name: 'Strike out this entry?' });
    await user.type(within(dialog).getByLabelText('Why (optional)'), 'Booked twice');
    await user.click(within(dialog).getByRole('button', { name: 'Strike out' }));
    await waitFor(() => expect(struck).toHaveLength(1));
    const url = new URL(
      String(
        (globalThis.fetch as unknown as { mock: { calls: unknown[][] } }).mock.calls.find((c) =>
          String(c[0]).includes('/labour/lab-1'),
        )![0],
      ),
      'http://localhost',
    );
    expect(url.searchParams.get('reason')).toBe('Booked twice');
    expect(await screen.findByText(/Struck out by Dana Whitlow on .*: Booked twice/)).toBeInTheDocument();
  }, 30_000);

  it('shows the storeman the hours without money or a form; a closed sheet says why', async () => {
    setAccessToken('token');
    const { value: _value, ...noValue } = inProgress;
    const { fetchMock } = mockApi({
      'GET /api/auth/me': json(sessionUser('storeman')),
      [`GET /api/jobs/${JOB_ID}`]: json({ ...noValue, status: 'invoiced', nextStatuses: [] }),
      [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
      [`GET /api/jobs/${JOB_ID}/labour`]: json(
        sheet([entry()], {
          open: false,
          closedReason: 'J-0012 is invoiced: its hours are closed and can only be read',
        }),
      ),
    });
    renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=labour` });
    expect(
      await screen.findByText('J-0012 is invoiced: its hours are closed and can only be read'),
    ).toBeInTheDocument();
    expect(screen.getByText('Jonah Pell', { selector: 'span' })).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Record hours' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Strike out/ })).not.toBeInTheDocument();
    expect(screen.queryByText(/£/)).not.toBeInTheDocument();
    expect(fetchMock.mock.calls.some((c) => String(c[0]).includes('reconciliation'))).toBe(false);
  });
});

describe('the job’s estimator', () => {
  it('New job offers the company’s estimators, me first chosen, and sends the one picked', async () => {
    setAccessToken('token');
    const posted: MockRequest[] = [];
    mockApi({
      'GET /api/auth/me': json(sessionUser('estimator')),
      'GET /api/jobs': json({ items: [inProgress], total: 1, page: 1, pageSize: 25 }),
      'GET /api/customers': json({
        items: [
          {
            id: 'cust-1',
            name: 'Harrow Lane Surgery',
            contactName: null,
            email: null,
            phone: null,
            billingAddress: null,
            notes: null,
            jobCount: 1,
            createdAt: '',
            updatedAt: '',
          },
        ],
        total: 1,
        page: 1,
        pageSize: 50,
      }),
      'GET /api/build-ups': json([buildUp]),
      'GET /api/users/estimators': json([
        { id: 'user-owner', name: 'Dana Whitlow', role: 'owner' },
        { id: 'user-estimator', name: 'Ravi Okafor', role: 'estimator' },
      ]),
      'POST /api/jobs': (request) => {
        posted.push(request);
        return json(jobDetail({ id: 'job-9' }), 201);
      },
      'GET /api/jobs/job-9': json(jobDetail({ id: 'job-9' })),
      'GET /api/jobs/job-9/roof': json({ jobId: 'job-9', updatedAt: null, roof: null, summary: null }),
      'GET /api/build-ups/bu-1': json(buildUp),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/jobs' });
    // The jobs table names each job's estimator.
    const row = (await screen.findByText('J-0012 · Rear extension flat roof')).closest('tr')!;
    expect(within(row).getByText('Estimator: Ravi Okafor')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'New job' }));
    const dialog = await screen.findByRole('dialog', { name: 'New job' });
    const picker = within(dialog).getByRole('combobox', { name: 'Estimator' }) as HTMLInputElement;
    await waitFor(() => expect(picker.value).toBe('Ravi Okafor (me)'));
    await user.click(picker);
    await user.click(await screen.findByRole('option', { name: 'Dana Whitlow' }));
    await user.click(within(dialog).getByRole('combobox', { name: 'Customer' }));
    await user.click(await screen.findByRole('option', { name: 'Harrow Lane Surgery' }));
    await user.type(within(dialog).getByLabelText('Site address'), '3 Harrow Lane, Hollowmere');
    await user.click(within(dialog).getByRole('combobox', { name: 'Laid on' }));
    await user.click(await screen.findByRole('option', { name: 'OSB boards' }));
    await user.click(within(dialog).getByRole('button', { name: 'Create job' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]!.body).toMatchObject({ customerId: 'cust-1', estimatorId: 'user-owner' });
  }, 40_000);
});
