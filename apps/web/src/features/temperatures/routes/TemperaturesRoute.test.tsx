import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { installFakeXhr } from '../../../test/fake-xhr';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockHandler, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';

const locations = [
  {
    id: 'loc-per',
    name: 'Peroxide store',
    path: 'Peroxide store',
    kind: 'peroxide-store',
    active: true,
    lotCount: 1,
  },
];

const chart = {
  locationId: 'loc-per',
  from: '2025-05-03T00:00:00Z',
  to: '2025-06-02T00:00:00Z',
  band: { minC: '0', maxC: '25', materials: ['Catalyst'] },
  readings: [
    {
      id: 'r-1',
      locationId: 'loc-per',
      locationName: 'Peroxide store',
      takenAt: '2025-06-01T06:00:00Z',
      temperatureC: '18.50',
      source: 'import',
      note: null,
      outOfBand: false,
    },
    {
      id: 'r-2',
      locationId: 'loc-per',
      locationName: 'Peroxide store',
      takenAt: '2025-06-01T12:00:00Z',
      temperatureC: '27.50',
      source: 'import',
      note: null,
      outOfBand: true,
    },
  ],
};

const flaggedLot = {
  id: 'lot-cat',
  materialCode: 'CAT-1',
  materialName: 'Catalyst',
  batchNumber: 'PX-11',
  quantity: '10.000',
  stockUnit: 'kg',
  status: 'available',
  exposureFlagged: true,
  exposureReason: 'Peroxide store read 27.5 °C, above the 25 °C allowed',
  exposureFlaggedAt: '2025-06-01T12:00:00Z',
  places: [{ locationId: 'loc-per', locationName: 'Peroxide store', quantity: '10.000' }],
};

function setUp(extra: Record<string, MockHandler> = {}) {
  setAccessToken('token-storeman');
  return mockApi({
    'GET /api/auth/me': json(sessionUser('storeman')),
    'GET /api/locations': json(locations),
    'GET /api/temperature-readings': json(chart),
    'GET /api/lots': json([flaggedLot]),
    ...extra,
  });
}

describe('temperatures', () => {
  beforeAll(() => import('./TemperaturesRoute'));

  it('lists the readings against the band and the lots to check before use', async () => {
    setUp();
    renderWithProviders(<AppRoutes />, { route: '/temperatures' });
    const hot = (await screen.findByText('27.5 °C')).closest('tr')!;
    expect(within(hot).getByText('Outside')).toBeInTheDocument();
    expect(screen.getByText('18.5 °C').closest('tr')).toHaveTextContent('Inside');
    expect(await screen.findByRole('link', { name: 'Catalyst · PX-11' })).toBeInTheDocument();
  });

  it('records a typed reading and says which lots it flagged', async () => {
    const posted: MockRequest[] = [];
    setUp({
      'POST /api/temperature-readings': (request) => {
        posted.push(request);
        return json(
          {
            reading: { ...chart.readings[1], id: 'r-3' },
            flaggedLots: [
              {
                lotId: 'lot-cat',
                materialName: 'Catalyst',
                batchNumber: 'PX-11',
                exposure: 'too-warm',
                message: 'Catalyst PX-11: 27.5 °C is above its 25 °C: check before use',
                readingId: 'r-3',
                takenAt: '2025-06-01T12:00:00Z',
                newlyFlagged: true,
              },
            ],
          },
          201,
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/temperatures' });
    await user.click(await screen.findByRole('button', { name: 'Record the reading' }));
    expect(await screen.findByText('Enter the temperature in °C, like 18.5 or -2')).toBeInTheDocument();
    await user.type(screen.getByLabelText('Temperature (°C)'), '27.5');
    await user.click(screen.getByRole('button', { name: 'Record the reading' }));
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]?.body).toMatchObject({
      locationId: 'loc-per',
      temperatureC: '27.5',
      takenAt: expect.stringMatching(/Z$/),
    });
    expect(
      await screen.findByText('Catalyst PX-11: 27.5 °C is above its 25 °C: check before use'),
    ).toBeInTheDocument();
  });

  it("checks a logger's file first, lists the rows left out, then imports", async () => {
    const { sent } = installFakeXhr();
    const answer = (dryRun: boolean) => ({
      dryRun,
      rows: 3,
      imported: 2,
      errors: [{ row: 3, message: 'temperature: "warm" is not a number' }],
      duplicates: [],
      firstTakenAt: '2025-06-01T06:00:00Z',
      lastTakenAt: '2025-06-01T18:00:00Z',
      flaggedLots: [],
    });
    setUp({
      'POST /api/temperature-readings/import': () => {
        const body = JSON.parse(String(sent[sent.length - 1]?.body)) as { dryRun: boolean };
        return json(answer(body.dryRun));
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/temperatures' });
    await user.click(await screen.findByRole('tab', { name: "Import a logger's file" }));
    const csv =
      'timestamp,temperature\n2025-06-01T06:00:00Z,17.8\n2025-06-01T12:00:00Z,warm\n2025-06-01T18:00:00Z,19.1\n';
    await user.upload(
      screen.getByLabelText("Choose the logger's CSV"),
      new File([csv], 'logger.csv', { type: 'text/csv' }),
    );

    expect(await screen.findByText('Checked: nothing saved yet')).toBeInTheDocument();
    const left = screen.getByText('temperature: "warm" is not a number').closest('tr')!;
    expect(within(left).getByText('3')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Import 2 readings' }));
    expect(await screen.findByText('Imported')).toBeInTheDocument();

    expect(sent.map((s) => (JSON.parse(String(s.body)) as { dryRun: boolean }).dryRun)).toEqual([
      true,
      false,
    ]);
    expect(sent[0]?.headers['Idempotency-Key']).toBeUndefined();
    expect(sent[1]?.headers['Idempotency-Key']).toMatch(/.{8,}/);
  });

  it('needs a note, and asks, before clearing a flag', async () => {
    const cleared: MockRequest[] = [];
    setUp({
      'POST /api/lots/lot-cat/clear-flag': (request) => {
        cleared.push(request);
        return json({});
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/temperatures' });
    await user.click(await screen.findByRole('button', { name: 'Clear the flag on Catalyst PX-11' }));
    const dialog = await screen.findByRole('dialog', { name: 'Clear the flag on Catalyst PX-11' });
    await user.click(within(dialog).getByRole('button', { name: 'Next' }));
    expect(await within(dialog).findByText('Say what you checked')).toBeInTheDocument();
    await user.type(within(dialog).getByLabelText('Note'), 'Checked: clear, no gas');
    await user.click(within(dialog).getByRole('button', { name: 'Next' }));
    expect(cleared).toHaveLength(0);
    await user.click(await within(dialog).findByRole('button', { name: 'Clear the flag' }));
    await waitFor(() => expect(cleared).toHaveLength(1));
    expect(cleared[0]?.body).toEqual({ note: 'Checked: clear, no gas' });
  });
});
