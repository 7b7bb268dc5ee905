import { choosePacks, costFromStock, Decimal, priceEstimate } from '@potlife/domain';
import { Client } from 'pg';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';
import {
  addLocation,
  addLot,
  CatalogueIds,
  createBuildUp,
  createCustomer,
  createJob,
  dbClient,
  inDays,
  readyJob,
  seedTestCatalogue,
  SMALL_ROOF,
} from './jobs-fixtures';

/**
 * Estimates on stock cost: what the job could reserve for its date (the reservation's own rule:
 * available, not flagged, in date on the job date + margin, less what other jobs hold, FEFO) is
 * costed at the lots' unit cost, only the rest bought in packs at supplier prices.
 */
describe('estimates on stock cost', () => {
  let t: TestApp;
  let db: Client;
  let owner: Session;
  let estimator: Session;
  let cat: CatalogueIds;
  let customerId: string;
  let buildUpId: string;
  let store: string;
  const jobDay = 14;
  const lots = {} as Record<'old' | 'a' | 'flagged' | 'kerb', string>;
  let job: { id: string; reference: string; estimate: any };

  beforeAll(async () => {
    t = await createTestApp();
    db = await dbClient(t);
    owner = await registerCompany(t, 'Stock Cost Test Roofing');
    estimator = await addUser(t, owner, 'estimator');
    cat = await seedTestCatalogue(db, owner.user.companyId);
    customerId = await createCustomer(t, estimator);
    buildUpId = await createBuildUp(t, owner);
    store = await addLocation(db, owner.user.companyId);
    await t.http().patch('/api/settings/jobs').set(auth(owner)).send({ reservationMarginDays: 7 }).expect(200);
    const lot = (materialId: string, quantity: string, expiresIn: number | null, more: Record<string, unknown>) =>
      addLot(db, {
        companyId: owner.user.companyId,
        userId: owner.user.id,
        materialId,
        locationId: store,
        quantity,
        expiresOn: expiresIn === null ? null : inDays(expiresIn),
        ...more,
      });
    // Invented lots. R-OLD expires within the 7-day margin after the job date; R-F is flagged.
    lots.old = await lot(cat.resin, '50', jobDay + 3, { batch: 'R-OLD', unitCost: '1.00' });
    lots.a = await lot(cat.resin, '10', jobDay + 30, { batch: 'R-A', unitCost: '3.1234' });
    lots.flagged = await lot(cat.resin, '25', jobDay + 60, { batch: 'R-F', unitCost: '0.50', exposureFlagged: true });
    lots.kerb = await lot(cat.kerb, '2', null, { batch: 'K-1', unitCost: '11.40' });
    job = await readyJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(jobDay) });
    // Another job holds 4 kg of R-A: 6 kg are left for this one.
    const other = await readyJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(jobDay + 1) });
    await db.query(
      `INSERT INTO reservations (company_id, job_id, estimate_id, material_id, lot_id, quantity, job_date, use_by)
       VALUES ($1, $2, $3, $4, $5, '4', $6, $7)`,
      [owner.user.companyId, other.id, other.estimate.id, cat.resin, lots.a, inDays(jobDay + 1), inDays(jobDay + 8)],
    );
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const byMaterial = (body: any, id: string) => body.materials.find((m: any) => m.material?.id === id);

  it('costs the stock part at lot cost and buys only the rest, priced by priceEstimate', async () => {
    const supplier = job.estimate;
    expect(supplier.costBasis).toBe('supplier');
    expect(byMaterial(supplier, cat.kerb).packs.every((p: any) => p.source === 'supplier')).toBe(true);

    const res = await t
      .http()
      .post(`/api/jobs/${job.id}/estimates`)
      .set(auth(estimator))
      .send({ costBasis: 'stock' })
      .expect(201);
    const e = res.body;
    expect(e).toMatchObject({ version: 2, costBasis: 'stock' });

    // Kerb trim, hand-worked: SMALL_ROOF has kerb runs of 2.5, 3 and 2.5 m → 3 lengths of 3 m
    // (one each). Lot K-1 has 2 at £11.40 = £22.80; the third is bought at supplier A's £15.20.
    // Total £38.00.
    const kerb = byMaterial(e, cat.kerb);
    expect(kerb.quantity).toBe('3');
    expect(kerb.stockQuantity).toBe('2');
    expect(kerb.packs).toEqual([
      expect.objectContaining({ source: 'stock', size: '2', count: 1, cost: '22.80', supplier: null, lot: { id: lots.kerb, batchNumber: 'K-1', unitCost: '11.4' } }),
      expect.objectContaining({ source: 'supplier', size: '1', count: 1, packPrice: '15.20', cost: '15.20', lot: null }),
    ]);
    expect(kerb.cost).toBe('38.00');
    expect(kerb.packTotal).toBe('3');

    // Resin: R-OLD is out of date by the job date + 7 days, R-F is flagged, R-A offers 10 − 4 = 6 kg
    // at £3.1234: 6 × 3.1234 = 18.7404 → £18.74. The rest of the need, in packs of 25 and 5 kg at
    // the cheapest prices (B £87.25 a drum, A £21.40 a tin).
    const resin = byMaterial(e, cat.resin);
    const need = new Decimal(resin.quantity).toDecimalPlaces(3, Decimal.ROUND_UP);
    expect(resin.stockQuantity).toBe('6');
    const stockRow = resin.packs.find((p: any) => p.source === 'stock');
    expect(stockRow).toMatchObject({ size: '6', cost: '18.74', lot: { id: lots.a, batchNumber: 'R-A', unitCost: '3.1234' } });
    const rest = choosePacks(need.minus(6), ['25', '5']);
    const bought = resin.packs.filter((p: any) => p.source === 'supplier');
    expect(bought.map((p: any) => `${p.size}×${p.count}`)).toEqual(rest.packs.map((p) => `${p.size.toString()}×${p.count}`));
    const boughtCost = rest.packs.reduce((s, p) => s.plus(new Decimal(p.size.eq(25) ? '87.25' : '21.40').times(p.count)), new Decimal(0));
    expect(resin.cost).toBe(new Decimal('18.74').plus(boughtCost).toFixed(2));
    // The same split by the domain rule (no second implementation).
    const split = costFromStock(
      [
        { id: lots.old, quantity: '50', expiresOn: inDays(jobDay + 3), unitCost: '1', usable: true },
        { id: lots.a, quantity: '6', expiresOn: inDays(jobDay + 30), unitCost: '3.1234', usable: true },
        { id: lots.flagged, quantity: '25', expiresOn: inDays(jobDay + 60), unitCost: '0.5', usable: false },
      ],
      need,
      inDays(jobDay + 7),
      ['25', '5'],
    );
    expect(split.stockQuantity.toString()).toBe('6');
    expect(split.remainder.toString()).toBe(need.minus(6).toString());

    // Materials, markup and VAT from priceEstimate over the stock rows (quantity × lot cost) and the packs.
    const lines = e.materials
      .filter((m: any) => m.priced)
      .flatMap((m: any) =>
        m.packs.map((p: any) =>
          p.source === 'stock' ? { quantity: p.size, unitCost: p.lot.unitCost } : { quantity: p.count, unitCost: p.packPrice },
        ),
      );
    const price = priceEstimate(lines, e.labour.totalHours, e.labour.rate, e.price.markupPct, e.price.vatRatePct);
    expect(e.price).toMatchObject({
      materialCost: price.materialCost.toFixed(2),
      markup: price.markup.toFixed(2),
      vat: price.vat.toFixed(2),
      gross: price.gross.toFixed(2),
    });
    // Stock at lot cost is cheaper here than buying it all.
    expect(new Decimal(e.price.materialCost).lt(supplier.price.materialCost)).toBe(true);

    const read = await t.http().get(`/api/jobs/${job.id}/estimates/2`).set(auth(owner)).expect(200);
    expect(read.body.costBasis).toBe('stock');
    expect(byMaterial(read.body, cat.kerb).packs).toEqual(kerb.packs);
    const list = await t.http().get(`/api/jobs/${job.id}/estimates`).set(auth(estimator)).expect(200);
    expect(list.body.map((x: any) => [x.version, x.costBasis])).toEqual([
      [2, 'stock'],
      [1, 'supplier'],
    ]);
  });

  it('reserves what the stock estimate counted on; the job’s own holds stay offered to it', async () => {
    await t
      .http()
      .post(`/api/jobs/${job.id}/estimates/2/accept`)
      .set(auth(estimator))
      .expect(200);
    const r = await t.http().post(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
    const held = (materialId: string) =>
      r.body.materials
        .find((m: any) => m.material.id === materialId)
        .reservations.map((x: any) => `${x.lot.batchNumber}:${x.heldQuantity}`);
    expect(held(cat.resin)).toEqual(['R-A:6']);
    expect(held(cat.kerb)).toEqual(['K-1:2']);
    const again = await t
      .http()
      .post(`/api/jobs/${job.id}/estimates`)
      .set(auth(estimator))
      .send({ costBasis: 'stock' })
      .expect(201);
    expect(byMaterial(again.body, cat.resin).stockQuantity).toBe('6');
    expect(byMaterial(again.body, cat.kerb).stockQuantity).toBe('2');
    expect(again.body.price.materialCost).toBe((await t.http().get(`/api/jobs/${job.id}/estimates/2`).set(auth(estimator))).body.price.materialCost);
  });

  it('refuses stock cost without a scheduled date (409), and a cost basis it does not know (400)', async () => {
    const undated = await createJob(t, estimator, { customerId, buildUpId });
    await t.http().put(`/api/jobs/${undated.id}/roof`).set(auth(estimator)).send(SMALL_ROOF).expect(200);
    const refused = await t
      .http()
      .post(`/api/jobs/${undated.id}/estimates`)
      .set(auth(estimator))
      .send({ costBasis: 'stock' })
      .expect(409);
    expect(refused.body).toMatchObject({ code: 'job_needs_date' });
    expect(refused.body.message).toContain('scheduled date');
    const bad = await t
      .http()
      .post(`/api/jobs/${undated.id}/estimates`)
      .set(auth(estimator))
      .send({ costBasis: 'cheapest' })
      .expect(400);
    expect(bad.body.message).toContain('costBasis');
    // Supplier prices need no date.
    const ok = await t.http().post(`/api/jobs/${undated.id}/estimates`).set(auth(estimator)).send({}).expect(201);
    expect(ok.body.costBasis).toBe('supplier');
    expect(ok.body.materials.every((m: any) => m.stockQuantity === '0')).toBe(true);
  });
});
