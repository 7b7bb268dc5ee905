import { Client } from 'pg';
import { auth, Session, TestApp } from './app';

/**
 * Small factories for the jobs suites: a catalogue written straight into the tables (so these
 * suites do not depend on the catalogue routes), and jobs made through the API.
 */
export interface CatalogueIds {
  resin: string;
  mat: string;
  topcoat: string;
  catalyst: string;
  drip: string;
  kerb: string;
  wall: string;
  angle: string;
  externalCorner: string;
  internalCorner: string;
  outlet: string;
  bandage: string;
  acetone: string;
  adhesive: string;
  batten: string;
  nails: string;
  supplierA: string;
  supplierB: string;
}

type Mat = {
  code: string;
  name: string;
  kind: string;
  unit: string;
  packs: { size: string; label: string }[];
  gsm?: number;
  roll?: string;
  trim?: string;
  trimLength?: string;
  /** trims: length (the default), external-corner or internal-corner */
  piece?: string;
  colour?: string;
  litresPerKg?: string;
};

/** Invented materials of a GRP roofer, with two suppliers' prices (the angle trim has none). */
export async function seedTestCatalogue(c: Client, companyId: string): Promise<CatalogueIds> {
  const mats: Record<keyof Omit<CatalogueIds, 'supplierA' | 'supplierB'>, Mat> = {
    resin: {
      code: 'RES-STD',
      name: 'Deck base resin',
      kind: 'base-resin',
      unit: 'kg',
      packs: [
        { size: '25', label: '25 kg drum' },
        { size: '5', label: '5 kg tin' },
      ],
    },
    mat: {
      code: 'CSM-450',
      name: '450 g chopped strand mat',
      kind: 'mat',
      unit: 'kg',
      gsm: 450,
      roll: '1',
      packs: [{ size: '30', label: '30 kg roll' }],
    },
    topcoat: {
      code: 'TC-SLATE',
      name: 'Topcoat slate grey',
      kind: 'topcoat',
      unit: 'kg',
      colour: 'Slate grey',
      packs: [
        { size: '20', label: '20 kg tin' },
        { size: '5', label: '5 kg tin' },
      ],
    },
    catalyst: {
      code: 'CAT-1',
      name: 'Catalyst',
      kind: 'catalyst',
      unit: 'kg',
      packs: [
        { size: '1', label: '1 kg bottle' },
        { size: '5', label: '5 kg bottle' },
      ],
    },
    drip: {
      code: 'TR-DRIP',
      name: 'Drip trim 3 m',
      kind: 'trim',
      unit: 'each',
      trim: 'drip',
      trimLength: '3',
      packs: [{ size: '1', label: '3 m length' }],
    },
    kerb: {
      code: 'TR-KERB',
      name: 'Kerb trim 3 m',
      kind: 'trim',
      unit: 'each',
      trim: 'kerb',
      trimLength: '3',
      packs: [{ size: '1', label: '3 m length' }],
    },
    wall: {
      code: 'TR-WALL',
      name: 'Wall trim 3 m',
      kind: 'trim',
      unit: 'm',
      trim: 'wall',
      trimLength: '3',
      packs: [{ size: '3', label: '3 m length' }],
    },
    angle: {
      code: 'TR-ANGLE',
      name: 'Angle trim 3 m',
      kind: 'trim',
      unit: 'each',
      trim: 'angle',
      trimLength: '3',
      packs: [{ size: '1', label: '3 m length' }],
    },
    externalCorner: {
      code: 'TR-CNR-EXT',
      name: 'External corner piece',
      kind: 'trim',
      unit: 'each',
      piece: 'external-corner',
      packs: [{ size: '1', label: 'piece' }],
    },
    internalCorner: {
      code: 'TR-CNR-INT',
      name: 'Internal corner piece',
      kind: 'trim',
      unit: 'each',
      piece: 'internal-corner',
      packs: [{ size: '1', label: 'piece' }],
    },
    outlet: {
      code: 'OUT-110',
      name: 'Outlet piece 110 mm',
      kind: 'outlet',
      unit: 'each',
      packs: [{ size: '1', label: 'piece' }],
    },
    bandage: {
      code: 'BND-100',
      name: 'Bandage 100 mm',
      kind: 'bandage',
      unit: 'm',
      roll: '0.1',
      packs: [{ size: '50', label: '50 m roll' }],
    },
    acetone: {
      code: 'ACE-5',
      name: 'Acetone',
      kind: 'acetone',
      unit: 'L',
      packs: [{ size: '5', label: '5 L tin' }],
    },
    adhesive: {
      code: 'ADH-1',
      name: 'Trim adhesive',
      kind: 'adhesive',
      unit: 'each',
      packs: [{ size: '1', label: 'cartridge' }],
    },
    batten: {
      code: 'BAT-50',
      name: 'Batten 50 × 25',
      kind: 'batten',
      unit: 'm',
      packs: [{ size: '4.8', label: '4.8 m length' }],
    },
    nails: {
      code: 'NAIL-20',
      name: 'Clout nails 20 mm',
      kind: 'fixing',
      unit: 'each',
      packs: [{ size: '500', label: 'box of 500' }],
    },
  };
  const ids = {} as CatalogueIds;
  for (const [key, m] of Object.entries(mats) as [keyof typeof mats, Mat][]) {
    const { rows } = await c.query<{ id: string }>(
      `INSERT INTO materials (company_id, code, name, kind, stock_unit, pack_sizes, mat_gsm, roll_width_m, trim_kind, trim_length_m, topcoat_colour, litres_per_kg, trim_piece)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13) RETURNING id`,
      [
        companyId,
        m.code,
        m.name,
        m.kind,
        m.unit,
        JSON.stringify(m.packs),
        m.gsm ?? null,
        m.roll ?? null,
        m.trim ?? null,
        m.trimLength ?? null,
        m.colour ?? null,
        m.litresPerKg ?? null,
        m.kind === 'trim' ? (m.piece ?? 'length') : null,
      ],
    );
    ids[key] = rows[0]!.id;
  }
  const supplier = async (name: string, lead: number) =>
    (
      await c.query<{ id: string }>(
        `INSERT INTO suppliers (company_id, name, lead_time_days) VALUES ($1, $2, $3) RETURNING id`,
        [companyId, name, lead],
      )
    ).rows[0]!.id;
  ids.supplierA = await supplier('Fernbrook Composites (test)', 3);
  ids.supplierB = await supplier('Orrin Roofing Supply (test)', 5);
  const price = (supplierId: string, materialId: string, size: string, p: string, from = '2020-01-01') =>
    c.query(
      `INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from) VALUES ($1, $2, $3, $4, $5, $6)`,
      [companyId, supplierId, materialId, size, p, from],
    );
  // Invented prices. Resin: supplier B is cheaper per drum; A's older, dearer price is history.
  await price(ids.supplierA, ids.resin, '25', '96.00', '2019-01-01');
  await price(ids.supplierA, ids.resin, '25', '89.50');
  await price(ids.supplierB, ids.resin, '25', '87.25');
  await price(ids.supplierA, ids.resin, '5', '21.40');
  await price(ids.supplierA, ids.resin, '25', '70.00', '2999-01-01'); // not yet valid
  await price(ids.supplierA, ids.mat, '30', '118.00');
  await price(ids.supplierA, ids.topcoat, '20', '142.00');
  await price(ids.supplierA, ids.topcoat, '5', '39.90');
  await price(ids.supplierA, ids.catalyst, '1', '9.80');
  await price(ids.supplierA, ids.catalyst, '5', '41.00');
  await price(ids.supplierA, ids.drip, '1', '14.60');
  await price(ids.supplierA, ids.kerb, '1', '15.20');
  await price(ids.supplierA, ids.wall, '3', '13.90');
  await price(ids.supplierA, ids.externalCorner, '1', '6.50');
  await price(ids.supplierA, ids.internalCorner, '1', '6.50');
  await price(ids.supplierA, ids.outlet, '1', '24.00');
  await price(ids.supplierA, ids.bandage, '50', '31.00');
  await price(ids.supplierA, ids.acetone, '5', '17.50');
  await price(ids.supplierA, ids.adhesive, '1', '8.20');
  await price(ids.supplierB, ids.batten, '4.8', '4.10');
  await price(ids.supplierB, ids.nails, '500', '12.00');
  return ids;
}

