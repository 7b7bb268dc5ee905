import { auth, createTestApp, registerCompany, Session, TestApp, uniqueEmail } from './app';

/**
 * Bad input on every body: missing, mistyped, overlong and unknown fields answer 400 naming the
 * field, never 500. Each body route lists a valid body and which fields are required.
 */
interface BodyRoute {
  method: 'post' | 'patch' | 'put';
  path: (s: Session) => string;
  valid: () => Record<string, unknown>;
  required: string[];
  token: boolean;
}

const BODY_ROUTES: Record<string, BodyRoute> = {
  'POST /api/auth/register': {
    method: 'post',
    path: () => '/api/auth/register',
    valid: () => ({ companyName: 'Valid Ltd', name: 'Val', email: uniqueEmail(), password: 'long-enough-pw' }),
    required: ['companyName', 'name', 'email', 'password'],
    token: false,
  },
  'POST /api/auth/login': {
    method: 'post',
    path: () => '/api/auth/login',
    valid: () => ({ email: uniqueEmail(), password: 'whatever-password' }),
    required: ['email', 'password'],
    token: false,
  },
  'POST /api/auth/invitations/{token}/accept': {
    method: 'post',
    path: () => '/api/auth/invitations/some-token/accept',
    valid: () => ({ password: 'long-enough-pw' }),
    required: ['password'],
    token: false,
  },
  'POST /api/users/invitations': {
    method: 'post',
    path: () => '/api/users/invitations',
    valid: () => ({ email: uniqueEmail(), name: 'New Person', role: 'storeman' }),
    required: ['email', 'name', 'role'],
    token: true,
  },
  'PATCH /api/users/{id}': {
    method: 'patch',
    path: (s) => `/api/users/${s.user.id}`,
    valid: () => ({ role: 'owner', active: true }),
    required: [],
    token: true,
  },
  // Catalogue and suppliers (ids are any UUID: the body is checked before the record is looked up).
  'POST /api/materials': {
    method: 'post',
    path: () => '/api/materials',
    valid: () => ({
      code: 'RES-25',
      name: 'Base resin',
      kind: 'base-resin',
      stockUnit: 'kg',
      packSizes: [{ size: '25', label: '25 kg drum' }],
      lotTracked: true,
      shelfLifeDays: 180,
      storageMinC: '5',
      storageMaxC: '25',
      hazardClass: '3',
      unNumber: '1866',
      packingGroup: 'III',
      reorderLevel: '100',
      notes: 'Keep off the floor',
    }),
    required: ['code', 'name', 'kind', 'stockUnit', 'packSizes'],
    token: true,
  },
  'PATCH /api/materials/{id}': {
    method: 'patch',
    path: () => '/api/materials/00000000-0000-4000-8000-000000000001',
    valid: () => ({ name: 'Base resin GP', reorderQuantity: '200', active: false }),
    required: [],
    token: true,
  },
  'POST /api/materials/import': {
    method: 'post',
    path: () => '/api/materials/import?mode=preview',
    valid: () => ({ csv: 'code,name,kind,stock_unit,pack_sizes\r\n' }),
    required: ['csv'],
    token: true,
  },
  'POST /api/suppliers': {
    method: 'post',
    path: () => '/api/suppliers',
    valid: () => ({ name: 'Valid Supplies', orderEmail: 'orders@valid.test', leadTimeDays: 2, contacts: [{ name: 'Val' }] }),
    required: ['name'],
    token: true,
  },
  'PATCH /api/suppliers/{id}': {
    method: 'patch',
    path: () => '/api/suppliers/00000000-0000-4000-8000-000000000001',
    valid: () => ({ leadTimeDays: 4, address: '1 Lane' }),
    required: [],
    token: true,
  },
  'POST /api/suppliers/{id}/contacts': {
    method: 'post',
    path: () => '/api/suppliers/00000000-0000-4000-8000-000000000001/contacts',
    valid: () => ({ name: 'Val', email: 'val@valid.test', role: 'Sales' }),
    required: ['name'],
    token: true,
  },
  'PATCH /api/suppliers/{id}/contacts/{contactId}': {
    method: 'patch',
    path: () => '/api/suppliers/00000000-0000-4000-8000-000000000001/contacts/00000000-0000-4000-8000-000000000002',
    valid: () => ({ phone: '01632 960 000' }),
    required: [],
    token: true,
  },
  'POST /api/suppliers/{id}/prices': {
    method: 'post',
    path: () => '/api/suppliers/00000000-0000-4000-8000-000000000001/prices',
    valid: () => ({ materialId: '00000000-0000-4000-8000-000000000003', packSize: '25', packPrice: '86.40', validFrom: '2025-04-01', supplierCode: 'X-1' }),
    required: ['materialId', 'packSize', 'packPrice', 'validFrom'],
    token: true,
  },
  'POST /api/suppliers/{id}/prices/import': {
    method: 'post',
    path: () => '/api/suppliers/00000000-0000-4000-8000-000000000001/prices/import?mode=preview',
    valid: () => ({ csv: 'material_code,pack_size,pack_price,valid_from\r\n', validFrom: '2025-04-01' }),
    required: ['csv'],
    token: true,
  },
  // stock (test/routes/stock.ts)
  'POST /api/locations': {
    method: 'post',
    path: () => '/api/locations',
    valid: () => ({ name: 'Valid cabinet', kind: 'flammables-cabinet', parentId: '00000000-0000-4000-8000-0000000000a1', capacityLitres: '50', allowedHazardClasses: ['3'], notes: 'by the door' }),
    required: ['name', 'kind'],
    token: true,
  },
  'PATCH /api/locations/{id}': {
    method: 'patch',
    path: () => `/api/locations/${'00000000-0000-4000-8000-0000000000a1'}`,
    valid: () => ({ name: 'Renamed', active: true, notes: 'n', allowedHazardClasses: ['none'] }),
    required: [],
    token: true,
  },
  ...Object.fromEntries(
    ['quarantine', 'release', 'clear-flag'].map((action) => [
      `POST /api/lots/{id}/${action}`,
      { method: 'post', path: () => `/api/lots/${'00000000-0000-4000-8000-0000000000a1'}/${action}`, valid: () => ({ note: 'why' }), required: ['note'], token: true } satisfies BodyRoute,
    ]),
  ),
  'POST /api/stock-movements': {
    method: 'post',
    path: () => '/api/stock-movements',
    valid: () => ({ kind: 'transfer', lotId: '00000000-0000-4000-8000-0000000000a1', fromLocationId: '00000000-0000-4000-8000-0000000000a1', toLocationId: '00000000-0000-4000-8000-0000000000a1', quantity: '2.5', note: 'n' }),
    required: ['kind', 'lotId', 'fromLocationId', 'toLocationId', 'quantity'],
    token: true,
  },
  'POST /api/stock-movements/{id}/reverse': {
    method: 'post',
    path: () => `/api/stock-movements/${'00000000-0000-4000-8000-0000000000a1'}/reverse`,
    valid: () => ({ note: 'booked twice' }),
    required: ['note'],
    token: true,
  },
  'POST /api/receipts': {
    method: 'post',
    path: () => '/api/receipts',
    valid: () => ({
      supplierName: 'Valid Supplies',
      deliveryNoteNumber: 'DN-1',
      receivedOn: '2025-06-02',
      note: 'n',
      allowOverDelivery: false,
      lines: [{ materialId: '00000000-0000-4000-8000-0000000000a1', locationId: '00000000-0000-4000-8000-0000000000a1', packsReceived: 2, packSize: '25', batchNumber: 'B1', unitCost: '3.2' }],
    }),
    required: ['receivedOn', 'lines'],
    token: true,
  },
  'POST /api/stock-counts': {
    method: 'post',
    path: () => '/api/stock-counts',
    valid: () => ({ locationId: '00000000-0000-4000-8000-0000000000a1', note: 'n' }),
    required: [],
    token: true,
  },
  'PATCH /api/stock-counts/{id}': {
    method: 'patch',
    path: () => `/api/stock-counts/${'00000000-0000-4000-8000-0000000000a1'}`,
    valid: () => ({ lines: [{ lotId: '00000000-0000-4000-8000-0000000000a1', locationId: '00000000-0000-4000-8000-0000000000a1', countedQuantity: '4' }] }),
    required: ['lines'],
    token: true,
  },
  'POST /api/stock-counts/{id}/submit': {
    method: 'post',
    path: () => `/api/stock-counts/${'00000000-0000-4000-8000-0000000000a1'}/submit`,
    valid: () => ({ lines: [{ lotId: '00000000-0000-4000-8000-0000000000a1', locationId: '00000000-0000-4000-8000-0000000000a1', countedQuantity: '4' }] }),
    required: [],
    token: true,
  },
  'POST /api/stock-counts/{id}/approve': {
    method: 'post',
    path: () => `/api/stock-counts/${'00000000-0000-4000-8000-0000000000a1'}/approve`,
    valid: () => ({ note: 'n' }),
    required: [],
    token: true,
  },
  'POST /api/stock-counts/{id}/reject': {
    method: 'post',
    path: () => `/api/stock-counts/${'00000000-0000-4000-8000-0000000000a1'}/reject`,
    valid: () => ({ action: 'reopen', note: 'recount' }),
    required: ['action', 'note'],
    token: true,
  },
  'POST /api/temperature-readings': {
    method: 'post',
    path: () => '/api/temperature-readings',
    valid: () => ({ locationId: '00000000-0000-4000-8000-0000000000a1', temperatureC: '18.5', takenAt: '2025-06-02T07:30:00Z', note: 'n' }),
    required: ['locationId', 'temperatureC', 'takenAt'],
    token: true,
  },
  'POST /api/temperature-readings/import': {
    method: 'post',
    path: () => '/api/temperature-readings/import',
    valid: () => ({ locationId: '00000000-0000-4000-8000-0000000000a1', csv: 'timestamp,temperature\n2025-06-01T06:00:00Z,17.8\n', dryRun: true }),
    required: ['locationId', 'csv'],
    token: true,
  },
  // Jobs: customers, build-ups, jobs, roofs, estimates, the laying check, issues and returns.
  'POST /api/customers': {
    method: 'post',
    path: () => '/api/customers',
    valid: () => ({ name: 'Valid Customer', contactName: 'C', email: 'c@example.test', phone: '01632 960 000', billingAddress: '1 Road', notes: 'n' }),
    required: ['name'],
    token: true,
  },
  'PATCH /api/customers/{id}': {
    method: 'patch',
    path: () => `/api/customers/${'00000000-0000-4000-8000-0000000000b1'}`,
    valid: () => ({ name: 'Renamed', phone: '01632 960 001' }),
    required: [],
    token: true,
  },
  'POST /api/build-ups': {
    method: 'post',
    path: () => '/api/build-ups',
    valid: () => ({ name: 'Valid build-up', labourRate: '32.00', markupPct: '25', vatRatePct: '20', layers: '2', catalystBands: [{ fromC: '5', percent: '3' }], battenMPerEdgeM: { drip: '2' } }),
    required: ['name', 'labourRate', 'markupPct'],
    token: true,
  },
  'PATCH /api/build-ups/{id}': {
    method: 'patch',
    path: () => `/api/build-ups/${'00000000-0000-4000-8000-0000000000b1'}`,
    valid: () => ({ markupPct: '30', active: false }),
    required: [],
    token: true,
  },
  'POST /api/jobs': {
    method: 'post',
    path: () => '/api/jobs',
    valid: () => ({ customerId: '00000000-0000-4000-8000-0000000000b1', siteAddress: '1 Road', substrate: 'osb', title: 'T', scheduledOn: '2026-05-18', crew: 'C', topcoatColour: 'Slate grey', notes: 'n' }),
    required: ['customerId', 'siteAddress', 'substrate'],
    token: true,
  },
  'PATCH /api/jobs/{id}': {
    method: 'patch',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}`,
    valid: () => ({ crew: 'C', scheduledOn: '2026-05-18', substrate: 'concrete' }),
    required: [],
    token: true,
  },
  'POST /api/jobs/{id}/status': {
    method: 'post',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/status`,
    valid: () => ({ status: 'quoted', reason: 'r' }),
    required: ['status'],
    token: true,
  },
  'PUT /api/jobs/{id}/roof': {
    method: 'put',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/roof`,
    valid: () => ({
      areas: [{ name: 'A', shape: 'rectangle', lengthM: '4', widthM: '3' }],
      edges: [{ kind: 'drip', lengthM: '4' }],
      pipes: 1,
      outlets: 1,
      corners: { external: 2 },
      notes: 'n',
    }),
    required: ['areas', 'edges'],
    token: true,
  },
  'PATCH /api/settings/jobs': {
    method: 'patch',
    path: () => '/api/settings/jobs',
    valid: () => ({ reservationMarginDays: 7, quoteValidityDays: 30 }),
    required: [],
    token: true,
  },
  'POST /api/jobs/{id}/estimates': {
    method: 'post',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/estimates`,
    valid: () => ({ buildUpId: '00000000-0000-4000-8000-0000000000b1', airC: '12', materials: [{ role: 'mat', materialId: '00000000-0000-4000-8000-0000000000b1' }], costBasis: 'stock', note: 'n' }),
    required: [],
    token: true,
  },
  'POST /api/laying-check': {
    method: 'post',
    path: () => '/api/laying-check',
    valid: () => ({ airC: '12', surfaceC: '10', relativeHumidityPct: '70', raining: false }),
    required: ['airC', 'surfaceC', 'relativeHumidityPct', 'raining'],
    token: true,
  },
  'POST /api/jobs/{id}/issues': {
    method: 'post',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/issues`,
    valid: () => ({ lines: [{ lotId: '00000000-0000-4000-8000-0000000000b1', quantity: '5' }], note: 'n' }),
    required: ['lines'],
    token: true,
  },
  'POST /api/jobs/{id}/returns': {
    method: 'post',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/returns`,
    valid: () => ({ lines: [{ lotId: '00000000-0000-4000-8000-0000000000b1', partQuantity: '1.5' }], note: 'n' }),
    required: ['lines'],
    token: true,
  },
  'POST /api/jobs/{id}/labour': {
    method: 'post',
    path: () => `/api/jobs/${'00000000-0000-4000-8000-0000000000b1'}/labour`,
    valid: () => ({ workedOn: '2026-05-18', hours: '7.5', crewMember: 'Jonah Pell', note: 'n' }),
    required: ['workedOn', 'hours', 'crewMember'],
    token: true,
  },
};

