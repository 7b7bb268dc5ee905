import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import type { Role } from '../../../lib/roles';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockHandler, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import type { Count, CountLine } from '../api/types';

function line(overrides: Partial<CountLine>): CountLine {
  return {
    id: 'cl-1',
    lotId: 'lot-1',
    batchNumber: 'B24-0917',
    materialId: 'm-res',
    materialName: 'Base resin',
    materialCode: 'RES-25',
    stockUnit: 'kg',
    locationId: 'loc-bay',
    locationName: 'Bay A',
    expectedQuantity: null,
    countedQuantity: null,
    varianceQuantity: null,
    varianceValue: null,
    varianceKind: null,
    unitCost: '3.2000',
    foundDuringCount: false,
    countedAt: null,
    ...overrides,
  };
}

function count(overrides: Partial<Count>): Count {
  return {
    id: 'count-1',
    number: 7,
    status: 'open',
    locationId: 'loc-bay',
    scopeName: 'Bay A',
    note: null,
    openedAt: '2025-06-02T08:00:00Z',
    openedByName: 'Col Brennan',
    submittedAt: null,
    submittedByName: null,
    decidedAt: null,
    decidedByName: null,
    decisionNote: null,
    lineCount: 2,
    countedCount: 0,
    expectedVisible: false,
    locationNames: ['Bay A'],
    lines: [
      line({}),
      line({
        id: 'cl-2',
        lotId: 'lot-2',
        batchNumber: 'T-11',
        materialName: 'Topcoat, slate grey',
        materialCode: 'TOP-GRY',
      }),
    ],
    totals: { lines: 2, counted: 0, losses: 0, surpluses: 0, varianceValue: null },
    adjustments: [],
    ...overrides,
  };
}

// Expected 50 kg and 20 kg; counted 50 and 18: one loss of 2 kg at £3.20 a kg = −£6.40 (arithmetic).
const submitted = count({
  status: 'submitted',
  expectedVisible: true,
  submittedAt: '2025-06-02T09:00:00Z',
  submittedByName: 'Col Brennan',
  countedCount: 2,
  lines: [
    line({
      expectedQuantity: '50.000',
      countedQuantity: '50.000',
      varianceQuantity: '0.000',
      varianceValue: '0.00',
      varianceKind: 'match',
    }),
    line({
      id: 'cl-2',
      lotId: 'lot-2',
      batchNumber: 'T-11',
      materialName: 'Topcoat, slate grey',
      materialCode: 'TOP-GRY',
      expectedQuantity: '20.000',
      countedQuantity: '18.000',
      varianceQuantity: '-2.000',
      varianceValue: '-6.40',
      varianceKind: 'loss',
    }),
  ],
  totals: { lines: 2, counted: 2, losses: 1, surpluses: 0, varianceValue: '-6.40' },
});

function signedIn(role: Role, handlers: Record<string, MockHandler>) {
  setAccessToken(`token-${role}`);
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    'GET /api/locations': json([]),
    ...handlers,
  });
}

