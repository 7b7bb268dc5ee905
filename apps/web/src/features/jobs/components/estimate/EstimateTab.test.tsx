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
    expect(posts[0]?.body).toEqual({ buildUpId: 'bu-1', airC: '12' });

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
