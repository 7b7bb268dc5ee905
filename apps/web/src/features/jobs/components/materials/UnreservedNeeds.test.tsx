import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../../app/routes';
import { setAccessToken } from '../../../../lib/auth-token';
import type { Role } from '../../../../lib/roles';
import { sessionUser } from '../../../../test/fixtures';
import { apiError, json, mockApi, type MockRequest } from '../../../../test/mock-api';
import { renderWithProviders } from '../../../../test/render';
import type { PickListUnreserved } from '../../api/types';
import { JOB_ID, jobDetail, pickList, reservations } from '../../test-fixtures';
import '../../routes/JobRoute';

/**
 * 15 kg of resin not reserved. The API's FEFO order and suggestion (its allocateFefo): 4 kg of
 * R-11 (the first to expire, 4 free), then 11 of R-12 (25 on hand, 14 held for another job, 11
 * free); R-13 is usable but not needed. R-09 is flagged and not offered.
 */
function resinNeed(over: Partial<PickListUnreserved> = {}): PickListUnreserved {
  return {
    material: { id: 'mat-2', code: 'RES-D', name: 'Deck base resin' },
    unit: 'kg',
    quantity: '15',
    candidates: [
      {
        lot: { id: 'lot-11', batchNumber: 'R-11', expiresOn: '2026-07-01' },
        onHand: '4',
        free: '4',
        suggested: '4',
        places: [{ locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '4' }],
      },
      {
        lot: { id: 'lot-12', batchNumber: 'R-12', expiresOn: '2026-08-01' },
        onHand: '25',
        free: '11',
        suggested: '11',
        places: [
          { locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '20' },
          { locationId: 'loc-2', locationName: 'Van 1', quantity: '5' },
        ],
      },
      {
        lot: { id: 'lot-13', batchNumber: 'R-13', expiresOn: '2026-09-01' },
        onHand: '25',
        free: '25',
        suggested: null,
        places: [{ locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '25' }],
      },
    ],
    short: '0',
    passedOver: [
      {
        lot: { id: 'lot-9', batchNumber: 'R-09', expiresOn: '2026-06-30' },
        onHand: '25',
        flags: [
          {
            code: 'exposure-flagged',
            message: 'Flagged “check before use”: it cannot be issued until the flag is cleared.',
          },
        ],
      },
    ],
    ...over,
  };
}

const issued = (lotId: string, quantity: string, locationName: string) =>
  json(
    {
      jobId: JOB_ID,
      operationIds: ['op-1'],
      lines: [
        {
          movementId: 'm1',
          lotId,
          batchNumber: null,
          material: { id: 'mat-2', name: 'Deck base resin' },
          unit: 'kg',
          quantity,
          locationId: 'loc-1',
          locationName,
        },
      ],
      warnings: [],
    },
    201,
  );

function signedIn(role: Role, extra: Parameters<typeof mockApi>[0] = {}, needs = [resinNeed()]) {
  setAccessToken('token');
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    [`GET /api/jobs/${JOB_ID}`]: json(
      jobDetail({
        status: 'scheduled',
        acceptedEstimate: { id: 'est-2', version: 2 },
        materialState: 'not-reserved',
      }),
    ),
    [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
    'GET /api/build-ups/bu-1': json({ id: 'bu-1', upstandM: '0.15' }),
    [`GET /api/jobs/${JOB_ID}/reservations`]: json(reservations({ state: 'not-reserved' })),
    [`GET /api/jobs/${JOB_ID}/pick-list`]: json(pickList({ lines: [], unreserved: needs })),
    ...extra,
  });
}

