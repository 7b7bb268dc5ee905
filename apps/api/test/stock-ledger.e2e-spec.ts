import { Decimal, ledgerBalance, MovementKind } from '@potlife/domain';
import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import { DataSource } from 'typeorm';
import { HttpException } from '@nestjs/common';
import { IdempotencyService } from '../src/stock/idempotency.service';
import { StockService } from '../src/stock/stock.service';
import { auth, createTestApp, TestApp } from './app';
import { cachedBalances, insertJob, key, ledgerSums, receive, sql, stockWorld, StockWorld } from './stock-fixtures';

/**
 * The ledger's invariants: a balance is the sum of its movements and never below zero, refused
 * movements change nothing, concurrent requests on one lot add up exactly, retries with the same
 * Idempotency-Key count once, and the ledger itself cannot be edited.
 */
describe('stock ledger', () => {
  let t: TestApp;
  let w: StockWorld;
  let stock: StockService;
  let db: DataSource;

  beforeAll(async () => {
    t = await createTestApp();
    w = await stockWorld(t);
    stock = t.app.get(StockService);
    db = t.app.get(DataSource);
  });
  afterAll(() => t.close());

  const move = (body: Record<string, unknown>, k?: string) => {
    const req = t.http().post('/api/stock-movements').set(auth(w.storeman));
    return (k ? req.set('Idempotency-Key', k) : req).send(body);
  };

  /** Checks every lot: cached balances equal the sums of movements, and the domain's ledgerBalance accepts each location's movements in order. */
  async function checkLedger(lotIds: string[]): Promise<void> {
    for (const lotId of lotIds) {
      expect(await cachedBalances(t, lotId)).toEqual(await ledgerSums(t, lotId));
      const rows = await sql<{ location_id: string; kind: MovementKind; quantity: string }>(
        t,
        `SELECT location_id, kind, quantity::text FROM stock_movements WHERE lot_id = $1 ORDER BY created_at, id`,
        [lotId],
      );
      const byLoc = new Map<string, { kind: MovementKind; quantity: string }[]>();
      for (const r of rows) {
        byLoc.set(r.location_id, [...(byLoc.get(r.location_id) ?? []), { kind: r.kind, quantity: r.quantity }]);
      }
      for (const [loc, ms] of byLoc) {
        const cached = (await cachedBalances(t, lotId)).byLocation[loc] ?? '0';
        expect(ledgerBalance(ms).eq(cached)).toBe(true);
      }
    }
  }

  it('a receipt, a transfer, a write-off and an adjustment: balances are the sums of their movements', async () => {
    const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 2, packSize: '30', unitCost: '1.85' }]);
    const lotId = r.lines[0]!.lotId;
    const tr = await move({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.van, quantity: '12.5', note: 'for the Ashby job' }).expect(201);
    expect(tr.body.movements.map((m: { quantity: string; locationId: string }) => [m.locationId, m.quantity])).toEqual([
      [w.location.bayA, '-12.500'],
      [w.location.van, '12.500'],
    ]);
    expect(tr.body.movements[0].operationId).toBe(tr.body.movements[1].operationId);
    expect(tr.body.lot.places).toEqual([
      { locationId: w.location.bayA, locationName: 'Bay A', quantity: '47.500' },
      { locationId: w.location.van, locationName: 'Van 1', quantity: '12.500' },
    ]);
    await move({ kind: 'write-off', lotId, locationId: w.location.van, quantity: '2.5', reason: 'damaged', note: 'wet in the van' }).expect(201);
    const adj = await move({ kind: 'adjustment', lotId, locationId: w.location.bayA, quantity: '-0.5', reason: 'offcut miscounted' }).expect(201);
    expect(adj.body.lot.quantity).toBe('57.000');
    // value at the lot's unit cost, to the penny: 57 × 1.85 = 105.45 (arithmetic)
    expect(adj.body.lot.value).toBe('105.45');
    await checkLedger([lotId]);

    const list = await t.http().get(`/api/stock-movements?lotId=${lotId}`).set(auth(w.estimator)).expect(200);
    expect(list.body.total).toBe(5);
    expect(list.body.items.map((m: { kind: string }) => m.kind).sort()).toEqual(['adjustment', 'receipt', 'transfer', 'transfer', 'write-off']);
    expect(list.body.items.find((m: { kind: string }) => m.kind === 'receipt').receiptId).toBe(r.id);
  });

  it('refuses to take a lot below nothing, and the refusal changes nothing', async () => {
    const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
    const lotId = r.lines[0]!.lotId;
    const before = await cachedBalances(t, lotId);
    const res = await move({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '10.001' }).expect(409);
    expect(res.body).toMatchObject({ code: 'negative_balance' });
    expect(res.body.message).toMatch(/has 10 m² at Bay A/);
    await move({ kind: 'write-off', lotId, locationId: w.location.bayB, quantity: '1', reason: 'expired' }).expect(409);
    await move({ kind: 'adjustment', lotId, locationId: w.location.bayA, quantity: '-11', reason: 'x' }).expect(409);
    expect(await cachedBalances(t, lotId)).toEqual(before);
    expect((await ledgerSums(t, lotId)).total).toBe('10.000');
  });

  it('answers 400 naming the field for a wrong sign, a zero, or a write-off without one of its reasons', async () => {
    const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
    const lotId = r.lines[0]!.lotId;
    expect((await move({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '-1' }).expect(400)).body.message).toMatch(/^quantity:/);
    expect((await move({ kind: 'adjustment', lotId, locationId: w.location.bayA, quantity: '0', reason: 'x' }).expect(400)).body.message).toMatch(/quantity: must not be zero/);
    expect((await move({ kind: 'write-off', lotId, locationId: w.location.bayA, quantity: '1', reason: 'lost' }).expect(400)).body.message).toMatch(/reason: a write-off is for one of expired, damaged, temperature/);
    expect((await move({ kind: 'transfer', lotId, toLocationId: w.location.bayB, quantity: '1' }).expect(400)).body.message).toMatch(/fromLocationId/);
    expect((await move({ kind: 'issue', lotId, quantity: '1' }).expect(400)).body.message).toMatch(/kind: must be one of transfer, adjustment, write-off/);
    await move({ kind: 'transfer', lotId: randomUUID(), fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '1' }).expect(404);
  });

  it('writing a lot off to nothing marks it written off', async () => {
    const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '4' }]);
    const lotId = r.lines[0]!.lotId;
    const res = await move({ kind: 'write-off', lotId, locationId: w.location.bayA, quantity: '4', reason: 'damaged' }).expect(201);
    expect(res.body.lot).toMatchObject({ status: 'written-off', quantity: '0.000', usable: false });
    const detail = await t.http().get(`/api/lots/${lotId}`).set(auth(w.estimator)).expect(200);
    expect(detail.body.events.map((e: { kind: string }) => e.kind)).toEqual(['written-off']);
  });

  describe('reversal', () => {
    it('reverses a transfer with both legs, once; a reversal cannot itself be reversed', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '20' }]);
      const lotId = r.lines[0]!.lotId;
      const tr = await move({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.van, quantity: '20' }).expect(201);
      expect(tr.body.lot.locationId).toBe(w.location.van); // the whole lot moved, so its location follows it
      const leg = tr.body.movements[1].id as string;
      const rev = await t.http().post(`/api/stock-movements/${leg}/reverse`).set(auth(w.storeman)).send({ note: 'went to the wrong van' }).expect(201);
      expect(rev.body.movements).toHaveLength(2);
      expect(rev.body.movements.map((m: { reversesMovementId: string }) => m.reversesMovementId).sort()).toEqual(tr.body.movements.map((m: { id: string }) => m.id).sort());
      expect(rev.body.lot.places).toEqual([{ locationId: w.location.bayA, locationName: 'Bay A', quantity: '20.000' }]);
      expect(rev.body.lot.locationId).toBe(w.location.bayA);
      const again = await t.http().post(`/api/stock-movements/${tr.body.movements[0].id}/reverse`).set(auth(w.storeman)).send({ note: 'again' }).expect(409);
      expect(again.body.code).toBe('already_reversed');
      const ofReversal = await t.http().post(`/api/stock-movements/${rev.body.movements[0].id}/reverse`).set(auth(w.storeman)).send({ note: 'undo' }).expect(409);
      expect(ofReversal.body.code).toBe('already_reversal');
      const listed = await t.http().get(`/api/stock-movements?lotId=${lotId}&kind=transfer`).set(auth(w.storeman)).expect(200);
      expect(listed.body.items.filter((m: { reversedByMovementId: string | null }) => m.reversedByMovementId)).toHaveLength(2);
      await checkLedger([lotId]);
    });

    it('refuses to reverse a receipt whose stock has gone, and reverses it while it is there', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '8' }]);
      const lotId = r.lines[0]!.lotId;
      const [receipt] = await sql<{ id: string }>(t, `SELECT id FROM stock_movements WHERE lot_id = $1 AND kind = 'receipt'`, [lotId]);
      await move({ kind: 'write-off', lotId, locationId: w.location.bayA, quantity: '3', reason: 'damaged' }).expect(201);
      const refused = await t.http().post(`/api/stock-movements/${receipt!.id}/reverse`).set(auth(w.storeman)).send({ note: 'booked twice' }).expect(409);
      expect(refused.body.code).toBe('negative_balance');
      const wo = await sql<{ id: string }>(t, `SELECT id FROM stock_movements WHERE lot_id = $1 AND kind = 'write-off'`, [lotId]);
      await t.http().post(`/api/stock-movements/${wo[0]!.id}/reverse`).set(auth(w.storeman)).send({ note: 'it was fine' }).expect(201);
      const ok = await t.http().post(`/api/stock-movements/${receipt!.id}/reverse`).set(auth(w.storeman)).send({ note: 'booked twice' }).expect(201);
      expect(ok.body.movements[0]).toMatchObject({ kind: 'adjustment', quantity: '-8.000', reason: 'reversal of receipt', reversesMovementId: receipt!.id });
      expect(ok.body.lot.quantity).toBe('0.000');
      await checkLedger([lotId]);
    });

    it('answers 404 for a movement of another company', async () => {
      const other = await stockWorld(t, 'Other Roofing');
      const r = await receive(t, other.storeman, [{ materialId: other.material.mat, locationId: other.location.bayA, packs: 1, packSize: '8' }]);
      const [m] = await sql<{ id: string }>(t, `SELECT id FROM stock_movements WHERE lot_id = $1`, [r.lines[0]!.lotId]);
      await t.http().post(`/api/stock-movements/${m!.id}/reverse`).set(auth(w.storeman)).send({ note: 'x' }).expect(404);
      await t.http().get(`/api/lots/${r.lines[0]!.lotId}`).set(auth(w.storeman)).expect(404);
      const mine = await t.http().get('/api/stock-movements').set(auth(w.storeman)).expect(200);
      expect(JSON.stringify(mine.body)).not.toContain(r.lines[0]!.lotId);
    });
  });

  describe('the database guards the ledger', () => {
    it('refuses UPDATE, DELETE and TRUNCATE of stock_movements', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '5' }]);
      const lotId = r.lines[0]!.lotId;
      await expect(sql(t, `UPDATE stock_movements SET quantity = 50 WHERE lot_id = $1`, [lotId])).rejects.toThrow(/append-only: UPDATE refused/);
      await expect(sql(t, `DELETE FROM stock_movements WHERE lot_id = $1`, [lotId])).rejects.toThrow(/append-only: DELETE refused/);
      await expect(sql(t, `TRUNCATE stock_movements CASCADE`)).rejects.toThrow(/append-only: TRUNCATE refused/);
      expect((await ledgerSums(t, lotId)).total).toBe('5.000');
    });

    it('refuses a negative cached balance', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '5' }]);
      await expect(sql(t, `UPDATE lot_balances SET quantity = -1 WHERE lot_id = $1`, [r.lines[0]!.lotId])).rejects.toThrow(/check constraint/);
      await expect(sql(t, `UPDATE lots SET quantity = -1 WHERE id = $1`, [r.lines[0]!.lotId])).rejects.toThrow(/check constraint/);
    });
  });

  describe('issues and returns for jobs (StockService)', () => {
    const inTx = <T>(fn: (m: import('typeorm').EntityManager) => Promise<T>) => db.transaction(fn);
    const status = async (p: Promise<unknown>) => {
      try {
        await p;
        return 200;
      } catch (e) {
        if (e instanceof HttpException) {
          return e.getStatus();
        }
        throw e;
      }
    };

    it('issues from a location to a job and takes back no more than the job has out', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 2, packSize: '30' }]);
      const lotId = r.lines[0]!.lotId;
      const jobId = await insertJob(t, w.companyId);
      const actor = { id: w.storeman.user.id };
      const issued = await inTx(async (m) => {
        await stock.lockForMovements(m, w.companyId, { lotIds: [lotId], locationIds: [w.location.bayA] });
        return stock.issueToJob(m, w.companyId, actor, { lotId, quantity: '25', jobId, fromLocationId: w.location.bayA });
      });
      expect(issued.movements[0]).toMatchObject({ kind: 'issue', quantity: '-25.000', jobId });
      expect(issued.lot.quantity).toBe('35.000');
      expect(await status(inTx((m) => stock.returnFromJob(m, w.companyId, actor, { lotId, quantity: '25.5', jobId, toLocationId: w.location.bayB })))).toBe(409);
      const back = await inTx((m) => stock.returnFromJob(m, w.companyId, actor, { lotId, quantity: '4.5', jobId, toLocationId: w.location.bayB }));
      expect(back.movements[0]).toMatchObject({ kind: 'return', quantity: '4.500', locationId: w.location.bayB });
      expect(await status(inTx((m) => stock.issueToJob(m, w.companyId, actor, { lotId, quantity: '36', jobId, fromLocationId: w.location.bayA })))).toBe(409);
      const locked = await inTx((m) => stock.lockLotsForMaterial(m, w.companyId, w.material.mat));
      const mine = locked.find((l) => l.id === lotId)!;
      expect(mine).toMatchObject({ quantity: '39.500', usable: true, fefoExpiresOn: '9999-12-31' });
      expect(mine.places.map((p) => p.quantity).sort()).toEqual(['35.000', '4.500']);
      const [bal] = await stock.lotBalances(null, w.companyId, [lotId]);
      expect(bal!.quantity).toBe('39.500');
      await checkLedger([lotId]);
    });

    it('refuses to issue a quarantined, flagged or expired lot, saying why', async () => {
      const past = new Date(Date.now() - 100 * 86_400_000).toISOString().slice(0, 10);
      const r = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20' }], past);
      const lotId = r.lines[0]!.lotId;
      const actor = { id: w.storeman.user.id };
      const jobId = await insertJob(t, w.companyId);
      const attempt = () => inTx((m) => stock.issueToJob(m, w.companyId, actor, { lotId, quantity: '1', jobId, fromLocationId: w.location.bayA }));
      // received 100 days ago with a 90-day shelf life: expired (domain expiryDate)
      await expect(attempt()).rejects.toThrow(/expired on .*write it off/);
      await sql(t, `UPDATE lots SET expires_on = current_date + 30, exposure_flagged = true WHERE id = $1`, [lotId]);
      await expect(attempt()).rejects.toThrow(/check before use/);
      await sql(t, `UPDATE lots SET status = 'quarantined' WHERE id = $1`, [lotId]);
      await expect(attempt()).rejects.toThrow(/quarantined: release it/);
    });
  });

  describe('property: random sequences keep the ledger exact', () => {
    type Op =
      | { k: 'receive'; packs: number }
      | { k: 'transfer'; lot: number; from: number; to: number; q: number }
      | { k: 'issue'; lot: number; from: number; q: number }
      | { k: 'return'; lot: number; to: number; q: number }
      | { k: 'adjust'; lot: number; at: number; q: number }
      | { k: 'write-off'; lot: number; at: number; q: number };

    const thousandths = fc.integer({ min: 1, max: 15_000 });
    const place = fc.integer({ min: 0, max: 2 });
    const which = fc.nat({ max: 10 });
    const op: fc.Arbitrary<Op> = fc.oneof(
      fc.record({ k: fc.constant('receive' as const), packs: fc.integer({ min: 1, max: 3 }) }),
      fc.record({ k: fc.constant('transfer' as const), lot: which, from: place, to: place, q: thousandths }).filter((o) => o.from !== o.to),
      fc.record({ k: fc.constant('issue' as const), lot: which, from: place, q: thousandths }),
      fc.record({ k: fc.constant('return' as const), lot: which, to: place, q: thousandths }),
      fc.record({ k: fc.constant('adjust' as const), lot: which, at: place, q: fc.integer({ min: -15_000, max: 15_000 }).filter((q) => q !== 0) }),
      fc.record({ k: fc.constant('write-off' as const), lot: which, at: place, q: thousandths }),
    );
    const asQty = (thou: number) => new Decimal(thou).div(1000);

    it('balance equals the sum of movements, never goes below zero, and refused moves change nothing', async () => {
      const places = [w.location.bayA, w.location.bayB, w.location.van];
      const actor = { id: w.storeman.user.id };
      await fc.assert(
        fc.asyncProperty(fc.array(op, { minLength: 3, maxLength: 14 }), async (ops) => {
          const jobId = await insertJob(t, w.companyId);
          const first = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: places[0]!, packs: 1, packSize: '10' }]);
          const lots: string[] = [first.lines[0]!.lotId];
          // the model: balance per lot and location, and what the job has out of each lot
          const model = new Map<string, Decimal>([[`${lots[0]}:${places[0]}`, new Decimal(10)]]);
          const out = new Map<string, Decimal>();
          const get = (lot: string, loc: string) => model.get(`${lot}:${loc}`) ?? new Decimal(0);
          for (const o of ops) {
            if (o.k === 'receive') {
              const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: places[1]!, packs: o.packs, packSize: '2.5' }]);
              lots.push(r.lines[0]!.lotId);
              model.set(`${r.lines[0]!.lotId}:${places[1]}`, new Decimal(o.packs).times('2.5'));
              continue;
            }
            const lot = lots[o.lot % lots.length]!;
            const before = await cachedBalances(t, lot);
            let expectOk: boolean;
            let res: { status: number };
            switch (o.k) {
              case 'transfer': {
                const q = asQty(o.q);
                expectOk = get(lot, places[o.from]!).gte(q);
                res = await move({ kind: 'transfer', lotId: lot, fromLocationId: places[o.from], toLocationId: places[o.to], quantity: q.toString() });
                if (expectOk) {
                  model.set(`${lot}:${places[o.from]}`, get(lot, places[o.from]!).minus(q));
                  model.set(`${lot}:${places[o.to]}`, get(lot, places[o.to]!).plus(q));
                }
                break;
              }
              case 'adjust': {
                const q = asQty(o.q);
                expectOk = get(lot, places[o.at]!).plus(q).gte(0);
                res = await move({ kind: 'adjustment', lotId: lot, locationId: places[o.at], quantity: q.toString(), reason: 'property test' });
                if (expectOk) {
                  model.set(`${lot}:${places[o.at]}`, get(lot, places[o.at]!).plus(q));
                }
                break;
              }
              case 'write-off': {
                const q = asQty(o.q);
                expectOk = get(lot, places[o.at]!).gte(q);
                res = await move({ kind: 'write-off', lotId: lot, locationId: places[o.at], quantity: q.toString(), reason: 'damaged' });
                if (expectOk) {
                  model.set(`${lot}:${places[o.at]}`, get(lot, places[o.at]!).minus(q));
                }
                break;
              }
              case 'issue': {
                const q = asQty(o.q);
                const [row] = await sql<{ status: string }>(t, `SELECT status FROM lots WHERE id = $1`, [lot]);
                expectOk = get(lot, places[o.from]!).gte(q) && row!.status === 'available';
                res = {
                  status: await db
                    .transaction((m) => stock.issueToJob(m, w.companyId, actor, { lotId: lot, quantity: q.toString(), jobId, fromLocationId: places[o.from]! }))
                    .then(() => 201)
                    .catch((e: unknown) => (e instanceof HttpException ? e.getStatus() : 500)),
                };
                if (expectOk) {
                  model.set(`${lot}:${places[o.from]}`, get(lot, places[o.from]!).minus(q));
                  out.set(lot, (out.get(lot) ?? new Decimal(0)).plus(q));
                }
                break;
              }
              case 'return': {
                const q = asQty(o.q);
                expectOk = (out.get(lot) ?? new Decimal(0)).gte(q);
                res = {
                  status: await db
                    .transaction((m) => stock.returnFromJob(m, w.companyId, actor, { lotId: lot, quantity: q.toString(), jobId, toLocationId: places[o.to]! }))
                    .then(() => 201)
                    .catch((e: unknown) => (e instanceof HttpException ? e.getStatus() : 500)),
                };
                if (expectOk) {
                  model.set(`${lot}:${places[o.to]}`, get(lot, places[o.to]!).plus(q));
                  out.set(lot, out.get(lot)!.minus(q));
                }
                break;
              }
            }
            if (expectOk) {
              expect(res.status).toBe(201);
            } else {
              expect(res.status).toBe(409);
              expect(await cachedBalances(t, lot)).toEqual(before);
            }
          }
          for (const lot of lots) {
            const cached = await cachedBalances(t, lot);
            const expected = Object.fromEntries(
              places.filter((p) => !get(lot, p).isZero()).map((p) => [p, get(lot, p).toFixed(3)]),
            );
            expect(cached.byLocation).toEqual(expected);
            for (const q of Object.values(cached.byLocation)) {
              expect(new Decimal(q).gte(0)).toBe(true);
            }
          }
          await checkLedger(lots);
        }),
        { numRuns: 12, seed: 4242, endOnFailure: true },
      );
    });
  });

  describe('concurrency', () => {
    it('20 receipts at once each get their own number and lot; 40 transfers back and forth on one lot add up exactly', async () => {
      const receipts = await Promise.all(
        Array.from({ length: 20 }, () => receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '1.5' }])),
      );
      const numbers = await sql<{ number: number }>(t, `SELECT number FROM receipts WHERE id = ANY($1)`, [receipts.map((r) => r.id)]);
      expect(new Set(numbers.map((n) => n.number)).size).toBe(20);

      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 4, packSize: '25' }]);
      const lotId = r.lines[0]!.lotId;
      const results = await Promise.all(
        Array.from({ length: 40 }, (_, i) =>
          move(
            i % 2 === 0
              ? { kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '2.125' }
              : { kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.van, quantity: '0.875' },
          ),
        ),
      );
      expect(results.map((x) => x.status)).toEqual(Array(40).fill(201));
      // 20 × 2.125 = 42.5 to Bay B, 20 × 0.875 = 17.5 to the van, 100 − 60 = 40 left in Bay A (arithmetic)
      expect((await cachedBalances(t, lotId)).byLocation).toEqual({ [w.location.bayA]: '40.000', [w.location.bayB]: '42.500', [w.location.van]: '17.500' });
      await checkLedger([lotId]);
    });

    it('30 transfers of 1 from a lot of 10 at once: exactly 10 succeed, the rest are refused', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
      const lotId = r.lines[0]!.lotId;
      const results = await Promise.all(
        Array.from({ length: 30 }, (_, i) =>
          move({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: i % 3 === 0 ? w.location.van : w.location.bayB, quantity: '1' }),
        ),
      );
      expect(results.filter((x) => x.status === 201)).toHaveLength(10);
      expect(results.filter((x) => x.status === 409)).toHaveLength(20);
      const cached = await cachedBalances(t, lotId);
      expect(cached.byLocation[w.location.bayA]).toBeUndefined();
      expect(new Decimal(cached.byLocation[w.location.bayB] ?? 0).plus(cached.byLocation[w.location.van] ?? 0).toFixed(3)).toBe('10.000');
      await checkLedger([lotId]);
    });
  });

  describe('Idempotency-Key', () => {
    it('the same key twice posts one movement and answers the first response again', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
      const lotId = r.lines[0]!.lotId;
      const k = key();
      const body = { kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '3' };
      const first = await move(body, k).expect(201);
      const second = await move(body, k).expect(201);
      expect(second.body).toEqual(first.body);
      expect((await ledgerSums(t, lotId)).byLocation[w.location.bayB]).toBe('3.000');
      const changed = await move({ ...body, quantity: '4' }, k).expect(422);
      expect(changed.body).toMatchObject({ code: 'idempotency_key_reused' });
      expect(changed.body.message).toMatch(/already used for a different request/);
    });

    it('ten retries at once with one key post once', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
      const lotId = r.lines[0]!.lotId;
      const k = key();
      const body = { kind: 'write-off', lotId, locationId: w.location.bayA, quantity: '1', reason: 'damaged' };
      const all = await Promise.all(Array.from({ length: 10 }, () => move(body, k)));
      expect(all.map((x) => x.status)).toEqual(Array(10).fill(201));
      expect(new Set(all.map((x) => x.body.operationId)).size).toBe(1);
      const [{ n }] = (await sql<{ n: number }>(t, `SELECT count(*)::int AS n FROM stock_movements WHERE lot_id = $1 AND kind = 'write-off'`, [lotId])) as [{ n: number }];
      expect(n).toBe(1);
    });

    it('a retried receipt books the delivery once; a refused request leaves its key free', async () => {
      const k = key();
      const body = {
        supplierName: 'Fenwick Test Supplies',
        receivedOn: new Date().toISOString().slice(0, 10),
        lines: [{ materialId: w.material.mat, locationId: w.location.bayA, packsReceived: 2, packSize: '30', unitCost: '1.5' }],
      };
      const a = await t.http().post('/api/receipts').set(auth(w.storeman)).set('Idempotency-Key', k).send(body).expect(201);
      const b = await t.http().post('/api/receipts').set(auth(w.storeman)).set('Idempotency-Key', k).send(body).expect(201);
      expect(b.body.id).toBe(a.body.id);
      expect(await sql(t, `SELECT 1 FROM receipts WHERE delivery_note_number IS NULL AND id = $1`, [a.body.id])).toHaveLength(1);
      const lots = await sql(t, `SELECT 1 FROM lots WHERE receipt_id = $1`, [a.body.id]);
      expect(lots).toHaveLength(1);

      const k2 = key();
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '1' }]);
      const tooMuch = { kind: 'transfer', lotId: r.lines[0]!.lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: '2' };
      await move(tooMuch, k2).expect(409);
      await move({ ...tooMuch, quantity: '1' }, k2).expect(201);
      expect((await t.http().post('/api/stock-movements').set(auth(w.storeman)).set('Idempotency-Key', 'bad key with spaces').send(tooMuch)).status).toBe(400);
    });

    it('keys older than a week are purged; newer ones still answer their retry', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '10' }]);
      const lotId = r.lines[0]!.lotId;
      const [oldKey, newKey] = [key(), key()];
      const body = (q: string) => ({ kind: 'transfer', lotId, fromLocationId: w.location.bayA, toLocationId: w.location.bayB, quantity: q });
      await move(body('1'), oldKey).expect(201);
      await move(body('2'), newKey).expect(201);
      await sql(t, `UPDATE idempotency_keys SET created_at = now() - interval '8 days' WHERE key = $1`, [oldKey]);
      expect(await t.app.get(IdempotencyService).purge()).toBeGreaterThanOrEqual(1);
      expect(await sql(t, `SELECT key FROM idempotency_keys WHERE key = ANY($1)`, [[oldKey, newKey]])).toEqual([{ key: newKey }]);
      await move(body('2'), newKey).expect(201); // still a retry: no second movement
      expect((await ledgerSums(t, lotId)).byLocation[w.location.bayB]).toBe('3.000');
    });
  });
});
