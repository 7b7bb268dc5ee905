import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../../app/routes';
import { setAccessToken } from '../../../../lib/auth-token';
import { sessionUser } from '../../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../../test/mock-api';
import { renderWithProviders } from '../../../../test/render';
import type { RoofBody } from '../../api/types';
import { buildUp, JOB_ID, jobDetail } from '../../test-fixtures';

const L_CORNERS = [
  ['0', '0'],
  ['8', '0'],
  ['8', '4'],
  ['4', '4'],
  ['4', '7'],
  ['0', '7'],
];

function signedIn(puts: MockRequest[], role: 'estimator' | 'storeman' = 'estimator') {
  setAccessToken('token');
  return mockApi({
    'GET /api/auth/me': json(sessionUser(role)),
    [`GET /api/jobs/${JOB_ID}`]: json(jobDetail({ hasRoof: false, roofUpdatedAt: null })),
    [`GET /api/jobs/${JOB_ID}/roof`]: json({ jobId: JOB_ID, updatedAt: null, roof: null, summary: null }),
    'GET /api/build-ups/bu-1': json(buildUp),
    [`PUT /api/jobs/${JOB_ID}/roof`]: (request) => {
      puts.push(request);
      const body = request.body as RoofBody;
      return json({
        jobId: JOB_ID,
        updatedAt: '2026-05-05T10:00:00Z',
        roof: {
          ...body,
          areas: body.areas.map((a) => ({ ...a, fall: a.fall ?? null })),
          edges: body.edges.map((e) => ({ upstandM: null, areaIndex: null, side: null, label: null, ...e })),
        },
        summary: null,
      });
    },
  });
}

async function typeCorners(user: ReturnType<typeof renderWithProviders>['user'], corners: string[][]) {
  const area = screen.getByRole('region', { name: /Area 1/ });
  for (let i = 0; i < corners.length; i++) {
    await user.click(within(area).getByRole('button', { name: 'Add a corner' }));
    fireEvent.change(within(area).getByRole('textbox', { name: `Area 1 corner ${i + 1} x` }), {
      target: { value: corners[i]![0] },
    });
    fireEvent.change(within(area).getByRole('textbox', { name: `Area 1 corner ${i + 1} y` }), {
      target: { value: corners[i]![1] },
    });
  }
  return area;
}

