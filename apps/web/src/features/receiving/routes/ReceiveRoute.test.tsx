import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { UserEvent } from '@testing-library/user-event';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { installFakeXhr } from '../../../test/fake-xhr';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi, type MockRequest } from '../../../test/mock-api';
import { currentLocation, renderWithProviders } from '../../../test/render';
import type { Receipt } from '../api/types';

const materials = [
  {
    id: 'm-res',
    code: 'RES-25',
    name: 'Base resin',
    kind: 'base-resin',
    stockUnit: 'kg',
    packSizes: [{ size: '25', label: '25 kg drum' }],
    lotTracked: true,
    shelfLifeDays: 90,
    hazardClass: '3',
  },
  {
    id: 'm-cat',
    code: 'CAT-1',
    name: 'Catalyst',
    kind: 'catalyst',
    stockUnit: 'kg',
    packSizes: [{ size: '1', label: '1 kg bottle' }],
    lotTracked: true,
    shelfLifeDays: 180,
    hazardClass: '5.2',
  },
];
const locations = [
  {
    id: 'loc-bay',
    path: 'Main store › Bay A',
    kind: 'bay',
    active: true,
    allowedHazardClasses: ['none', '3'],
  },
  {
    id: 'loc-per',
    path: 'Peroxide store',
    kind: 'peroxide-store',
    active: true,
    allowedHazardClasses: ['5.2'],
  },
];

const receipt: Receipt = {
  id: 'rcpt-1',
  number: 12,
  supplierId: 's-1',
  supplierName: 'Brackwater Resins',
  deliveryNoteNumber: 'DN-881',
  receivedOn: '2025-06-02',
  note: null,
  receivedById: 'user-storeman',
  receivedByName: 'Col Brennan',
  createdAt: '2025-06-02T08:00:00Z',
  deliveryNote: null,
  lines: [
    {
      id: 'l-1',
      lineNo: 1,
      materialId: 'm-res',
      materialCode: 'RES-25',
      materialName: 'Base resin',
      stockUnit: 'kg',
      purchaseOrderLineId: null,
      batchNumber: 'B24-0917',
      expiresOn: '2025-08-31',
      expiryComputed: true,
      packsReceived: 4,
      packSize: '25.000',
      packsRefused: 1,
      refusedReason: 'Drum split',
      quantity: '100.000',
      unitCost: '3.2000',
      value: '320.00',
      locationId: 'loc-bay',
      locationName: 'Bay A',
      lotId: 'lot-1',
      overDeliveryAllowed: false,
    },
  ],
  totalValue: '320.00',
  labelsUrl: '/api/receipts/rcpt-1/labels.pdf',
  warnings: ['Batch B24-0917 expires within 90 days'],
};

async function fill(user: UserEvent, field: HTMLElement, text: string) {
  await user.click(field);
  await user.paste(text);
}

function setUp(extra: Parameters<typeof mockApi>[0] = {}) {
  setAccessToken('token-storeman');
  return mockApi({
    'GET /api/auth/me': json(sessionUser('storeman')),
    'GET /api/suppliers': json({
      items: [{ id: 's-1', name: 'Brackwater Resins' }],
      total: 1,
      page: 1,
      pageSize: 200,
    }),
    'GET /api/materials': json({ items: materials, total: 2, page: 1, pageSize: 200 }),
    'GET /api/locations': json(locations),
    'GET /api/receipts/rcpt-1': json(receipt),
    ...extra,
  });
}