describe('bad input on every body', () => {
  let t: TestApp;
  let owner: Session;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_MAX_FAILURES: '1000' });
    owner = await registerCompany(t);
  });
  afterAll(() => t.close());

  const cases = Object.entries(BODY_ROUTES).flatMap(([name, r]) => {
    const fields = Object.keys(r.valid());
    return [
      ...r.required.map((f) => [name, `missing ${f}`, f, (b: Record<string, unknown>) => { delete b[f]; }] as const),
      ...fields.map((f) => [name, `mistyped ${f}`, f, (b: Record<string, unknown>) => { b[f] = { nested: [1, 2] }; }] as const),
      ...fields.map((f) => [name, `overlong ${f}`, f, (b: Record<string, unknown>) => { b[f] = 'x'.repeat(5000); }] as const),
      [name, 'unknown field', 'surprise', (b: Record<string, unknown>) => { b.surprise = 1; }] as const,
    ];
  });

  it.each(cases)('%s: %s answers 400 naming the field', async (name, _what, field, spoil) => {
    const r = BODY_ROUTES[name]!;
    const body = r.valid();
    spoil(body);
    let req = t.http()[r.method](r.path(owner));
    if (r.token) {
      req = req.set(auth(owner));
    }
    const res = await req.send(body);
    expect(res.status).toBe(400);
    expect(res.body.message).toContain(`${field}:`);
    expect(res.body.code).toBe('validation_failed');
  });

  it('a body that is not JSON answers 400', async () => {
    const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.statusCode).toBe(400);
  });

  it('a body over the size limit answers 413, not 500', async () => {
    const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send(JSON.stringify({ email: 'x'.repeat(9_000_000) }));
    expect(res.status).toBe(413);
  });
});