export const STANDARD_BUILD_UP = {
  name: 'Standard deck, one layer 450 g',
  labourRate: '32.00',
  markupPct: '25',
  vatRatePct: '20',
};

/** An L-shaped roof: a polygon with a wall abutment on the inside corner, pipes and an outlet. */
export const L_ROOF = {
  areas: [
    {
      name: 'L roof',
      shape: 'polygon',
      points: [
        ['0', '0'],
        ['8', '0'],
        ['8', '3'],
        ['3', '3'],
        ['3', '6'],
        ['0', '6'],
      ],
      fall: { riseMm: '60', runM: '3' },
    },
  ],
  edges: [
    { kind: 'drip', lengthM: '8', areaIndex: 0, side: 0 },
    { kind: 'kerb', lengthM: '3', areaIndex: 0, side: 1 },
    { kind: 'wall', lengthM: '5', upstandM: '0.2', areaIndex: 0, side: 2 },
    { kind: 'wall', lengthM: '3', areaIndex: 0, side: 3 },
    { kind: 'kerb', lengthM: '3', areaIndex: 0, side: 4 },
    { kind: 'drip', lengthM: '6', areaIndex: 0, side: 5 },
  ],
  pipes: 2,
  outlets: 1,
  corners: { external: 3, internal: 1 },
};

export async function createCustomer(
  t: TestApp,
  s: Session,
  name = 'Harrow Lane Surgery (test)',
): Promise<string> {
  const res = await t
    .http()
    .post('/api/customers')
    .set(auth(s))
    .send({ name, billingAddress: '3 Harrow Lane, Hollowmere' })
    .expect(201);
  return res.body.id as string;
}

export async function createBuildUp(
  t: TestApp,
  owner: Session,
  body: Record<string, unknown> = STANDARD_BUILD_UP,
): Promise<string> {
  const res = await t.http().post('/api/build-ups').set(auth(owner)).send(body).expect(201);
  return res.body.id as string;
}

