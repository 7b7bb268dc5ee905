import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../../app/routes';
import { setAccessToken } from '../../../../lib/auth-token';
import type { Role } from '../../../../lib/roles';
import { sessionUser } from '../../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../../test/mock-api';
import { renderWithProviders } from '../../../../test/render';
import { JOB_ID, jobDetail, pickList, reservations } from '../../test-fixtures';
import '../../routes/JobRoute';

/** The table row that shows a text (the same name also appears in alerts and cards). */
function rowOf(container: HTMLElement, text: string): HTMLElement {
  const row = within(container)
    .getAllByText(text)
    .map((e) => e.closest('tr'))
    .find((r): r is HTMLTableRowElement => r !== null);
  if (!row) {
    throw new Error(`No row shows "${text}"`);
  }
  return row;
}

function signedIn(role: Role, extra: Parameters<typeof mockApi>[0] = {}) {
  setAccessToken('token');
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    [`GET /api/jobs/${JOB_ID}`]: json(
      jobDetail({
        status: 'scheduled',
        acceptedEstimate: { id: 'est-2', version: 2 },
        materialState: 'short',
      }),
    ),
    [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
    'GET /api/build-ups/bu-1': json({ id: 'bu-1', upstandM: '0.15' }),
    [`GET /api/jobs/${JOB_ID}/reservations`]: json(reservations()),
    [`GET /api/jobs/${JOB_ID}/pick-list`]: json(pickList()),
    ...extra,
  });
}

