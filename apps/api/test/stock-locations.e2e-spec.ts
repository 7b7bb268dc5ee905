import { auth, createTestApp, TestApp } from './app';
import { createLocation, insertMaterial, receive, receiptBody, stockWorld, StockWorld } from './stock-fixtures';

/** Locations and where lots may go: allowed hazard classes, segregation of catalyst from flammables, cabinet capacity. */
describe('locations and where lots may go', () => {
  let t: TestApp;
  let w: StockWorld;
  beforeAll(async () => {
    t = await createTestApp();
    w = await stockWorld(t);
  });
  afterAll(() => t.close());

  const move = (body: Record<string, unknown>) => t.http().post('/api/stock-movements').set(auth(w.storeman)).send(body);

  describe('CRUD', () => {
    it('lists locations with their path, defaults by kind and what they hold', async () => {
      const list = await t.http().get('/api/locations').set(auth(w.estimator)).expect(200);
      const cabinet = list.body.find((l: { id: string }) => l.id === w.location.cabinet);
      expect(cabinet).toMatchObject({
        name: 'Flammables cabinet',
        kind: 'flammables-cabinet',
        path: 'Main store › Flammables cabinet',
        capacityLitres: '50.000',
        allowedHazardClasses: ['3'],
        litresHeld: '0.000',
        parentName: 'Main store',
      });
      expect(list.body.find((l: { id: string }) => l.id === w.location.peroxide).allowedHazardClasses).toEqual(['5.2']);
      expect(list.body.find((l: { id: string }) => l.id === w.location.bayA).allowedHazardClasses).toEqual(['none', '3']);
    });

    it('a cabinet gets 50 L unless told; other kinds have no capacity; names are unique; no cycles', async () => {
      const id = await createLocation(t, w.owner, { name: 'Second cabinet', kind: 'flammables-cabinet' });
      expect((await t.http().get(`/api/locations/${id}`).set(auth(w.storeman)).expect(200)).body.capacityLitres).toBe('50.000');
      const bad = await t.http().post('/api/locations').set(auth(w.storeman)).send({ name: 'Shelf Z', kind: 'shelf', capacityLitres: '20' }).expect(400);
      expect(bad.body.message).toMatch(/^capacityLitres: only a flammables cabinet/);
      const dup = await t.http().post('/api/locations').set(auth(w.storeman)).send({ name: 'bay a', kind: 'bay' }).expect(409);
      expect(dup.body.message).toMatch(/already a location called/);
      const cyc = await t.http().patch(`/api/locations/${w.location.store}`).set(auth(w.storeman)).send({ parentId: w.location.bayA }).expect(400);
      expect(cyc.body.message).toMatch(/^parentId: a location cannot be inside itself/);
      await t.http().post('/api/locations').set(auth(w.estimator)).send({ name: 'Nope', kind: 'bay' }).expect(403);
    });

    it('deletes an unused location, keeps one with history, and will not stop allowing a class it holds', async () => {
      const spare = await createLocation(t, w.storeman, { name: 'Spare shelf', kind: 'shelf', parentId: w.location.store });
      await t.http().delete(`/api/locations/${spare}`).set(auth(w.storeman)).expect(204);
      await t.http().get(`/api/locations/${spare}`).set(auth(w.storeman)).expect(404);
      const used = await createLocation(t, w.storeman, { name: 'Used shelf', kind: 'shelf', parentId: w.location.store });
      await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: used, packs: 1, packSize: '20' }]);
      const del = await t.http().delete(`/api/locations/${used}`).set(auth(w.storeman)).expect(409);
      expect(del.body.message).toMatch(/set it inactive instead/);
      const narrow = await t.http().patch(`/api/locations/${used}`).set(auth(w.storeman)).send({ allowedHazardClasses: ['none'] }).expect(409);
      expect(narrow.body.message).toMatch(/holds Test base resin \(class 3\)/);
      const off = await t.http().patch(`/api/locations/${used}`).set(auth(w.storeman)).send({ active: false }).expect(409);
      expect(off.body.message).toMatch(/still holds stock/);
    });
  });

  describe('segregation (HSE CS21; NFPA 400)', () => {
    it('refuses catalyst (5.2) where class 3 resin is stored, citing the guidance, and changes nothing', async () => {
      const shelf = await createLocation(t, w.owner, { name: 'Mixed shelf', kind: 'shelf', parentId: w.location.store, allowedHazardClasses: ['none', '3', '5.2'] });
      await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: shelf, packs: 1, packSize: '20' }]);
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.catalyst, locationId: shelf, packs: 2, packSize: '1' }])).expect(409);
      expect(res.body.code).toBe('segregation');
      // the reason cites HSE CS21 and NFPA 400, and the 7.6 m (25 ft) separation [pub]
      expect(res.body.message).toMatch(/Test catalyst cannot go to Mixed shelf.*holds Test base resin/);
      expect(res.body.message).toMatch(/HSE CS21; NFPA 400/);
      expect(res.body.message).toMatch(/7\.6 m \(25 ft\)/);
      const lots = await t.http().get(`/api/lots?materialId=${w.material.catalyst}&locationId=${shelf}`).set(auth(w.storeman)).expect(200);
      expect(lots.body).toEqual([]);
    });

    it('refuses the reverse: resin moved to where catalyst is stored', async () => {
      const store = await createLocation(t, w.owner, { name: 'Open store', kind: 'store', allowedHazardClasses: ['none', '3', '5.2'] });
      await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: store, packs: 4, packSize: '1' }]);
      const r = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20' }]);
      const res = await move({ kind: 'transfer', lotId: r.lines[0]!.lotId, fromLocationId: w.location.bayA, toLocationId: store, quantity: '5' }).expect(409);
      expect(res.body.message).toMatch(/Test base resin cannot go to Open store, which holds Test catalyst.*class 3 lot cannot go where class 5\.2 is stored/);
    });

    it('treats bays and shelves as part of their store: catalyst on one shelf and resin on another of the same store clash', async () => {
      const store = await createLocation(t, w.owner, { name: 'Workshop', kind: 'store', allowedHazardClasses: ['none', '3', '5.2'] });
      const s1 = await createLocation(t, w.owner, { name: 'Workshop shelf 1', kind: 'shelf', parentId: store, allowedHazardClasses: ['5.2'] });
      const s2 = await createLocation(t, w.owner, { name: 'Workshop shelf 2', kind: 'shelf', parentId: store, allowedHazardClasses: ['3'] });
      await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: s1, packs: 1, packSize: '1' }]);
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.resin, locationId: s2, packs: 1, packSize: '20' }])).expect(409);
      expect(res.body.message).toMatch(/Workshop shelf 2 \(in Workshop\)/);
      // a peroxide store is a place of its own (its own walls), even inside a store
      const inner = await createLocation(t, w.owner, { name: 'Workshop peroxide store', kind: 'peroxide-store', parentId: store });
      await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: inner, packs: 1, packSize: '1' }]);
    });

    it('an accelerator counts as class 3 against catalyst', async () => {
      const acc = await insertMaterial(t, w.companyId, { code: 'T-ACC', name: 'Test accelerator', kind: 'other', stockUnit: 'L', hazardClass: 'none', isAccelerator: true });
      const store = await createLocation(t, w.owner, { name: 'Accelerator test store', kind: 'store', allowedHazardClasses: ['none', '3', '5.2'] });
      await receive(t, w.storeman, [{ materialId: acc, locationId: store, packs: 1, packSize: '1' }]);
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.catalyst, locationId: store, packs: 1, packSize: '1' }])).expect(409);
      expect(res.body.message).toMatch(/holds Test accelerator/);
    });

    it('two lines of one receipt are checked together', async () => {
      const store = await createLocation(t, w.owner, { name: 'Together store', kind: 'store', allowedHazardClasses: ['none', '3', '5.2'] });
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(
        receiptBody([
          { materialId: w.material.resin, locationId: store, packs: 1, packSize: '20' },
          { materialId: w.material.catalyst, locationId: store, packs: 1, packSize: '1' },
        ]),
      ).expect(409);
      expect(res.body.code).toBe('segregation');
    });
  });

  describe('allowed hazard classes', () => {
    it('refuses a class the location may not hold, naming what it may', async () => {
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.catalyst, locationId: w.location.bayA, packs: 1, packSize: '1' }])).expect(409);
      expect(res.body).toMatchObject({ code: 'hazard_class_not_allowed' });
      expect(res.body.message).toBe('Test catalyst (class 5.2) may not be stored in Bay A, which may hold: not a dangerous good, class 3. Choose another location, or change what Bay A may hold.');
      await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: w.location.peroxide, packs: 1, packSize: '1' }]);
    });
  });

  describe('flammables cabinet capacity (HSE HSG51: 50 L)', () => {
    it('warns from 90 % full and refuses past capacity, counting kg as litres through litres per kg', async () => {
      const cab = await createLocation(t, w.owner, { name: 'Test cabinet', kind: 'flammables-cabinet', capacityLitres: '50' });
      // 8 × 5 L acetone = 40 L: 80 % of 50 L, no warning (Potlife warns from 90 %)
      const first = await receive(t, w.storeman, [{ materialId: w.material.acetone, locationId: cab, packs: 8, packSize: '5' }]);
      expect(first.warnings).toEqual([]);
      // + 5 kg resin at 0.9 L/kg = 4.5 L → 44.5 L, 89 %: still no warning
      const second = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: cab, packs: 1, packSize: '5' }]);
      expect(second.warnings).toEqual([]);
      // + 1 × 1 L → 45.5 L ≥ 45 L (90 %): a warning citing HSG51
      const third = await receive(t, w.storeman, [{ materialId: w.material.acetone, locationId: cab, packs: 1, packSize: '1' }]);
      expect(third.warnings).toHaveLength(1);
      expect(third.warnings[0]).toMatch(/Test cabinet: That makes 45\.5 L of the 50 L this cabinet may hold: nearly full\. HSE HSG51/);
      // + 5 L → 50.5 L: refused
      const res = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.acetone, locationId: cab, packs: 1, packSize: '5' }])).expect(409);
      expect(res.body.code).toBe('flammables_capacity');
      expect(res.body.message).toMatch(/That would make 50\.5 L, over the 50 L this cabinet may hold\. HSE HSG51/);
      // exactly 50 L is allowed (refused only over capacity), with a warning
      const fits = await t.http().post('/api/receipts').set(auth(w.storeman)).send(receiptBody([{ materialId: w.material.acetone, locationId: cab, packs: 9, packSize: '0.5' }])).expect(201);
      expect(fits.body.warnings[0]).toMatch(/50 L of the 50 L/);
      const loc = await t.http().get(`/api/locations/${cab}`).set(auth(w.storeman)).expect(200);
      expect(loc.body.litresHeld).toBe('50.000');
    });

    it('moving stock within a cabinet does not count it twice, and a transfer in is refused past capacity', async () => {
      const cab = await createLocation(t, w.owner, { name: 'Shelved cabinet', kind: 'flammables-cabinet', capacityLitres: '20' });
      const top = await createLocation(t, w.owner, { name: 'Shelved cabinet top', kind: 'shelf', parentId: cab, allowedHazardClasses: ['3'] });
      const r = await receive(t, w.storeman, [{ materialId: w.material.acetone, locationId: cab, packs: 3, packSize: '5' }]);
      await move({ kind: 'transfer', lotId: r.lines[0]!.lotId, fromLocationId: cab, toLocationId: top, quantity: '15' }).expect(201);
      const outside = await receive(t, w.storeman, [{ materialId: w.material.acetone, locationId: w.location.bayA, packs: 2, packSize: '5' }]);
      const res = await move({ kind: 'transfer', lotId: outside.lines[0]!.lotId, fromLocationId: w.location.bayA, toLocationId: top, quantity: '10' }).expect(409);
      expect(res.body.message).toMatch(/Shelved cabinet: That would make 25 L, over the 20 L/);
      const ok = await move({ kind: 'transfer', lotId: outside.lines[0]!.lotId, fromLocationId: w.location.bayA, toLocationId: top, quantity: '3' }).expect(201);
      expect(ok.body.warnings[0]).toMatch(/18 L of the 20 L/);
    });

    it('the overview lists places holding classes that may not be together', async () => {
      const store = await createLocation(t, w.owner, { name: 'Problem store', kind: 'store', allowedHazardClasses: ['none', '3', '5.2'] });
      await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: store, packs: 1, packSize: '5' }]);
      // as if the rules were broken outside Potlife: put catalyst there directly
      const catStore = await createLocation(t, w.owner, { name: 'Problem peroxide', kind: 'peroxide-store' });
      const c = await receive(t, w.storeman, [{ materialId: w.material.catalyst, locationId: catStore, packs: 1, packSize: '1' }]);
      const { sql } = await import('./stock-fixtures');
      await sql(t, `UPDATE lot_balances SET location_id = $2 WHERE lot_id = $1`, [c.lines[0]!.lotId, store]);
      const ov = await t.http().get('/api/stock/overview').set(auth(w.storeman)).expect(200);
      const p = ov.body.segregationProblems.find((x: { locationName: string }) => x.locationName === 'Problem store');
      expect(p).toMatchObject({ classes: ['3', '5.2'], materials: ['Test base resin', 'Test catalyst'] });
      expect(p.message).toMatch(/HSE CS21/);
    });
  });
});
