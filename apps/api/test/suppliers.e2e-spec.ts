import { Client } from 'pg';
import { SuppliersService } from '../src/suppliers/suppliers.service';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';

/** Pack sizes and prices are invented; pack sizes are common trade practice, no source (TRADE.md [practice]). */
const resin = (code: string) => ({
  code,
  name: `Base resin ${code}`,
  kind: 'base-resin',
  stockUnit: 'kg',
  packSizes: [
    { size: '20', label: '20 kg drum' },
    { size: '25', label: '25 kg drum' },
  ],
  hazardClass: '3',
  unNumber: '1866', // resin solution, class 3 [pub] dangerous-goods list (TRADE.md)
});

describe('suppliers and prices', () => {
  let t: TestApp;
  let owner: Session;
  let estimator: Session;
  let storeman: Session;
  let other: Session;
  let db: Client;

  beforeAll(async () => {
    t = await createTestApp({ LOGIN_MAX_FAILURES: '1000', RATE_LIMIT_PER_MINUTE: '100000' });
    owner = await registerCompany(t, 'Supplier Roofing');
    estimator = await addUser(t, owner, 'estimator');
    storeman = await addUser(t, owner, 'storeman');
    other = await registerCompany(t, 'Other Roofing');
    db = new Client({ connectionString: t.databaseUrl });
    await db.connect();
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const newMaterial = async (s: Session, code: string, body: Record<string, unknown> = resin(code)) =>
    (await t.http().post('/api/materials').set(auth(s)).send(body).expect(201)).body as { id: string; code: string };
  const newSupplier = async (s: Session, name: string, extra: Record<string, unknown> = {}) =>
    (await t.http().post('/api/suppliers').set(auth(s)).send({ name, ...extra }).expect(201)).body as { id: string };
  const addPrice = (s: Session, supplierId: string, body: Record<string, unknown>) => t.http().post(`/api/suppliers/${supplierId}/prices`).set(auth(s)).send(body);
  const priceCount = async (supplierId: string) =>
    Number((await db.query(`SELECT count(*) FROM supplier_prices WHERE supplier_id = $1`, [supplierId])).rows[0].count);

  describe('suppliers and contacts', () => {
    let id: string;

    it('the estimator creates a supplier with contacts; lead time defaults to 3 days', async () => {
      const res = await t
        .http()
        .post('/api/suppliers')
        .set(auth(estimator))
        .send({
          name: 'Brackenfield Resins',
          orderEmail: ' Orders@Brackenfield.TEST ',
          address: '2 Kiln Row, Brackenfield',
          contacts: [
            { name: 'Nell Farrow', email: 'nell@brackenfield.test', role: 'Trade counter' },
            { name: 'Amos Lind', phone: '01632 960 001' },
          ],
        })
        .expect(201);
      id = res.body.id;
      expect(res.body).toMatchObject({ name: 'Brackenfield Resins', orderEmail: 'orders@brackenfield.test', leadTimeDays: 3, active: true, notes: null });
      expect(res.body.contacts.map((c: { name: string }) => c.name)).toEqual(['Amos Lind', 'Nell Farrow']);
      expect(res.body.contacts[1]).toMatchObject({ email: 'nell@brackenfield.test', role: 'Trade counter', phone: null });
    });

    it('the storeman reads but may not edit', async () => {
      await t.http().get(`/api/suppliers/${id}`).set(auth(storeman)).expect(200);
      await t.http().patch(`/api/suppliers/${id}`).set(auth(storeman)).send({ leadTimeDays: 1 }).expect(403);
      await t.http().post(`/api/suppliers/${id}/contacts`).set(auth(storeman)).send({ name: 'X' }).expect(403);
    });

    it('names are unique in the company: 409', async () => {
      const res = await t.http().post('/api/suppliers').set(auth(owner)).send({ name: 'brackenfield resins' }).expect(409);
      expect(res.body).toMatchObject({ code: 'duplicate_name' });
      await newSupplier(other, 'Brackenfield Resins');
    });

    it('lists with search (name, e-mail, contacts), sort and pages; archived ones on request', async () => {
      await newSupplier(owner, 'Orchard Lane Glassfibre', { leadTimeDays: 5 });
      await newSupplier(owner, 'Wyle Mill Fixings', { leadTimeDays: 1, active: false });
      const list = await t.http().get('/api/suppliers?sort=leadTimeDays&order=desc').set(auth(storeman)).expect(200);
      expect(list.body).toMatchObject({ total: 2, page: 1, pageSize: 25 });
      expect(list.body.items.map((s: { name: string }) => s.name)).toEqual(['Orchard Lane Glassfibre', 'Brackenfield Resins']);
      const byContact = await t.http().get('/api/suppliers?q=farrow').set(auth(owner)).expect(200);
      expect(byContact.body.items.map((s: { name: string }) => s.name)).toEqual(['Brackenfield Resins']);
      const all = await t.http().get('/api/suppliers?active=all&pageSize=2&page=2').set(auth(owner)).expect(200);
      expect(all.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
      expect(all.body.items.map((s: { name: string }) => s.name)).toEqual(['Wyle Mill Fixings']);
      expect((await t.http().get('/api/suppliers?sort=email').set(auth(owner))).status).toBe(400);
    });

    it('patches the lead time and order e-mail, clears the e-mail, archives', async () => {
      const res = await t.http().patch(`/api/suppliers/${id}`).set(auth(owner)).send({ leadTimeDays: 2, orderEmail: '' }).expect(200);
      expect(res.body).toMatchObject({ leadTimeDays: 2, orderEmail: null });
      expect(res.body.contacts).toHaveLength(2);
      await t.http().patch(`/api/suppliers/${id}`).set(auth(owner)).send({ orderEmail: 'orders@brackenfield.test' }).expect(200);
      for (const [body, field] of [
        [{ leadTimeDays: -1 }, 'leadTimeDays'],
        [{ leadTimeDays: '2' }, 'leadTimeDays'],
        [{ orderEmail: 'not-an-address' }, 'orderEmail'],
        [{ name: null }, 'name'],
      ] as const) {
        const bad = await t.http().patch(`/api/suppliers/${id}`).set(auth(owner)).send(body).expect(400);
        expect(bad.body.message).toContain(`${field}:`);
      }
    });

    it('adds, edits and deletes a contact', async () => {
      const c = await t.http().post(`/api/suppliers/${id}/contacts`).set(auth(owner)).send({ name: 'Ivo Pike', email: 'ivo@brackenfield.test' }).expect(201);
      expect(c.body).toMatchObject({ name: 'Ivo Pike', email: 'ivo@brackenfield.test', phone: null, role: null });
      const e = await t.http().patch(`/api/suppliers/${id}/contacts/${c.body.id}`).set(auth(estimator)).send({ role: 'Accounts', email: null }).expect(200);
      expect(e.body).toMatchObject({ name: 'Ivo Pike', role: 'Accounts', email: null });
      await t.http().delete(`/api/suppliers/${id}/contacts/${c.body.id}`).set(auth(owner)).expect(204);
      await t.http().delete(`/api/suppliers/${id}/contacts/${c.body.id}`).set(auth(owner)).expect(404);
      const s = await t.http().get(`/api/suppliers/${id}`).set(auth(owner)).expect(200);
      expect(s.body.contacts.map((x: { name: string }) => x.name)).not.toContain('Ivo Pike');
    });

    it("another company's supplier and its contacts answer 404", async () => {
      const contactId = (await t.http().get(`/api/suppliers/${id}`).set(auth(owner)).expect(200)).body.contacts[0].id;
      await t.http().get(`/api/suppliers/${id}`).set(auth(other)).expect(404);
      const res = await t.http().patch(`/api/suppliers/${id}`).set(auth(other)).send({ leadTimeDays: 9 }).expect(404);
      expect(res.body).toEqual({ statusCode: 404, message: 'Supplier not found', code: 'not_found' });
      await t.http().post(`/api/suppliers/${id}/contacts`).set(auth(other)).send({ name: 'Intruder' }).expect(404);
      await t.http().patch(`/api/suppliers/${id}/contacts/${contactId}`).set(auth(other)).send({ name: 'Intruder' }).expect(404);
      await t.http().delete(`/api/suppliers/${id}/contacts/${contactId}`).set(auth(other)).expect(404);
      await t.http().get(`/api/suppliers/${id}/prices`).set(auth(other)).expect(404);
      // A contact under the wrong supplier is not found either.
      const mine = await newSupplier(owner, 'Another Supplier');
      await t.http().delete(`/api/suppliers/${mine.id}/contacts/${contactId}`).set(auth(owner)).expect(404);
      const list = await t.http().get('/api/suppliers?active=all').set(auth(other)).expect(200);
      expect(list.body.items.map((s: { id: string }) => s.id)).not.toContain(id);
    });
  });

  describe('prices and their history', () => {
    let a: string;
    let b: string;
    let res25: { id: string; code: string };

    beforeAll(async () => {
      a = (await newSupplier(owner, 'Price Supplier A', { leadTimeDays: 2 })).id;
      b = (await newSupplier(owner, 'Price Supplier B', { leadTimeDays: 4 })).id;
      res25 = await newMaterial(owner, 'PR-RES');
    });

    it('a new price is a new row; the same supplier, material, pack and date again is 409', async () => {
      const first = await addPrice(estimator, a, { materialId: res25.id, packSize: '25', packPrice: '82', validFrom: '2025-01-06', supplierCode: 'BR-25' }).expect(201);
      expect(first.body).toMatchObject({
        supplierId: a,
        supplierName: 'Price Supplier A',
        materialId: res25.id,
        materialCode: 'PR-RES',
        stockUnit: 'kg',
        packSize: '25',
        packLabel: '25 kg drum',
        packPrice: '82.00',
        unitPrice: '3.2800', // 82 / 25 = 3.28, arithmetic
        validFrom: '2025-01-06',
        supplierCode: 'BR-25',
        previous: null,
        next: null,
      });
      const again = await addPrice(owner, a, { materialId: res25.id, packSize: '25.000', packPrice: '90', validFrom: '2025-01-06' }).expect(409);
      expect(again.body.code).toBe('duplicate_price');
      const rise = await addPrice(owner, a, { materialId: res25.id, packSize: '25', packPrice: '86.40', validFrom: '2025-04-01' }).expect(201);
      expect(rise.body.previous).toMatchObject({ packPrice: '82.00', validFrom: '2025-01-06' });
      expect(await priceCount(a)).toBe(2);
    });

    it('refuses a pack the material does not come in, a material of another company, and bad values', async () => {
      const pack = await addPrice(owner, a, { materialId: res25.id, packSize: '30', packPrice: '99', validFrom: '2025-01-01' }).expect(422);
      expect(pack.body).toMatchObject({ code: 'unknown_pack' });
      expect(pack.body.message).toContain('PR-RES comes in 20, 25 kg');
      const theirs = await newMaterial(other, 'THEIR-RES');
      const res = await addPrice(owner, a, { materialId: theirs.id, packSize: '25', packPrice: '1', validFrom: '2025-01-01' }).expect(400);
      expect(res.body.message).toContain('materialId:');
      for (const [body, field] of [
        [{ packPrice: 82 }, 'packPrice'],
        [{ packPrice: '82.005' }, 'packPrice'],
        [{ packPrice: '-1' }, 'packPrice'],
        [{ packSize: '0' }, 'packSize'],
        [{ validFrom: '2025-02-30' }, 'validFrom'],
        [{ validFrom: '06/01/2025' }, 'validFrom'],
      ] as const) {
        const bad = await addPrice(owner, a, Object.assign({ materialId: res25.id, packSize: '25', packPrice: '82', validFrom: '2025-06-01' }, body)).expect(400);
        expect(bad.body.message).toContain(`${field}:`);
      }
      // Prices for another company's supplier: 404.
      await addPrice(other, a, { materialId: theirs.id, packSize: '25', packPrice: '1', validFrom: '2025-01-01' }).expect(404);
    });

    it("a supplier's current prices on a date, each with the price it replaced", async () => {
      await addPrice(owner, a, { materialId: res25.id, packSize: '20', packPrice: '70', validFrom: '2025-01-06' }).expect(201);
      await addPrice(owner, a, { materialId: res25.id, packSize: '25', packPrice: '88', validFrom: '2099-01-01' }).expect(201);
      const now = await t.http().get(`/api/suppliers/${a}/prices?on=2025-05-01&sort=packSize`).set(auth(storeman)).expect(200);
      expect(now.body).toMatchObject({ total: 2, page: 1, on: '2025-05-01' });
      expect(now.body.items.map((p: { packSize: string; packPrice: string }) => [p.packSize, p.packPrice])).toEqual([
        ['20', '70.00'],
        ['25', '86.40'],
      ]);
      expect(now.body.items[1].previous).toMatchObject({ packPrice: '82.00', validFrom: '2025-01-06' });
      expect(now.body.items[1].next).toMatchObject({ packPrice: '88.00', validFrom: '2099-01-01' });
      const before = await t.http().get(`/api/suppliers/${a}/prices?on=2025-03-31&sort=packSize`).set(auth(owner)).expect(200);
      expect(before.body.items[1]).toMatchObject({ packPrice: '82.00', previous: null, next: { packPrice: '86.40' } });
      const early = await t.http().get(`/api/suppliers/${a}/prices?on=2024-12-31`).set(auth(owner)).expect(200);
      expect(early.body).toMatchObject({ total: 0, items: [] });
      const sorted = await t.http().get(`/api/suppliers/${a}/prices?on=2025-05-01&sort=unitPrice&order=desc`).set(auth(owner)).expect(200);
      // 70 / 20 = 3.5 per kg against 86.40 / 25 = 3.456 per kg, arithmetic
      expect(sorted.body.items.map((p: { unitPrice: string }) => p.unitPrice)).toEqual(['3.5000', '3.4560']);
      expect((await t.http().get(`/api/suppliers/${a}/prices?on=2025-13-01`).set(auth(owner))).status).toBe(400);
    });

    it("a material's prices from every supplier, cheapest first per pack, with history on request", async () => {
      await addPrice(owner, b, { materialId: res25.id, packSize: '25', packPrice: '84.10', validFrom: '2025-02-01' }).expect(201);
      const res = await t.http().get(`/api/materials/${res25.id}/prices?on=2025-05-01`).set(auth(storeman)).expect(200);
      expect(res.body.material).toEqual({ id: res25.id, code: 'PR-RES', name: 'Base resin PR-RES', stockUnit: 'kg' });
      expect(res.body.packs.map((p: { packSize: string }) => p.packSize)).toEqual(['20', '25']);
      expect(res.body.packs[1].prices.map((p: { supplierName: string; packPrice: string }) => [p.supplierName, p.packPrice])).toEqual([
        ['Price Supplier B', '84.10'],
        ['Price Supplier A', '86.40'],
      ]);
      expect(res.body.packs[1].prices[0].history).toBeUndefined();
      const h = await t.http().get(`/api/materials/${res25.id}/prices?on=2025-05-01&history=true`).set(auth(owner)).expect(200);
      const aPrice = h.body.packs[1].prices[1];
      expect(aPrice.history.map((x: { validFrom: string; packPrice: string }) => [x.validFrom, x.packPrice])).toEqual([
        ['2099-01-01', '88.00'],
        ['2025-04-01', '86.40'],
        ['2025-01-06', '82.00'],
      ]);
      await t.http().get(`/api/materials/${res25.id}/prices`).set(auth(other)).expect(404);
      expect((await t.http().get(`/api/materials/${res25.id}/prices?history=maybe`).set(auth(owner))).status).toBe(400);
    });

    it('SuppliersService.currentPrice gives the cheapest active supplier on a date, or one supplier', async () => {
      const svc = t.app.get(SuppliersService);
      const c = owner.user.companyId;
      expect((await svc.currentPrice(c, res25.id, '25', '2025-01-10'))?.packPrice).toBe('82.00'); // only A yet
      expect(await svc.currentPrice(c, res25.id, '25', '2025-01-05')).toBeNull();
      const may = await svc.currentPrice(c, res25.id, '25', '2025-05-01');
      expect(may).toMatchObject({ supplierId: b, packPrice: '84.10' });
      expect((await svc.currentPrice(c, res25.id, '25', '2025-05-01', { supplierId: a }))?.packPrice).toBe('86.40');
      await t.http().patch(`/api/suppliers/${b}`).set(auth(owner)).send({ active: false }).expect(200);
      expect((await svc.currentPrice(c, res25.id, '25', '2025-05-01'))?.supplierId).toBe(a);
      await t.http().patch(`/api/suppliers/${b}`).set(auth(owner)).send({ active: true }).expect(200);
      expect(await svc.currentPrice(other.user.companyId, res25.id, '25', '2025-05-01')).toBeNull();
      const all = await svc.currentPrices(c, [res25.id], '2025-05-01');
      expect(all.map((p) => [p.packSize, p.supplierName])).toEqual([
        ['20', 'Price Supplier A'],
        ['25', 'Price Supplier B'],
        ['25', 'Price Supplier A'],
      ]);
    });
  });

  describe('price list CSV', () => {
    let company: Session;
    let supplier: string;
    let mats: { id: string; code: string }[];

    beforeAll(async () => {
      company = await registerCompany(t, 'Price List Roofing');
      supplier = (await newSupplier(company, 'Hollowmere Trade Supplies')).id;
      mats = [await newMaterial(company, 'RES-A'), await newMaterial(company, 'RES-B')];
      await addPrice(company, supplier, { materialId: mats[0]!.id, packSize: '25', packPrice: '80', validFrom: '2025-01-01', supplierCode: 'HT-100' }).expect(201);
    });

    const importCsv = (mode: string, csv: string, extra: Record<string, unknown> = {}) =>
      t.http().post(`/api/suppliers/${supplier}/prices/import?mode=${mode}`).set(auth(company)).send({ csv, ...extra });

    it('preview matches rows by material code or the supplier’s code and lists bad rows with their reasons', async () => {
      const csv = [
        'material_code,supplier_code,pack_size,pack_price,valid_from',
        'RES-A,HT-100,25,84.00,2025-04-01',
        ',HT-100,20,£66.50,01/04/2025',
        'RES-B,HT-200,25,"1,081.00",2025-04-01',
        'NOPE,,25,10,2025-04-01',
        ',HT-999,25,10,2025-04-01',
        'RES-A,,30,10,2025-04-01',
        'RES-A,,25,80,2025-01-01',
        'RES-A,,25,81,2025-01-01',
        'RES-B,,20,abc,2025-31-01',
        'RES-B,HT-100,20,10,2025-04-01',
        'RES-A,,25,84.00,2025-04-01',
      ].join('\n');
      const before = await priceCount(supplier);
      const res = await importCsv('preview', csv).expect(200);
      expect(await priceCount(supplier)).toBe(before);
      expect(res.body).toMatchObject({ valid: 4, invalid: 7, created: 3, unchanged: 1, updated: 0, committed: false });
      const rows = res.body.rows;
      expect(rows[0]).toMatchObject({ row: 2, action: 'create', code: 'RES-A', packPrice: '84.00', validFrom: '2025-04-01', previousPrice: '80.00', errors: [] });
      expect(rows[1]).toMatchObject({ row: 3, code: 'RES-A', packSize: '20', packPrice: '66.50', validFrom: '2025-04-01', errors: [] });
      expect(rows[2]).toMatchObject({ row: 4, code: 'RES-B', packPrice: '1081.00', errors: [] });
      expect(rows[3].errors).toEqual([{ field: 'material_code', message: 'no material has the code NOPE in the catalogue' }]);
      expect(rows[4].errors[0]).toMatchObject({ field: 'supplier_code' });
      expect(rows[5].errors[0]).toMatchObject({ field: 'pack_size', message: expect.stringContaining('RES-A comes in 20, 25') });
      expect(rows[6]).toMatchObject({ row: 8, action: 'unchanged', errors: [] });
      expect(rows[7].errors).toEqual([
        { field: 'row', message: 'row 8 already prices this pack from 2025-01-01' },
        { field: 'pack_price', message: expect.stringContaining('already has £80.00 for this pack from 2025-01-01; prices are never changed') },
      ]);
      expect(rows[8].errors.map((e: { field: string }) => e.field)).toEqual(['pack_price', 'valid_from']);
      expect(rows[9].errors[0]).toMatchObject({ field: 'supplier_code', message: expect.stringContaining('belongs to RES-A') });
      expect(rows[10].errors[0]).toMatchObject({ field: 'row', message: 'row 2 already prices this pack from 2025-04-01' });
    });

    it('commit refuses a file with bad rows (422, rows named) and writes nothing', async () => {
      const csv = ['material_code,pack_size,pack_price,valid_from', 'RES-A,25,84,2025-04-01', 'RES-B,25,x,2025-04-01'].join('\n');
      const before = await priceCount(supplier);
      const res = await importCsv('commit', csv).expect(422);
      expect(res.body.code).toBe('import_rejected');
      expect(res.body.message).toContain('Nothing was imported: 1 of 2 rows have errors. Row 3: pack_price:');
      expect(await priceCount(supplier)).toBe(before);
    });

    it('commit writes a good file; validFrom fills empty dates; the file needs a way to find materials and dates', async () => {
      const csv = ['material_code,supplier_code,pack_size,pack_price,valid_from', 'RES-A,HT-100,25,84.00,', 'RES-B,HT-200,25,79.99,2025-03-01'].join('\n');
      const res = await importCsv('commit', csv, { validFrom: '2025-04-01' }).expect(200);
      expect(res.body).toMatchObject({ created: 2, committed: true });
      const list = await t.http().get(`/api/suppliers/${supplier}/prices?on=2025-05-01`).set(auth(company)).expect(200);
      expect(list.body.items.map((p: { materialCode: string; packPrice: string; validFrom: string }) => [p.materialCode, p.packPrice, p.validFrom])).toEqual([
        ['RES-A', '84.00', '2025-04-01'],
        ['RES-B', '79.99', '2025-03-01'],
      ]);
      expect((await importCsv('preview', 'pack_size,pack_price,valid_from\n25,1,2025-01-01')).body.message).toMatch(/^csv: .*material_code or supplier_code/);
      expect((await importCsv('preview', 'material_code,pack_size,pack_price\nRES-A,25,1')).body.message).toMatch(/^csv: .*valid_from/);
      expect((await importCsv('preview', 'material_code,pack_size,pack_price,colour\nRES-A,25,1,red')).status).toBe(400);
    });

    it('an export re-imports as unchanged rows (round trip)', async () => {
      const ex = await t.http().get(`/api/suppliers/${supplier}/prices/export.csv?on=2025-05-01`).set(auth(company)).expect(200);
      expect(ex.headers['content-type']).toMatch(/^text\/csv/);
      expect(ex.headers['content-disposition']).toBe('attachment; filename="prices-hollowmere-trade-supplies-2025-05-01.csv"');
      expect(ex.text.startsWith('\uFEFFmaterial_code,supplier_code,material_name,pack_size,pack_label,pack_price,valid_from\r\n')).toBe(true);
      expect(ex.text).toContain('RES-A,HT-100,Base resin RES-A,25,25 kg drum,84.00,2025-04-01');
      const res = await importCsv('commit', ex.text).expect(200);
      expect(res.body).toMatchObject({ valid: 2, invalid: 0, created: 0, unchanged: 2 });
      await t.http().get(`/api/suppliers/${supplier}/prices/export.csv`).set(auth(other)).expect(404);
      await t.http().post(`/api/suppliers/${supplier}/prices/import?mode=preview`).set(auth(other)).send({ csv: ex.text }).expect(404);
    });

    it('imports 5,000 price rows in well under a few seconds', async () => {
      const big = await registerCompany(t, 'Big Price List Roofing');
      const sup = (await newSupplier(big, 'Bulk Supplier')).id;
      const cat = ['code,name,kind,stock_unit,pack_sizes,hazard_class,un_number'];
      for (let i = 0; i < 2500; i++) {
        cat.push(`B-${i},Bulk resin ${i},base-resin,kg,20:20 kg drum; 25:25 kg drum,3,1866`);
      }
      await t.http().post('/api/materials/import?mode=commit').set(auth(big)).send({ csv: cat.join('\n') }).expect(200);
      const lines = ['material_code,supplier_code,pack_size,pack_price,valid_from'];
      for (let i = 0; i < 2500; i++) {
        lines.push(`B-${i},S-${i}-20,20,${(60 + (i % 50)).toFixed(2)},2025-01-01`, `B-${i},S-${i}-25,25,${(70 + (i % 50)).toFixed(2)},2025-01-01`);
      }
      const csv = lines.join('\n');
      let started = Date.now();
      const preview = await t.http().post(`/api/suppliers/${sup}/prices/import?mode=preview`).set(auth(big)).send({ csv }).expect(200);
      const previewMs = Date.now() - started;
      expect(preview.body).toMatchObject({ valid: 5000, invalid: 0 });
      started = Date.now();
      const commit = await t.http().post(`/api/suppliers/${sup}/prices/import?mode=commit`).set(auth(big)).send({ csv }).expect(200);
      const commitMs = Date.now() - started;
      expect(commit.body).toMatchObject({ created: 5000, committed: true });
      expect(await priceCount(sup)).toBe(5000);
      console.log(`5,000-row price list import: preview ${previewMs} ms, commit ${commitMs} ms`);
      // A guard against gross regressions only (a loaded 2-core machine); bench/ measures speed.
      expect(previewMs).toBeLessThan(15_000);
      expect(commitMs).toBeLessThan(15_000);
    });
  });
});