describe('the roof editor', () => {
  it('draws an L-shaped polygon to scale with the domain’s totals, asks for every side’s kind, then saves the roof', async () => {
    const puts: MockRequest[] = [];
    signedIn(puts);
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=roof` });

    const area = await screen.findByRole('region', { name: /Area 1/ });
    await user.click(within(area).getByRole('radio', { name: 'Polygon' }));
    await typeCorners(user, L_CORNERS);

    // The plan and the totals, from the domain: 8 × 4 + 4 × 3 = 44 m² (arithmetic).
    await waitFor(() =>
      expect(screen.getByTestId('roof-plan')).toHaveAccessibleName('Roof plan: Main roof 44 m²'),
    );
    const totals = screen.getByRole('region', { name: 'Roof totals' });
    expect(within(totals).getAllByText('44 m²')).toHaveLength(2);
    expect(within(area).getByText('8 m')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Save roof' }));
    expect(await screen.findByText('Fix the 6 fields marked in red first.')).toBeInTheDocument();
    expect(puts).toHaveLength(0);

    const kinds = ['Drip', 'Kerb', 'Angle', 'Wall (upstand)', 'Kerb', 'Drip'];
    for (let i = 0; i < kinds.length; i++) {
      await user.click(
        within(area).getByRole('combobox', { name: `Kind of Area 1 side ${i + 1} → ${((i + 1) % 6) + 1}` }),
      );
      await user.click(await screen.findByRole('option', { name: kinds[i] }));
    }
    // The wall's upstand (the build-up's 0.15 m) is laminated too: 44 + 3 × 0.15 = 44.45 m² (arithmetic).
    await waitFor(() => expect(within(totals).getByText('44.45 m²')).toBeInTheDocument());

    await user.click(screen.getByRole('button', { name: 'Save roof' }));
    await waitFor(() => expect(puts).toHaveLength(1));
    const body = puts[0]!.body as RoofBody;
    expect(body.areas).toEqual([{ name: 'Main roof', shape: 'polygon', points: L_CORNERS, fall: null }]);
    expect(body.edges.map((e) => [e.kind, e.lengthM, e.side])).toEqual([
      ['drip', '8', 0],
      ['kerb', '4', 1],
      ['angle', '4', 2],
      ['wall', '3', 3],
      ['kerb', '4', 4],
      ['drip', '7', 5],
    ]);
    expect(await screen.findByText('Roof saved.')).toBeInTheDocument();
  }, 60_000);

  it("shows the domain's refusal at an area whose outline crosses itself, and does not save it", async () => {
    const puts: MockRequest[] = [];
    signedIn(puts);
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}?tab=roof` });

    const area = await screen.findByRole('region', { name: /Area 1/ });
    await user.click(within(area).getByRole('radio', { name: 'Polygon' }));
    await typeCorners(user, [
      ['0', '0'],
      ['4', '4'],
      ['4', '0'],
      ['0', '4'],
    ]);
    const alert = await within(area).findByRole('alert');
    expect(alert).toHaveTextContent('Area 1 cannot be measured');
    expect(alert).toHaveTextContent(/Segments 1 and 3 of the polygon's outline cross or touch/);
    expect(screen.getByTestId('plan-area-1')).toHaveAttribute('data-problem', 'true');
    expect(screen.getByText(/Not yet counted|The totals appear/)).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Save roof' }));
    expect(await screen.findByText('The roof was not saved')).toBeInTheDocument();
    expect(puts).toHaveLength(0);
  }, 30_000);

  it('shows the storeman the saved roof without the form', async () => {
    setAccessToken('token');
    mockApi({
      'GET /api/auth/me': json(sessionUser('storeman')),
      [`GET /api/jobs/${JOB_ID}`]: json(jobDetail()),
      [`GET /api/jobs/${JOB_ID}/roof`]: json({
        jobId: JOB_ID,
        updatedAt: '2026-05-05T10:00:00Z',
        roof: {
          areas: [{ name: 'Flat', shape: 'rectangle', lengthM: '6', widthM: '4', fall: null }],
          edges: [{ kind: 'drip', lengthM: '6', upstandM: null, areaIndex: 0, side: 0, label: null }],
          pipes: 0,
          outlets: 1,
          corners: null,
          notes: 'Soft patch by the outlet.',
        },
        summary: {
          areas: [],
          deckAreaM2: '24',
          upstandAreaM2: '0',
          laminatedAreaM2: '24',
          trimM: '6',
          trimMByKind: { drip: '6', kerb: '0', wall: '0', angle: '0' },
          corners: { external: 0, internal: 0, derived: true },
          pipes: 0,
          outlets: 1,
          falls: [],
          warnings: [],
        },
      }),
      [`GET /api/jobs/${JOB_ID}/reservations`]: json({
        jobId: JOB_ID,
        jobDate: null,
        marginDays: 7,
        useBy: null,
        estimate: null,
        state: 'no-estimate',
        materials: [],
        skipped: [],
        flagged: 0,
      }),
      [`GET /api/jobs/${JOB_ID}/pick-list`]: json({
        jobId: JOB_ID,
        reference: 'J-0012',
        title: 't',
        siteAddress: 's',
        jobDate: null,
        crew: null,
        lines: [],
        unreserved: [],
        issued: [],
        cautions: [],
      }),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: `/jobs/${JOB_ID}` });
    // The storeman lands on the materials; the roof is a tab away, and there is no estimate tab.
    expect(await screen.findByRole('tab', { name: /Materials/, selected: true })).toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: /Estimate/ })).not.toBeInTheDocument();
    await user.click(screen.getByRole('tab', { name: /Roof plan/ }));
    expect(await screen.findByTestId('roof-plan')).toHaveAccessibleName('Roof plan: Flat 24 m²');
    expect(screen.getByText('Soft patch by the outlet.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save roof' })).not.toBeInTheDocument();
    expect(screen.queryByText(/£/)).not.toBeInTheDocument();
  });
});
