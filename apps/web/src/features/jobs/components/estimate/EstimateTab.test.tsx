import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../../app/routes';
import { setAccessToken } from '../../../../lib/auth-token';
import { sessionUser } from '../../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../../test/mock-api';
import { renderWithProviders } from '../../../../test/render';
import { buildUp, estimate, JOB_ID, jobDetail, summary } from '../../test-fixtures';
import '../../routes/JobRoute';

const v1 = estimate({ id: 'est-1', version: 1, accepted: true, unpriced: 0, problems: [] });
const v2 = estimate();

function signedIn(extra: Parameters<typeof mockApi>[0] = {}) {
  setAccessToken('token');
  return mockApi({
    'GET /api/auth/me': json(sessionUser('estimator')),
    [`GET /api/jobs/${JOB_ID}`]: json(jobDetail({ acceptedEstimate: { id: 'est-1', version: 1 } })),
    [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
    'GET /api/build-ups/bu-1': json(buildUp),
    'GET /api/build-ups': json([buildUp]),
    [`GET /api/jobs/${JOB_ID}/estimates`]: json([summary(v1)]),
    [`GET /api/jobs/${JOB_ID}/estimates/1`]: json(v1),
    [`GET /api/jobs/${JOB_ID}/estimates/2`]: json(v2),
    ...extra,
  });
}

describe('the estimate tab', () => {
  it('runs an estimate with the chosen build-up and shows its lines, the unpriced one flagged, and the price', async () => {
    const posts: MockRequest[] = [];
    let versions = [summary(v1)];
    signedIn({
      [`GET /api/jobs/${JOB_ID}/estimates`]: () => json(versions),
      [`POST /api/jobs/${JOB_ID}/estimates`]: (request) => {
        posts.push(request);
        versions = [summary(v1), summary(v2)];
        return json(v2, 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });

    // The accepted version is shown first.
    expect(await screen.findByRole('heading', { name: 'Version 1' })).toBeInTheDocument();
    await user.type(screen.getByLabelText('Air on the day (°C)'), 'warm');
    await user.click(screen.getByRole('button', { name: 'Run estimate' }));
    expect(await screen.findByText('A temperature from -30 to 50 °C, like 12')).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Air on the day (°C)'));
    await user.type(screen.getByLabelText('Air on the day (°C)'), '12');
    await user.click(screen.getByRole('button', { name: 'Run estimate' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    // Supplier prices by default; the mat role keeps the material version 1 used.
    expect(posts[0]?.body).toEqual({
      buildUpId: 'bu-1',
      airC: '12',
      costBasis: 'supplier',
      materials: [{ role: 'mat', materialId: 'mat-1' }],
    });

    const view = await screen.findByRole('region', { name: 'Estimate version 2' });
    const mat = within(view).getAllByText('Chopped strand mat 450 g')[0]!.closest('tr')!;
    // The engine's unrounded 51.4684… m² is shown to the centimetre; the packs and cost as the API gives them.
    expect(within(mat).getByText('51.47 m²')).toBeInTheDocument();
    expect(within(mat).getByText('2 × 30 m² roll')).toBeInTheDocument();
    expect(within(mat).getByText('£58.00 / 30 m² roll')).toBeInTheDocument();
    expect(within(mat).getByText('£116.00')).toBeInTheDocument();
    const topcoat = within(view).getByText('Topcoat, slate grey').closest('tr')!;
    expect(within(topcoat).getByText('No price')).toBeInTheDocument();
    expect(within(view).getByText('1 without a price')).toBeInTheDocument();
    expect(within(view).getByText('Labour: 20.06 h × £32.00')).toBeInTheDocument();
    expect(within(view).getByText('£641.84')).toBeInTheDocument();
    expect(within(view).getByText('Markup 25 %')).toBeInTheDocument();
    expect(within(view).getByText('VAT 20 %')).toBeInTheDocument();
    expect(within(view).getByTestId('estimate-total')).toHaveTextContent('£1,136.76');
    expect(within(view).getByText('Styrene vapour.')).toBeInTheDocument();
  }, 40_000);

  it('asks before accepting a version, then accepts it', async () => {
    const accepted: MockRequest[] = [];
    signedIn({
      [`GET /api/jobs/${JOB_ID}/estimates`]: json([summary(v1), summary(v2)]),
      [`POST /api/jobs/${JOB_ID}/estimates/2/accept`]: (request) => {
        accepted.push(request);
        return json({ ...v2, accepted: true });
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });
    await user.click(await screen.findByRole('button', { name: 'Accept version 2' }));
    const confirm = await screen.findByRole('dialog', { name: 'Accept version 2?' });
    expect(confirm).toHaveTextContent('It replaces version 1.');
    expect(accepted).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Accept version 2' }));
    await waitFor(() => expect(accepted).toHaveLength(1));
    expect(await screen.findByText('Version 2 accepted.')).toBeInTheDocument();
  }, 30_000);

  it('checks the laying day and shows the problems, the dose and the cautions', async () => {
    const checks: MockRequest[] = [];
    signedIn({
      'POST /api/laying-check': (request) => {
        checks.push(request);
        return json({
          ok: false,
          problems: ['The deck is 4 °C, below the 5 °C minimum for laying resin.'],
          dewPointC: '6.43',
          catalystPercent: '2.5',
          workingTime: { minMinutes: 20, maxMinutes: 30, text: 'About 20–30 minutes before it gels.' },
          cautions: [{ id: 'catalyst', title: 'Catalyst', text: 'Corrosive to eyes.' }],
        });
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });
    const card = await screen.findByRole('form', { name: 'Laying check' });
    await user.click(within(card).getByRole('button', { name: 'Check the day' }));
    expect(await within(card).findByText('Enter the air temperature')).toBeInTheDocument();
    expect(checks).toHaveLength(0);
    await user.type(within(card).getByLabelText('Air (°C)'), '11');
    await user.type(within(card).getByLabelText('Humidity (%)'), '80');
    await user.type(within(card).getByLabelText('Deck (°C)'), '4');
    await user.click(within(card).getByRole('button', { name: 'Check the day' }));
    await waitFor(() => expect(checks).toHaveLength(1));
    expect(checks[0]?.body).toEqual({ airC: '11', surfaceC: '4', relativeHumidityPct: '80', raining: false });
    expect(await screen.findByText('Not fit to lay')).toBeInTheDocument();
    expect(
      screen.getByText('· The deck is 4 °C, below the 5 °C minimum for laying resin.'),
    ).toBeInTheDocument();
    expect(screen.getByText('Catalyst 2.5 %')).toBeInTheDocument();
    expect(screen.getByText('About 20–30 minutes before it gels.')).toBeInTheDocument();
    expect(screen.getByText('Corrosive to eyes.')).toBeInTheDocument();
  }, 30_000);

  it('runs on stock cost with a material chosen for a role, and shows the basis and the lot rows', async () => {
    const posts: MockRequest[] = [];
    const onStock = estimate({
      id: 'est-3',
      version: 2,
      costBasis: 'stock',
      unpriced: 0,
      problems: [],
      materials: [
        {
          ...v2.materials[0]!,
          material: { id: 'mat-2', name: 'Chopped strand mat 600 g' },
          stockQuantity: '40',
          packs: [
            // invented: 40 m² of lot M-7 at £1.9375 = £77.50, then one 30 m² roll at £58.00
            {
              source: 'stock',
              lot: { id: 'lot-7', batchNumber: 'M-7', unitCost: '1.9375' },
              size: '40',
              label: 'From stock, lot M-7',
              count: 1,
              packPrice: '77.50',
              supplier: null,
              cost: '77.50',
            },
            {
              source: 'supplier',
              lot: null,
              size: '30',
              label: '30 m² roll',
              count: 1,
              packPrice: '58.00',
              supplier: null,
              cost: '58.00',
            },
          ],
          cost: '135.50',
        },
      ],
    });
    let versions = [summary(v1)];
    const kinds: string[] = [];
    signedIn({
      [`GET /api/jobs/${JOB_ID}/estimates`]: () => json(versions),
      [`GET /api/jobs/${JOB_ID}/estimates/2`]: json(onStock),
      'GET /api/materials': () => {
        kinds.push('asked');
        return json({
          items: [
            { id: 'mat-1', code: 'CSM-450', name: 'Chopped strand mat 450 g', kind: 'mat' },
            { id: 'mat-2', code: 'CSM-600', name: 'Chopped strand mat 600 g', kind: 'mat' },
          ],
          total: 2,
          page: 1,
          pageSize: 100,
        });
      },
      [`POST /api/jobs/${JOB_ID}/estimates`]: (request) => {
        posts.push(request);
        versions = [summary(v1), summary(onStock)];
        return json(onStock, 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });
    expect(await screen.findByRole('heading', { name: 'Version 1' })).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: 'Stock the job can reserve' }));
    expect(
      screen.getByText(/Lots this job could reserve for its date, at what they cost/),
    ).toBeInTheDocument();
    // The catalogue is asked only when the section is opened.
    expect(kinds).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: /Materials for this run/ }));
    const mat = await screen.findByRole('combobox', { name: 'Mat' });
    await waitFor(() => expect(kinds).toHaveLength(1));
    expect(mat).toHaveValue('Chopped strand mat 450 g (CSM-450)');
    await user.click(mat);
    await user.click(await screen.findByRole('option', { name: 'Chopped strand mat 600 g (CSM-600)' }));
    expect(screen.getByText(/1 of 1 chosen, as version 1 with 1 changed/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Run estimate' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]?.body).toEqual({
      buildUpId: 'bu-1',
      costBasis: 'stock',
      materials: [{ role: 'mat', materialId: 'mat-2' }],
    });
    const view = await screen.findByRole('region', { name: 'Estimate version 2' });
    expect(within(view).getByText('Stock cost')).toBeInTheDocument();
    const row = within(view).getByText('Chopped strand mat 600 g').closest('tr')!;
    expect(within(row).getByText('40 m² from stock (lot M-7) + 1 × 30 m² roll')).toBeInTheDocument();
    expect(within(row).getByText('£1.9375 / m² (lot M-7), £58.00 / 30 m² roll')).toBeInTheDocument();
    expect(within(row).getByText('£135.50')).toBeInTheDocument();
    expect(screen.getAllByText('Stock cost').length).toBeGreaterThan(1); // the versions table says it too
  }, 60_000);

  it('leaves a role to best fit when asked, and offers stock cost only to a job with a date', async () => {
    const posts: MockRequest[] = [];
    signedIn({
      [`GET /api/jobs/${JOB_ID}`]: json(
        jobDetail({ acceptedEstimate: { id: 'est-1', version: 1 }, scheduledOn: null }),
      ),
      'GET /api/materials': json({ items: [], total: 0, page: 1, pageSize: 100 }),
      [`POST /api/jobs/${JOB_ID}/estimates`]: (request) => {
        posts.push(request);
        return json(v2, 201);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });
    expect(await screen.findByRole('heading', { name: 'Version 1' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'Stock the job can reserve' })).toBeDisabled();
    expect(screen.getByText(/Stock cost needs the job’s scheduled date/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: /Materials for this run/ }));
    const mat = await screen.findByRole('combobox', { name: 'Mat' });
    await user.click(mat);
    await user.click(await screen.findByRole('option', { name: 'Best fit' }));
    expect(screen.getByText(/best fit for every role/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Run estimate' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]?.body).toEqual({ buildUpId: 'bu-1', costBasis: 'supplier' });
  }, 60_000);

  it('asks for the roof before estimating a job that has none', async () => {
    signedIn({
      [`GET /api/jobs/${JOB_ID}`]: json(jobDetail({ hasRoof: false })),
      [`GET /api/jobs/${JOB_ID}/estimates`]: json([]),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=estimate` });
    expect(await screen.findByText('Measure the roof first')).toBeInTheDocument();
    expect(screen.getByText('No estimates yet: run one above.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Open the roof plan' }));
    expect(await screen.findByRole('tab', { name: /Roof plan/, selected: true })).toBeInTheDocument();
  });
});
