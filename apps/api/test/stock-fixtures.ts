import { randomUUID } from 'node:crypto';
import { Client } from 'pg';
import { addUser, auth, registerCompany, Session, TestApp } from './app';

/** Shared set-up for the stock e2e suites: a company, its three roles, materials and locations. */

export async function sql<T = Record<string, unknown>>(t: TestApp, text: string, params: unknown[] = []): Promise<T[]> {
  const c = new Client({ connectionString: t.databaseUrl });
  await c.connect();
  try {
    return (await c.query(text, params)).rows as T[];
  } finally {
    await c.end();
  }
}

export interface MaterialSpec {
  code: string;
  name: string;
  kind: string;
  stockUnit: string;
  lotTracked?: boolean;
  shelfLifeDays?: number | null;
  storageMinC?: string | null;
  storageMaxC?: string | null;
  hazardClass?: string;
  unNumber?: string | null;
  isAccelerator?: boolean;
  litresPerKg?: string | null;
  reorderLevel?: string;
}

/** Materials are the catalogue's; the stock tests write them straight into the table. */
export async function insertMaterial(t: TestApp, companyId: string, m: MaterialSpec): Promise<string> {
  const [row] = await sql<{ id: string }>(
    t,
    `INSERT INTO materials (company_id, code, name, kind, stock_unit, lot_tracked, shelf_life_days, storage_min_c, storage_max_c, hazard_class,
                            un_number, is_accelerator, litres_per_kg, reorder_level)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14) RETURNING id`,
    [
      companyId,
      m.code,
      m.name,
      m.kind,
      m.stockUnit,
      m.lotTracked ?? true,
      m.shelfLifeDays ?? null,
      m.storageMinC ?? null,
      m.storageMaxC ?? null,
      m.hazardClass ?? 'none',
      m.unNumber ?? null,
      m.isAccelerator ?? false,
      m.litresPerKg ?? null,
      m.reorderLevel ?? '0',
    ],
  );
  return row!.id;
}

/** Invented materials for the tests: resin and topcoat class 3, catalyst 5.2, acetone class 3 in litres, mat none. */
export const MATERIALS = {
  resin: { code: 'T-RES', name: 'Test base resin', kind: 'base-resin', stockUnit: 'kg', shelfLifeDays: 90, storageMinC: '5', storageMaxC: '25', hazardClass: '3', unNumber: '1866', litresPerKg: '0.9' },
  catalyst: { code: 'T-CAT', name: 'Test catalyst', kind: 'catalyst', stockUnit: 'kg', shelfLifeDays: 180, storageMinC: '0', storageMaxC: '25', hazardClass: '5.2', unNumber: '3105' },
  acetone: { code: 'T-ACE', name: 'Test acetone', kind: 'acetone', stockUnit: 'L', shelfLifeDays: null, hazardClass: '3', unNumber: '1090' },
  mat: { code: 'T-MAT', name: 'Test mat 450', kind: 'mat', stockUnit: 'm2', lotTracked: false, shelfLifeDays: null },
} satisfies Record<string, MaterialSpec>;

export interface StockWorld {
  owner: Session;
  storeman: Session;
  estimator: Session;
  companyId: string;
  material: Record<keyof typeof MATERIALS, string>;
  location: { store: string; bayA: string; bayB: string; cabinet: string; peroxide: string; van: string };
}

export async function createLocation(t: TestApp, s: Session, body: Record<string, unknown>): Promise<string> {
  const res = await t.http().post('/api/locations').set(auth(s)).send(body);
  if (res.status !== 201) {
    throw new Error(`location: ${res.status} ${JSON.stringify(res.body)}`);
  }
  return res.body.id as string;
}

export async function stockWorld(t: TestApp, name = 'Stock Test Roofing'): Promise<StockWorld> {
  const owner = await registerCompany(t, name);
  const storeman = await addUser(t, owner, 'storeman');
  const estimator = await addUser(t, owner, 'estimator');
  const companyId = owner.user.companyId;
  const material = {} as StockWorld['material'];
  for (const [k, spec] of Object.entries(MATERIALS)) {
    material[k as keyof typeof MATERIALS] = await insertMaterial(t, companyId, spec);
  }
  const store = await createLocation(t, owner, { name: 'Main store', kind: 'store' });
  const location = {
    store,
    bayA: await createLocation(t, owner, { name: 'Bay A', kind: 'bay', parentId: store }),
    bayB: await createLocation(t, owner, { name: 'Bay B', kind: 'bay', parentId: store }),
    cabinet: await createLocation(t, owner, { name: 'Flammables cabinet', kind: 'flammables-cabinet', parentId: store, capacityLitres: '50' }),
    peroxide: await createLocation(t, owner, { name: 'Peroxide store', kind: 'peroxide-store' }),
    van: await createLocation(t, owner, { name: 'Van 1', kind: 'van' }),
  };
  return { owner, storeman, estimator, companyId, material, location };
}