export async function createJob(
  t: TestApp,
  s: Session,
  over: Record<string, unknown>,
): Promise<{ id: string; reference: string }> {
  const res = await t
    .http()
    .post('/api/jobs')
    .set(auth(s))
    .send({
      siteAddress: '14 Wren Close, Hollowmere',
      substrate: 'timber-deck',
      topcoatColour: 'Slate grey',
      ...over,
    })
    .expect(201);
  return { id: res.body.id, reference: res.body.reference };
}

export async function dbClient(t: TestApp): Promise<Client> {
  const c = new Client({ connectionString: t.databaseUrl });
  await c.connect();
  return c;
}

/** A store location that may hold anything (the test materials carry no hazard class). */
export async function addLocation(c: Client, companyId: string, name = 'Main store'): Promise<string> {
  const { rows } = await c.query<{ id: string }>(
    `INSERT INTO locations (company_id, name, kind, allowed_hazard_classes) VALUES ($1, $2, 'store', '{none,3,5.2,8}') RETURNING id`,
    [companyId, name],
  );
  return rows[0]!.id;
}

/**
 * A lot received into a location as the ledger would have it: the lot, its receipt movement and
 * its cached balance, in one transaction.
 */
export async function addLot(
  c: Client,
  o: {
    companyId: string;
    userId: string;
    materialId: string;
    locationId: string;
    quantity: string;
    expiresOn: string | null;
    unitCost?: string;
    batch?: string;
    status?: 'available' | 'quarantined';
    exposureFlagged?: boolean;
  },
): Promise<string> {
  await c.query('BEGIN');
  try {
    const { rows } = await c.query<{ id: string }>(
      `INSERT INTO lots (company_id, material_id, batch_number, received_on, expires_on, location_id, status, unit_cost, quantity, exposure_flagged, exposure_reason)
       VALUES ($1, $2, $3, current_date - 10, $4, $5, $6, $7, $8, $9, $10) RETURNING id`,
      [
        o.companyId,
        o.materialId,
        o.batch ?? null,
        o.expiresOn,
        o.locationId,
        o.status ?? 'available',
        o.unitCost ?? '3.5',
        o.quantity,
        o.exposureFlagged ?? false,
        o.exposureFlagged ? 'test reading above range' : null,
      ],
    );
    const lotId = rows[0]!.id;
    await c.query(
      `INSERT INTO stock_movements (company_id, operation_id, kind, lot_id, material_id, location_id, to_location_id, quantity, unit_cost, user_id)
       VALUES ($1, gen_random_uuid(), 'receipt', $2, $3, $4, $4, $5, $6, $7)`,
      [o.companyId, lotId, o.materialId, o.locationId, o.quantity, o.unitCost ?? '3.5', o.userId],
    );
    await c.query(
      `INSERT INTO lot_balances (company_id, lot_id, location_id, quantity) VALUES ($1, $2, $3, $4)`,
      [o.companyId, lotId, o.locationId, o.quantity],
    );
    await c.query('COMMIT');
    return lotId;
  } catch (e) {
    await c.query('ROLLBACK');
    throw e;
  }
}

/** A date `days` from today, YYYY-MM-DD. */
export function inDays(days: number): string {
  const d = new Date();
  d.setDate(d.getDate() + days);
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/** A job with a roof, an accepted estimate (version 1) and a date, ready to reserve. */
export async function readyJob(
  t: TestApp,
  s: Session,
  o: {
    customerId: string;
    buildUpId: string;
    scheduledOn: string;
    roof?: Record<string, unknown>;
    status?: 'won' | 'scheduled';
  },
): Promise<{ id: string; reference: string; estimate: any }> {
  const job = await createJob(t, s, {
    customerId: o.customerId,
    buildUpId: o.buildUpId,
    scheduledOn: o.scheduledOn,
  });
  await t
    .http()
    .put(`/api/jobs/${job.id}/roof`)
    .set(auth(s))
    .send(o.roof ?? SMALL_ROOF)
    .expect(200);
  await t.http().post(`/api/jobs/${job.id}/estimates`).set(auth(s)).send({}).expect(201);
  const estimate = (await t.http().post(`/api/jobs/${job.id}/estimates/1/accept`).set(auth(s)).expect(200))
    .body;
  for (const status of ['quoted', 'won', 'scheduled'].slice(
    0,
    o.status === 'won' ? 2 : o.status === 'scheduled' ? 3 : 1,
  )) {
    await t.http().post(`/api/jobs/${job.id}/status`).set(auth(s)).send({ status }).expect(200);
  }
  return { ...job, estimate };
}

/** A small garage roof: 3 m × 2.5 m with drip and kerb edges. */
export const SMALL_ROOF = {
  areas: [{ name: 'Garage', shape: 'rectangle', lengthM: '3', widthM: '2.5' }],
  edges: [
    { kind: 'drip', lengthM: '3' },
    { kind: 'kerb', lengthM: '2.5' },
    { kind: 'kerb', lengthM: '3' },
    { kind: 'kerb', lengthM: '2.5' },
  ],
};