describe('receiving a delivery', () => {
  // The screen is a lazy chunk: load it once before the tests, not inside the first one's wait.
  beforeAll(() => import('./ReceiveRoute'));

  it('checks the lines before anything is sent', async () => {
    const posted: MockRequest[] = [];
    setUp({ 'POST /api/receipts': (request) => (posted.push(request), json(receipt, 201)) });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/receipts/new' });
    await screen.findByRole('heading', { name: 'Receive a delivery' });

    await user.click(screen.getByRole('button', { name: 'Check and book in' }));
    expect(await screen.findByText('Choose who delivered, or pick "Not in the list"')).toBeInTheDocument();
    const line = screen.getByRole('group', { name: 'Line 1' });
    expect(within(line).getByText('Choose the material')).toBeInTheDocument();

    await user.click(within(line).getByRole('combobox', { name: 'Material' }));
    await user.click(await screen.findByRole('option', { name: 'RES-25 Base resin' }));
    await fill(user, within(line).getByLabelText('Packs taken in'), '4');
    await user.click(screen.getByRole('button', { name: 'Check and book in' }));
    expect(await within(line).findByText("Enter the maker's batch number from the pack")).toBeInTheDocument();
    expect(within(line).getByText('Choose where the packs are put away')).toBeInTheDocument();
    // The expiry left empty is worked out from the shelf life (received date + 90 days).
    expect(within(line).getByText(/Left empty: .* \(90 days' shelf life\)/)).toBeInTheDocument();
    expect(within(line).getByText('= 100 kg')).toBeInTheDocument();
    expect(posted).toHaveLength(0);
  });

  it('offers only the locations that take the material’s hazard class', async () => {
    setUp();
    const { user } = renderWithProviders(<AppRoutes />, { route: '/receipts/new' });
    const line = await screen.findByRole('group', { name: 'Line 1' });
    await user.click(within(line).getByRole('combobox', { name: 'Material' }));
    await user.click(await screen.findByRole('option', { name: 'CAT-1 Catalyst' }));
    await user.click(within(line).getByRole('combobox', { name: 'Put away at' }));
    expect(
      await screen.findByRole('option', { name: 'Main store › Bay A (does not take class 5.2)' }),
    ).toHaveAttribute('data-combobox-disabled', 'true');
    expect(screen.getByRole('option', { name: 'Peroxide store' })).not.toHaveAttribute(
      'data-combobox-disabled',
    );
  });

  it('books the delivery in once, sends the delivery note, and offers the labels', async () => {
    const posted: MockRequest[] = [];
    const { sent } = installFakeXhr();
    setUp({
      'POST /api/receipts': (request) => {
        posted.push(request);
        return json(receipt, 201);
      },
      'POST /api/receipts/rcpt-1/delivery-note': json({
        ...receipt,
        deliveryNote: {
          fileName: 'dn.pdf',
          contentType: 'application/pdf',
          sizeBytes: 2048,
          uploadedAt: '2025-06-02T08:01:00Z',
          url: '/x',
        },
      }),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/receipts/new' });
    await screen.findByRole('heading', { name: 'Receive a delivery' });

    await user.click(screen.getByRole('combobox', { name: 'Supplier' }));
    await user.click(await screen.findByRole('option', { name: 'Brackwater Resins' }));
    await fill(user, screen.getByLabelText('Delivery note number'), 'DN-881');
    await user.upload(
      screen.getByLabelText('Choose the delivery note'),
      new File(['%PDF-1.4'], 'dn.pdf', { type: 'application/pdf' }),
    );
    expect(await screen.findByText('dn.pdf')).toBeInTheDocument();

    const line = screen.getByRole('group', { name: 'Line 1' });
    await user.click(within(line).getByRole('combobox', { name: 'Material' }));
    await user.click(await screen.findByRole('option', { name: 'RES-25 Base resin' }));
    await fill(user, within(line).getByLabelText('Batch number'), 'B24-0917');
    await fill(user, within(line).getByLabelText('Packs taken in'), '4');
    await fill(user, within(line).getByLabelText('Packs refused (damaged)'), '1');
    await fill(user, within(line).getByLabelText('What was wrong'), 'Drum split');
    await user.click(within(line).getByRole('combobox', { name: 'Put away at' }));
    await user.click(await screen.findByRole('option', { name: 'Main store › Bay A' }));
    await user.click(screen.getByRole('button', { name: 'Check and book in' }));

    expect(await screen.findByRole('heading', { name: 'Check the delivery' })).toBeInTheDocument();
    expect(screen.getByText(/4 packs taken in, 1 refused as damaged/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Book it in' }));

    await waitFor(() => expect(currentLocation()).toBe('/receipts/rcpt-1'));
    expect(posted).toHaveLength(1);
    expect(posted[0]?.headers.get('Idempotency-Key')).toMatch(/.{8,}/);
    expect(posted[0]?.body).toEqual({
      supplierId: 's-1',
      deliveryNoteNumber: 'DN-881',
      receivedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
      lines: [
        {
          materialId: 'm-res',
          batchNumber: 'B24-0917',
          packsReceived: 4,
          packSize: '25',
          packsRefused: 1,
          refusedReason: 'Drum split',
          locationId: 'loc-bay',
        },
      ],
    });
    expect(sent).toHaveLength(1);
    expect(sent[0]?.url).toContain('/api/receipts/rcpt-1/delivery-note');
    expect((sent[0]?.body as FormData).get('file')).toBeInstanceOf(File);

    expect(await screen.findByRole('heading', { name: 'Receipt 12' })).toBeInTheDocument();
    expect(screen.getByText('Booked in')).toBeInTheDocument();
    expect(screen.getByText('Batch B24-0917 expires within 90 days')).toBeInTheDocument();
    expect(screen.getAllByRole('button', { name: 'Print labels' }).length).toBeGreaterThan(0);
    expect(screen.getByText('dn.pdf')).toBeInTheDocument();
  });

  it('refuses a delivery note of the wrong type before sending it', async () => {
    setUp();
    renderWithProviders(<AppRoutes />, { route: '/receipts/new' });
    const input = await screen.findByLabelText('Choose the delivery note');
    fireEvent.change(input, { target: { files: [new File(['hello'], 'note.txt', { type: 'text/plain' })] } });
    expect(
      await screen.findByText('note.txt is not a PDF, JPEG or PNG file.', { exact: false }),
    ).toBeInTheDocument();
  });

  it('refuses a delivery note over 10 MB before sending it', async () => {
    setUp();
    renderWithProviders(<AppRoutes />, { route: '/receipts/new' });
    const input = await screen.findByLabelText('Choose the delivery note');
    const big = new File(['%PDF-1.4'], 'scan.pdf', { type: 'application/pdf' });
    Object.defineProperty(big, 'size', { value: 11 * 1024 * 1024 });
    fireEvent.change(input, { target: { files: [big] } });
    expect(await screen.findByText('scan.pdf is 11.0 MB: the most is 10.0 MB.')).toBeInTheDocument();
  });
});