export interface LineSpec {
  materialId: string;
  locationId: string;
  packs: number;
  packSize: string;
  batch?: string;
  unitCost?: string;
  expiresOn?: string;
  packsRefused?: number;
}

export const receiptBody = (lines: LineSpec[], receivedOn = new Date().toISOString().slice(0, 10)) => ({
  supplierName: 'Fenwick Test Supplies',
  deliveryNoteNumber: `DN-${randomUUID().slice(0, 6)}`,
  receivedOn,
  lines: lines.map((l) => ({
    materialId: l.materialId,
    locationId: l.locationId,
    packsReceived: l.packs,
    packSize: l.packSize,
    batchNumber: l.batch ?? `B-${randomUUID().slice(0, 6)}`,
    unitCost: l.unitCost ?? '2.5',
    ...(l.expiresOn ? { expiresOn: l.expiresOn } : {}),
    ...(l.packsRefused ? { packsRefused: l.packsRefused } : {}),
  })),
});

/** Receives one delivery; answers the receipt. */
export async function receive(t: TestApp, s: Session, lines: LineSpec[], receivedOn?: string): Promise<{ id: string; lines: { lotId: string }[]; warnings: string[] }> {
  const res = await t.http().post('/api/receipts').set(auth(s)).send(receiptBody(lines, receivedOn));
  if (res.status !== 201) {
    throw new Error(`receipt: ${res.status} ${JSON.stringify(res.body)}`);
  }
  return res.body;
}

/** The ledger's own sums for a lot: per location and in all, straight from stock_movements. */
export async function ledgerSums(t: TestApp, lotId: string): Promise<{ total: string; byLocation: Record<string, string> }> {
  const rows = await sql<{ location_id: string; q: string }>(
    t,
    `SELECT location_id, sum(quantity)::numeric(14,3)::text AS q FROM stock_movements WHERE lot_id = $1 GROUP BY location_id HAVING sum(quantity) <> 0`,
    [lotId],
  );
  const [all] = await sql<{ q: string }>(t, `SELECT coalesce(sum(quantity), 0)::numeric(14,3)::text AS q FROM stock_movements WHERE lot_id = $1`, [lotId]);
  return { total: all!.q, byLocation: Object.fromEntries(rows.map((r) => [r.location_id, r.q])) };
}

export async function cachedBalances(t: TestApp, lotId: string): Promise<{ total: string; byLocation: Record<string, string> }> {
  const [lot] = await sql<{ quantity: string }>(t, `SELECT quantity::text FROM lots WHERE id = $1`, [lotId]);
  const rows = await sql<{ location_id: string; quantity: string }>(t, `SELECT location_id, quantity::text FROM lot_balances WHERE lot_id = $1 AND quantity <> 0`, [
    lotId,
  ]);
  return { total: lot!.quantity, byLocation: Object.fromEntries(rows.map((r) => [r.location_id, r.quantity])) };
}

export const key = () => randomUUID();

/**
 * A job to issue to. The ledger's job_id points at the jobs module's table once it exists; this
 * writes the least row it needs (the jobs module owns that table), or answers a bare id before.
 */
export async function insertJob(t: TestApp, companyId: string): Promise<string> {
  const [has] = await sql<{ jobs: string | null }>(t, `SELECT to_regclass('jobs')::text AS jobs`);
  if (!has?.jobs) {
    return randomUUID();
  }
  const [customer] = await sql<{ id: string }>(t, `INSERT INTO customers (company_id, name) VALUES ($1, 'Test customer') RETURNING id`, [companyId]);
  const [job] = await sql<{ id: string }>(
    t,
    `INSERT INTO jobs (company_id, number, customer_id, title, site_address, substrate)
     VALUES ($1, (SELECT coalesce(max(number), 0) + 1 FROM jobs WHERE company_id = $1), $2, 'Test job', '1 Test Row, Hollowmere', 'timber-deck') RETURNING id`,
    [companyId, customer!.id],
  );
  return job!.id;
}
