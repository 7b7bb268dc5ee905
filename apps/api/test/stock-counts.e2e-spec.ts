import { auth, createTestApp, TestApp } from './app';
import { cachedBalances, createLocation, key, ledgerSums, receive, stockWorld, StockWorld } from './stock-fixtures';

/** Counts: blind entry, variances valued at unit cost, owner approval posting adjustments, and how movements wait for counting. */
describe('stock counts', () => {
  let t: TestApp;
  let w: StockWorld;
  beforeAll(async () => {
    t = await createTestApp();
    w = await stockWorld(t);
  });
  afterAll(() => t.close());

  async function shelfWithTwoLots(name: string) {
    const shelf = await createLocation(t, w.owner, { name, kind: 'shelf', parentId: w.location.store });
    const r = await receive(t, w.storeman, [
      { materialId: w.material.resin, locationId: shelf, packs: 4, packSize: '25', unitCost: '3.2' },
      { materialId: w.material.mat, locationId: shelf, packs: 2, packSize: '30', unitCost: '1.85' },
    ]);
    return { shelf, resinLot: r.lines[0]!.lotId, matLot: r.lines[1]!.lotId };
  }

  it('blind entry, variance by lot with value, owner approval posting adjustments with the reason', async () => {
    const { shelf, resinLot, matLot } = await shelfWithTwoLots('Count shelf 1');
    const opened = await t.http().post('/api/stock-counts').set(auth(w.storeman)).set('Idempotency-Key', key()).send({ locationId: shelf }).expect(201);
    const id = opened.body.id as string;
    expect(opened.body).toMatchObject({ status: 'open', scopeName: 'Count shelf 1', expectedVisible: false, lineCount: 2 });

    // while open the storeman (and the estimator) see no expected figures; the owner does
    const blind = await t.http().get(`/api/stock-counts/${id}`).set(auth(w.storeman)).expect(200);
    expect(blind.body.lines).toHaveLength(2);
    for (const l of blind.body.lines) {
      expect(l).toMatchObject({ expectedQuantity: null, varianceQuantity: null, varianceValue: null, varianceKind: null });
    }
    expect(JSON.stringify(blind.body)).not.toMatch(/100\.000|60\.000/);
    expect((await t.http().get(`/api/stock-counts/${id}`).set(auth(w.estimator)).expect(200)).body.lines[0].expectedQuantity).toBeNull();
    expect((await t.http().get(`/api/stock-counts/${id}`).set(auth(w.owner)).expect(200)).body.expectedVisible).toBe(true);

    // nothing moves at the shelf while it is being counted
    const frozen = await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: resinLot, fromLocationId: shelf, toLocationId: w.location.bayA, quantity: '1' }).expect(409);
    expect(frozen.body).toMatchObject({ code: 'count_in_progress' });
    expect(frozen.body.message).toMatch(/Count shelf 1 is being counted \(count \d+\)/);

    await t.http().patch(`/api/stock-counts/${id}`).set(auth(w.storeman)).send({ lines: [{ lotId: resinLot, locationId: shelf, countedQuantity: '92.5' }] }).expect(200);
    const early = await t.http().post(`/api/stock-counts/${id}/submit`).set(auth(w.storeman)).send({}).expect(409);
    expect(early.body.message).toMatch(/1 line is not counted yet \(Test mat 450 .* at Count shelf 1\)/);
    const submitted = await t.http().post(`/api/stock-counts/${id}/submit`).set(auth(w.storeman)).send({ lines: [{ lotId: matLot, locationId: shelf, countedQuantity: '61' }] }).expect(200);
    expect(submitted.body).toMatchObject({ status: 'submitted', expectedVisible: true });
    const byLot = Object.fromEntries(submitted.body.lines.map((l: { lotId: string }) => [l.lotId, l]));
    // resin: 92.5 − 100 = −7.5 kg × £3.20 = −£24.00; mat: 61 − 60 = +1 m² × £1.85 = £1.85 (arithmetic, domain countVariance)
    expect(byLot[resinLot]).toMatchObject({ expectedQuantity: '100.000', countedQuantity: '92.500', varianceQuantity: '-7.500', varianceValue: '-24.00', varianceKind: 'loss' });
    expect(byLot[matLot]).toMatchObject({ expectedQuantity: '60.000', countedQuantity: '61.000', varianceQuantity: '1.000', varianceValue: '1.85', varianceKind: 'surplus' });
    expect(submitted.body.totals).toEqual({ lines: 2, counted: 2, losses: 1, surpluses: 1, varianceValue: '-22.15' });

    // the storeman and the estimator cannot approve
    await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.storeman)).send({}).expect(403);
    await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.estimator)).send({}).expect(403);
    const approved = await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.owner)).send({ note: 'checked with Rhys' }).expect(200);
    expect(approved.body.status).toBe('approved');
    expect(approved.body.adjustments).toHaveLength(2);
    for (const a of approved.body.adjustments) {
      expect(a).toMatchObject({ kind: 'adjustment', reason: `count ${opened.body.number}`, countId: id, note: 'checked with Rhys' });
    }
    expect((await cachedBalances(t, resinLot)).total).toBe('92.500');
    expect((await cachedBalances(t, matLot)).total).toBe('61.000');
    expect(await cachedBalances(t, resinLot)).toEqual(await ledgerSums(t, resinLot));
    await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.owner)).send({}).expect(409);
    // and stock moves again
    await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: resinLot, fromLocationId: shelf, toLocationId: w.location.bayA, quantity: '1' }).expect(201);
  });

  it('after submission stock may move; approval adjusts by the variance only, on top of what moved since', async () => {
    const { shelf, resinLot, matLot } = await shelfWithTwoLots('Count shelf 2');
    const id = (await t.http().post('/api/stock-counts').set(auth(w.storeman)).send({ locationId: shelf }).expect(201)).body.id as string;
    await t.http()
      .post(`/api/stock-counts/${id}/submit`)
      .set(auth(w.storeman))
      .send({ lines: [{ lotId: resinLot, locationId: shelf, countedQuantity: '98' }, { lotId: matLot, locationId: shelf, countedQuantity: '60' }] })
      .expect(200);
    await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: resinLot, fromLocationId: shelf, toLocationId: w.location.bayA, quantity: '25' }).expect(201);
    const approved = await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.owner)).send({}).expect(200);
    expect(approved.body.adjustments.map((a: { quantity: string }) => a.quantity)).toEqual(['-2.000']);
    // counted 98, then 25 moved out: 73 on the shelf (arithmetic)
    expect((await cachedBalances(t, resinLot)).byLocation[shelf]).toBe('73.000');
  });

  it('a lot found on the shelf is added; reopening takes the expected figures afresh; cancelling ends it', async () => {
    const { shelf, resinLot, matLot } = await shelfWithTwoLots('Count shelf 3');
    const elsewhere = await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayB, packs: 1, packSize: '30' }]);
    const id = (await t.http().post('/api/stock-counts').set(auth(w.storeman)).send({ locationId: shelf }).expect(201)).body.id as string;
    const found = await t.http()
      .patch(`/api/stock-counts/${id}`)
      .set(auth(w.storeman))
      .send({ lines: [{ lotId: elsewhere.lines[0]!.lotId, locationId: shelf, countedQuantity: '5' }] })
      .expect(200);
    expect(found.body.lines.find((l: { lotId: string }) => l.lotId === elsewhere.lines[0]!.lotId)).toMatchObject({ foundDuringCount: true, countedQuantity: '5.000' });
    await t.http().patch(`/api/stock-counts/${id}`).set(auth(w.storeman)).send({ lines: [{ lotId: resinLot, locationId: w.location.van, countedQuantity: '1' }] }).expect(422);
    await t.http()
      .post(`/api/stock-counts/${id}/submit`)
      .set(auth(w.storeman))
      .send({ lines: [{ lotId: resinLot, locationId: shelf, countedQuantity: '0' }, { lotId: matLot, locationId: shelf, countedQuantity: '60' }] })
      .expect(200);
    const reopened = await t.http().post(`/api/stock-counts/${id}/reject`).set(auth(w.owner)).send({ action: 'reopen', note: 'recount the resin' }).expect(200);
    expect(reopened.body).toMatchObject({ status: 'open', decisionNote: 'recount the resin', countedCount: 0, lineCount: 2 });
    await t.http().post(`/api/stock-counts/${id}/reject`).set(auth(w.storeman)).send({ action: 'cancel', note: 'x' }).expect(403);
    const cancelled = await t.http().post(`/api/stock-counts/${id}/reject`).set(auth(w.owner)).send({ action: 'cancel', note: 'started by mistake' }).expect(200);
    expect(cancelled.body.status).toBe('cancelled');
    await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: resinLot, fromLocationId: shelf, toLocationId: w.location.bayA, quantity: '1' }).expect(201);
  });

  it('one count at a time per location; a count of a store covers its shelves; the overview lists open counts', async () => {
    const { shelf } = await shelfWithTwoLots('Count shelf 4');
    const whole = await t.http().post('/api/stock-counts').set(auth(w.storeman)).send({ locationId: w.location.store }).expect(201);
    expect(whole.body.locationNames).toEqual(expect.arrayContaining(['Main store', 'Bay A', 'Count shelf 4', 'Flammables cabinet']));
    const clash = await t.http().post('/api/stock-counts').set(auth(w.storeman)).send({ locationId: shelf }).expect(409);
    expect(clash.body.message).toMatch(/already in count \d+, which is being counted/);
    const ov = await t.http().get('/api/stock/overview').set(auth(w.storeman)).expect(200);
    expect(ov.body.countsOpen).toEqual([expect.objectContaining({ id: whole.body.id, status: 'open', scopeName: 'Main store' })]);
    const list = await t.http().get('/api/stock-counts?status=open').set(auth(w.estimator)).expect(200);
    expect(list.body.map((c: { id: string }) => c.id)).toEqual([whole.body.id]);
    await t.http().post(`/api/stock-counts/${whole.body.id}/reject`).set(auth(w.owner)).send({ action: 'cancel', note: 'done for now' }).expect(200);
  });

  it('refuses an approval that would take a balance below zero', async () => {
    const { shelf, resinLot, matLot } = await shelfWithTwoLots('Count shelf 5');
    const id = (await t.http().post('/api/stock-counts').set(auth(w.storeman)).send({ locationId: shelf }).expect(201)).body.id as string;
    await t.http()
      .post(`/api/stock-counts/${id}/submit`)
      .set(auth(w.storeman))
      .send({ lines: [{ lotId: resinLot, locationId: shelf, countedQuantity: '10' }, { lotId: matLot, locationId: shelf, countedQuantity: '60' }] })
      .expect(200);
    // 95 of the 100 leave after the count said 10: approving −90 would leave −85
    await t.http().post('/api/stock-movements').set(auth(w.storeman)).send({ kind: 'transfer', lotId: resinLot, fromLocationId: shelf, toLocationId: w.location.bayA, quantity: '95' }).expect(201);
    const res = await t.http().post(`/api/stock-counts/${id}/approve`).set(auth(w.owner)).send({}).expect(409);
    expect(res.body.code).toBe('negative_balance');
    expect((await t.http().get(`/api/stock-counts/${id}`).set(auth(w.owner)).expect(200)).body.status).toBe('submitted');
  });
});