describe('the materials tab', () => {
  it('reserves for the job date and lists the shortfall with what is needed by when', async () => {
    const posts: MockRequest[] = [];
    signedIn('estimator', {
      [`GET /api/jobs/${JOB_ID}/reservations`]: json(reservations({ state: 'not-reserved', materials: [] })),
      [`POST /api/jobs/${JOB_ID}/reservations`]: (request) => {
        posts.push(request);
        return json(reservations());
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const panel = await screen.findByRole('region', { name: 'Reservations' });
    expect(
      within(panel).getByText(/lots must be in date until 22 Jun 2026 \(7 days' margin\)/),
    ).toBeInTheDocument();
    // The estimator does not issue: no issue controls on the pick list.
    expect(screen.queryByRole('button', { name: /Issue/ })).not.toBeInTheDocument();
    await user.click(within(panel).getByRole('button', { name: 'Reserve for the job date' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(await screen.findByText('1 material short')).toBeInTheDocument();
  }, 30_000);

  it('shows what is reserved lot by lot, the shortfall and its order, and asks before releasing', async () => {
    const deletes: MockRequest[] = [];
    signedIn('estimator', {
      [`DELETE /api/jobs/${JOB_ID}/reservations`]: (request) => {
        deletes.push(request);
        return json(reservations({ state: 'not-reserved' }));
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const panel = await screen.findByRole('region', { name: 'Reservations' });
    expect(
      within(panel).getByText(
        /25 kg needed by 15 Jun 2026 — order 1 × 25 kg drum from Marsh End Resins \(5 days' lead time\)/,
      ),
    ).toBeInTheDocument();
    const row = rowOf(panel, 'Deck base resin');
    expect(within(row).getByText('75 kg')).toBeInTheDocument();
    expect(within(row).getByText('25 kg by 15 Jun 2026')).toBeInTheDocument();
    await user.click(row);
    expect(await within(panel).findByText('Lot B2604-11')).toBeInTheDocument();

    await user.click(within(panel).getByRole('button', { name: 'Release' }));
    const confirm = await screen.findByRole('dialog', { name: /Release the reservations of J-0012/ });
    expect(deletes).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Release' }));
    await waitFor(() => expect(deletes).toHaveLength(1));
  }, 30_000);

  it('lets the storeman issue part of a pick list line from a chosen place, once, with an idempotency key', async () => {
    const issues: MockRequest[] = [];
    signedIn('storeman', {
      [`POST /api/jobs/${JOB_ID}/issues`]: (request) => {
        issues.push(request);
        return json(
          {
            jobId: JOB_ID,
            operationIds: ['op-1'],
            lines: [
              {
                movementId: 'm1',
                lotId: 'lot-1',
                batchNumber: 'B2604-11',
                material: { id: 'mat-2', name: 'Deck base resin' },
                unit: 'kg',
                quantity: '20',
                locationId: 'loc-2',
                locationName: 'Van 1',
              },
            ],
            warnings: [],
          },
          201,
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}` });
    const list = await screen.findByRole('region', { name: 'Pick list' });
    expect(within(list).getByText('Flammables cabinet: 25 kg · Van 1: 25 kg')).toBeInTheDocument();
    expect(within(list).getByText('No smoking, no hot work.')).toBeInTheDocument();

    await user.click(within(list).getByRole('button', { name: /Issue the ticked lines/ }));
    expect(await screen.findByText('Tick the lines that go out to the job.')).toBeInTheDocument();
    expect(issues).toHaveLength(0);

    await user.click(within(list).getByRole('checkbox', { name: 'Issue line 1: Deck base resin' }));
    const quantity = within(list).getByRole('textbox', {
      name: 'Quantity to issue of Deck base resin, Lot B2604-11',
    });
    await user.clear(quantity);
    await user.type(quantity, '20');
    await user.click(within(list).getByRole('combobox', { name: 'Picked from, Deck base resin' }));
    await user.click(await screen.findByRole('option', { name: 'Van 1' }));
    await user.click(within(list).getByRole('button', { name: 'Issue 1 line' }));
    await waitFor(() => expect(issues).toHaveLength(1));
    expect(issues[0]?.body).toEqual({
      lines: [{ lotId: 'lot-1', quantity: '20', fromLocationId: 'loc-2' }],
      note: null,
    });
    expect(issues[0]?.headers.get('Idempotency-Key')).toMatch(/.{8,}/);
    expect(await screen.findByText('Issued to J-0012')).toBeInTheDocument();
  }, 40_000);

  it('lets the storeman book a return of full packs and a weighed part-pack into the lot it came from', async () => {
    const returns: MockRequest[] = [];
    const issued = reservations({
      state: 'reserved',
      materials: [
        {
          ...reservations().materials[0]!,
          issued: '50',
          shortfall: null,
          reservations: [
            {
              ...reservations().materials[0]!.reservations[0]!,
              status: 'issued',
              issuedQuantity: '50',
              heldQuantity: '0',
            },
          ],
        },
      ],
    });
    signedIn('storeman', {
      [`GET /api/jobs/${JOB_ID}/reservations`]: json(issued),
      [`GET /api/jobs/${JOB_ID}/pick-list`]: json(
        pickList({
          lines: [],
          issued: [
            { material: { id: 'mat-2', name: 'Deck base resin' }, unit: 'kg', issued: '50', returned: '0' },
          ],
        }),
      ),
      [`POST /api/jobs/${JOB_ID}/returns`]: (request) => {
        returns.push(request);
        return json(
          {
            jobId: JOB_ID,
            operationIds: ['op-2'],
            lines: [
              {
                movementId: 'm2',
                lotId: 'lot-1',
                batchNumber: 'B2604-11',
                material: { id: 'mat-2', name: 'Deck base resin' },
                unit: 'kg',
                quantity: '32.4',
                locationId: 'loc-1',
                locationName: 'Flammables cabinet',
                fullPacks: 1,
                partQuantity: '7.4',
              },
            ],
            warnings: [],
          },
          201,
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=materials` });
    const panel = await screen.findByRole('region', { name: 'Issued and returned' });
    expect(rowOf(panel, 'Deck base resin')).toHaveTextContent('50 kg');

    await user.type(
      within(panel).getByRole('textbox', { name: 'Part-pack back of Deck base resin, Lot B2604-11' }),
      '7,4',
    );
    await user.click(within(panel).getByRole('button', { name: 'Book the return' }));
    expect(
      await within(panel).findByText('What the part-pack weighs or measures, like 7.4'),
    ).toBeInTheDocument();
    expect(returns).toHaveLength(0);

    const part = within(panel).getByRole('textbox', {
      name: 'Part-pack back of Deck base resin, Lot B2604-11',
    });
    await user.clear(part);
    await user.type(part, '7.4');
    await user.type(
      within(panel).getByRole('textbox', { name: 'Full packs back of Deck base resin, Lot B2604-11' }),
      '1',
    );
    await user.click(within(panel).getByRole('button', { name: 'Book the return' }));
    await waitFor(() => expect(returns).toHaveLength(1));
    expect(returns[0]?.body).toEqual({
      lines: [{ lotId: 'lot-1', fullPacks: 1, partQuantity: '7.4' }],
      note: null,
    });
    expect(returns[0]?.headers.get('Idempotency-Key')).toBeTruthy();
    expect(await screen.findByText('Return booked for J-0012')).toBeInTheDocument();
  }, 40_000);
});