describe('a count', () => {
  beforeAll(() => import('./CountRoute'));

  it('lets the storeman count blind, refuses a submit with lines missing, then submits once', async () => {
    const submits: MockRequest[] = [];
    signedIn('storeman', {
      'GET /api/stock-counts/count-1': json(count({})),
      'POST /api/stock-counts/count-1/submit': (request) => {
        submits.push(request);
        return json(submitted);
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/counts/count-1' });
    const resin = await screen.findByLabelText('Counted Base resin B24-0917 at Bay A');
    expect(screen.queryByText(/ledger/)).not.toBeInTheDocument();

    await user.type(resin, '50');
    await user.click(screen.getByRole('button', { name: 'Submit' }));
    expect(await screen.findByText('1 line is not counted yet')).toBeInTheDocument();
    expect(submits).toHaveLength(0);

    await user.type(screen.getByLabelText('Counted Topcoat, slate grey T-11 at Bay A'), '18');
    expect(screen.getByText('2 of 2 lines counted')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Submit' }));
    const confirm = await screen.findByRole('dialog', { name: 'Submit count 7?' });
    await user.click(within(confirm).getByRole('button', { name: 'Submit' }));

    await waitFor(() => expect(submits).toHaveLength(1));
    expect(submits[0]?.body).toEqual({
      lines: [
        { lotId: 'lot-1', locationId: 'loc-bay', countedQuantity: '50' },
        { lotId: 'lot-2', locationId: 'loc-bay', countedQuantity: '18' },
      ],
    });
    expect(submits[0]?.headers.get('Idempotency-Key')).toMatch(/.{8,}/);
    // After the submit the differences show, and the storeman waits for the owner.
    const short = (await screen.findByText('Topcoat, slate grey')).closest('tr')!;
    expect(within(short).getByText('Less than expected')).toBeInTheDocument();
    expect(within(short).getByText('−£6.40')).toBeInTheDocument();
    expect(screen.getByText('Waiting for the owner')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Approve/ })).not.toBeInTheDocument();
  });

  it('refuses a count that is not a number', async () => {
    signedIn('storeman', { 'GET /api/stock-counts/count-1': json(count({})) });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/counts/count-1' });
    await user.type(await screen.findByLabelText('Counted Base resin B24-0917 at Bay A'), '4,5');
    expect(await screen.findByText('A number, 0 or more, at most 3 decimal places')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /^Save/ })).toBeDisabled();
  });

  it('lets the owner approve the differences after confirming', async () => {
    const approvals: MockRequest[] = [];
    signedIn('owner', {
      'GET /api/stock-counts/count-1': json(submitted),
      'POST /api/stock-counts/count-1/approve': (request) => {
        approvals.push(request);
        return json({
          ...submitted,
          status: 'approved',
          decidedAt: '2025-06-02T10:00:00Z',
          decidedByName: 'Dana Whitlow',
          adjustments: [
            {
              id: 'mv-1',
              lotId: 'lot-2',
              batchNumber: 'T-11',
              materialName: 'Topcoat, slate grey',
              stockUnit: 'kg',
              locationName: 'Bay A',
              quantity: '-2.000',
              value: '-6.40',
              reason: 'count 7',
              createdAt: '2025-06-02T10:00:00Z',
            },
          ],
        });
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/counts/count-1' });
    await user.click(await screen.findByRole('button', { name: 'Approve and post 1 adjustment' }));
    const confirm = await screen.findByRole('dialog', { name: 'Approve count 7?' });
    expect(
      within(confirm).getByText(
        /1 difference will be posted as adjustments with the reason "count 7", worth −£6.40/,
      ),
    ).toBeInTheDocument();
    expect(approvals).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Approve' }));
    await waitFor(() => expect(approvals).toHaveLength(1));
    expect(await screen.findByRole('heading', { name: 'Adjustments posted' })).toBeInTheDocument();
    expect(screen.getAllByText('−2 kg').length).toBeGreaterThan(0);
  });

  it('needs a reason to send a count back', async () => {
    const rejects: MockRequest[] = [];
    signedIn('owner', {
      'GET /api/stock-counts/count-1': json(submitted),
      'POST /api/stock-counts/count-1/reject': (request) => {
        rejects.push(request);
        return json(count({ decisionNote: 'Bay A top shelf was missed' }));
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/counts/count-1' });
    await user.click(await screen.findByRole('button', { name: 'Send back' }));
    expect(await screen.findByText('Say why, for whoever counts')).toBeInTheDocument();
    await user.type(screen.getByLabelText('Why'), 'Bay A top shelf was missed');
    await user.click(screen.getByRole('button', { name: 'Send back' }));
    await user.click(
      within(await screen.findByRole('dialog', { name: 'Send count 7 back to be counted again?' })).getByRole(
        'button',
        { name: 'Send back' },
      ),
    );
    await waitFor(() => expect(rejects).toHaveLength(1));
    expect(rejects[0]?.body).toEqual({ action: 'reopen', note: 'Bay A top shelf was missed' });
  });
});