describe('needs that were not reserved, on the pick list', () => {
  it('offers the lots FEFO with the suggestion preselected and issues the need capped at the lot’s free quantity', async () => {
    const posts: MockRequest[] = [];
    signedIn('storeman', {
      [`POST /api/jobs/${JOB_ID}/issues`]: (request) => {
        posts.push(request);
        return issued('lot-11', '4', 'Flammables cabinet');
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const card = await screen.findByRole('article', { name: 'Not reserved: Deck base resin' });
    expect(within(card).getByText('15 kg to send')).toBeInTheDocument();
    const lots = within(within(card).getByRole('list', { name: 'Lots for Deck base resin' })).getAllByRole(
      'listitem',
    );
    // In the API's (FEFO) order, the suggestion marked on the lots it takes.
    expect(lots.map((l) => l.textContent)).toEqual([
      expect.stringMatching(/^Lot R-11.*4 kg free.*Suggested: 4 kg$/),
      expect.stringMatching(
        /^Lot R-12.*11 kg free.*Flammables cabinet: 20 kg · Van 1: 5 kg.*Suggested: 11 kg$/,
      ),
      expect.not.stringContaining('Suggested'),
    ]);
    expect(within(card).getByText('Not offered: Lot R-09 (25 kg)')).toBeInTheDocument();
    expect(within(card).getByText('Check before use')).toBeInTheDocument();

    // The first suggested lot is chosen; 15 kg needed but the lot has 4 free: 4.
    expect(within(card).getByRole('combobox', { name: 'Lot for Deck base resin' })).toHaveValue(
      'Lot R-11 · expires 1 Jul 2026 · 4 kg free · suggested',
    );
    expect(within(card).getByRole('textbox', { name: 'Quantity to issue of Deck base resin' })).toHaveValue(
      '4',
    );
    // One place only: no location to choose.
    expect(
      within(card).queryByRole('combobox', { name: 'Picked from, Deck base resin' }),
    ).not.toBeInTheDocument();
    await user.click(within(card).getByRole('button', { name: 'Issue Deck base resin' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]?.body).toEqual({
      lines: [{ lotId: 'lot-11', quantity: '4', fromLocationId: 'loc-1' }],
      note: null,
    });
    expect(posts[0]?.headers.get('Idempotency-Key')).toMatch(/.{8,}/);
    expect(await screen.findByText('Issued to J-0012')).toBeInTheDocument();
  }, 40_000);

  it('asks where a lot in several places is picked from, and refuses more than is there', async () => {
    const posts: MockRequest[] = [];
    signedIn('storeman', {
      [`POST /api/jobs/${JOB_ID}/issues`]: (request) => {
        posts.push(request);
        return issued('lot-12', '5', 'Van 1');
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const card = await screen.findByRole('article', { name: 'Not reserved: Deck base resin' });
    await user.click(within(card).getByRole('combobox', { name: 'Lot for Deck base resin' }));
    await user.click(await screen.findByRole('option', { name: /^Lot R-12/ }));
    // Where most of it is first: 20 kg in the cabinet, but only 11 free for this job.
    const from = within(card).getByRole('combobox', { name: 'Picked from, Deck base resin' });
    expect(from).toHaveValue('Flammables cabinet (20 kg)');
    const quantity = within(card).getByRole('textbox', { name: 'Quantity to issue of Deck base resin' });
    expect(quantity).toHaveValue('11');
    await user.click(from);
    await user.click(await screen.findByRole('option', { name: 'Van 1 (5 kg)' }));
    expect(quantity).toHaveValue('5');
    await user.clear(quantity);
    await user.type(quantity, '6');
    await user.click(within(card).getByRole('button', { name: 'Issue Deck base resin' }));
    expect(
      await within(card).findByText('At most 5 kg of Lot R-12 may go to this job from Van 1.'),
    ).toBeInTheDocument();
    await user.clear(quantity);
    await user.type(quantity, '0');
    await user.click(within(card).getByRole('button', { name: 'Issue Deck base resin' }));
    expect(await within(card).findByText(/Enter how much goes out, more than 0/)).toBeInTheDocument();
    expect(posts).toHaveLength(0);
    await user.clear(quantity);
    await user.type(quantity, '5');
    await user.click(within(card).getByRole('button', { name: 'Issue Deck base resin' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]?.body).toEqual({
      lines: [{ lotId: 'lot-12', quantity: '5', fromLocationId: 'loc-2' }],
      note: null,
    });
  }, 40_000);

  it('says plainly when the lot was reserved for another job meanwhile', async () => {
    signedIn('storeman', {
      [`POST /api/jobs/${JOB_ID}/issues`]: apiError(
        409,
        'Line 1: only 0 kg of Deck base resin, batch R-11 may go to this job; 4 is reserved for J-0007.',
        'reserved_for_another_job',
      ),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const card = await screen.findByRole('article', { name: 'Not reserved: Deck base resin' });
    await user.click(within(card).getByRole('button', { name: 'Issue Deck base resin' }));
    const alert = await within(card).findByRole('alert');
    expect(alert).toHaveTextContent('Reserved for another job');
    expect(alert).toHaveTextContent(
      'only 0 kg of Deck base resin, batch R-11 may go to this job; 4 is reserved for J-0007.',
    );
  }, 40_000);

  it('shows the estimator the lots without issuing, and a need with no usable lot as one to order', async () => {
    signedIn('estimator', {}, [
      resinNeed(),
      {
        material: { id: 'mat-3', code: 'TC-S', name: 'Topcoat slate grey' },
        unit: 'kg',
        quantity: '5',
        candidates: [],
        short: '5',
        passedOver: [],
      },
    ]);
    renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const card = await screen.findByRole('article', { name: 'Not reserved: Deck base resin' });
    expect(within(card).getByText('Suggested: 4 kg')).toBeInTheDocument();
    expect(within(card).queryByRole('button', { name: /Issue/ })).not.toBeInTheDocument();
    const topcoat = screen.getByRole('article', { name: 'Not reserved: Topcoat slate grey' });
    expect(
      within(topcoat).getByText(/No lot in stock can go to this job: it has to be ordered/),
    ).toBeInTheDocument();
  }, 30_000);
});
