import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { DataSource } from 'typeorm';
import { ReceivingService } from '../src/stock/receiving.service';
import { auth, createTestApp, TestApp } from './app';
import { insertMaterial, receive, receiptBody, sql, stockWorld, StockWorld } from './stock-fixtures';

const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');
const PDF = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n');
const JPEG = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1, 0, 1, 0, 0, 0xff, 0xd9]);

/** Pages in a PDF made by pdfkit: its page objects are written as plain text. */
const pageCount = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length;
const binary = (res: import('supertest').Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('receipts', () => {
  let t: TestApp;
  let w: StockWorld;
  let dataDir: string;
  beforeAll(async () => {
    dataDir = mkdtempSync(path.join(tmpdir(), 'potlife-receipts-'));
    t = await createTestApp({ POTLIFE_DATA_DIR: dataDir, PUBLIC_URL: 'https://potlife.test' });
    w = await stockWorld(t);
  });
  afterAll(async () => {
    await t.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  const post = (body: unknown, who = w.storeman) => t.http().post('/api/receipts').set(auth(who)).send(body as object);

  describe('expiry', () => {
    it('is the received date + the material’s shelf life when not given (domain expiryDate)', async () => {
      const r = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20' }], '2025-01-15');
      // 2025-01-15 + 90 days = 2025-04-15 (calendar arithmetic: 16 + 28 + 31 + 15)
      expect(r.lines[0]).toMatchObject({ expiresOn: '2025-04-15', expiryComputed: true });
      const lot = await t.http().get(`/api/lots/${r.lines[0]!.lotId}`).set(auth(w.estimator)).expect(200);
      expect(lot.body.expiry).toMatchObject({ expiresOn: '2025-04-15', badge: 'expired' });
      expect(lot.body.status).toBe('expired');
    });

    it('falls back to the domain’s default for catalyst (180 days) when the material has none', async () => {
      const cat = await insertMaterial(t, w.companyId, { code: 'T-CAT2', name: 'Test catalyst, no shelf life set', kind: 'catalyst', stockUnit: 'kg', hazardClass: '5.2' });
      const r = await receive(t, w.storeman, [{ materialId: cat, locationId: w.location.peroxide, packs: 2, packSize: '1' }], '2025-01-15');
      // DEFAULT_SHELF_LIFE_DAYS.catalyst = 180 [practice, short end of 6–12 months]; 2025-01-15 + 180 = 2025-07-14 (calendar arithmetic)
      expect(r.lines[0]).toMatchObject({ expiresOn: '2025-07-14', expiryComputed: true });
    });

    it('keeps the date printed on the packs, warns when it is near, and refuses a batch already out of date', async () => {
      const today = new Date().toISOString().slice(0, 10);
      const soon = new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10);
      const r = await receive(t, w.storeman, [{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20', expiresOn: soon, batch: 'NEAR-1' }], today);
      expect(r.lines[0]).toMatchObject({ expiresOn: soon, expiryComputed: false });
      expect(r.warnings[0]).toMatch(/batch NEAR-1 expires on .*, 10 days after delivery/);
      const old = await post(receiptBody([{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20', expiresOn: '2020-01-01' }], today)).expect(409);
      expect(old.body).toMatchObject({ code: 'expired_on_arrival' });
      expect(old.body.message).toMatch(/refuse it at the door/);
    });
  });

  describe('lines', () => {
    it('stocks packs received as one lot per line; packs refused at the door are recorded, not stocked', async () => {
      const body = receiptBody([
        { materialId: w.material.resin, locationId: w.location.bayA, packs: 3, packSize: '25', unitCost: '3.2', packsRefused: 1 },
        { materialId: w.material.acetone, locationId: w.location.cabinet, packs: 0, packSize: '5', unitCost: '2', packsRefused: 2 },
      ]);
      (body.lines[0] as Record<string, unknown>).refusedReason = 'Drum split at the seam';
      const res = await post(body).expect(201);
      expect(res.body.lines).toHaveLength(2);
      expect(res.body.lines[0]).toMatchObject({ packsReceived: 3, packsRefused: 1, refusedReason: 'Drum split at the seam', quantity: '75.000', value: '240.00' });
      expect(res.body.lines[1]).toMatchObject({ packsReceived: 0, packsRefused: 2, quantity: '0.000', lotId: null });
      // 75 kg × £3.20 = £240.00 (arithmetic)
      expect(res.body.totalValue).toBe('240.00');
      const lots = await t.http().get(`/api/lots?receiptId=${res.body.id}`).set(auth(w.storeman)).expect(200);
      expect(lots.body.map((l: { quantity: string }) => l.quantity)).toEqual(['75.000']);
      const list = await t.http().get(`/api/receipts?q=${res.body.deliveryNoteNumber}`).set(auth(w.estimator)).expect(200);
      expect(list.body.items[0]).toMatchObject({ id: res.body.id, packsReceived: 3, packsRefused: 3, lineCount: 2, hasDeliveryNote: false });
    });

    it('names the field for a missing batch, location or cost, and refuses a future date', async () => {
      const base = receiptBody([{ materialId: w.material.resin, locationId: w.location.bayA, packs: 1, packSize: '20' }]);
      const noBatch = structuredClone(base);
      delete (noBatch.lines[0] as Record<string, unknown>).batchNumber;
      expect((await post(noBatch).expect(400)).body.message).toMatch(/^lines\[0\]\.batchNumber: Test base resin is tracked by lot/);
      const noPlace = structuredClone(base);
      delete (noPlace.lines[0] as Record<string, unknown>).locationId;
      expect((await post(noPlace).expect(400)).body.message).toMatch(/^lines\[0\]\.locationId: say where/);
      const noCost = structuredClone(base);
      delete (noCost.lines[0] as Record<string, unknown>).unitCost;
      expect((await post(noCost).expect(400)).body.message).toMatch(/^lines\[0\]\.unitCost: give the cost per kg/);
      const future = { ...base, receivedOn: new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10) };
      expect((await post(future).expect(400)).body.message).toMatch(/^receivedOn: must not be in the future/);
      const nobody = { ...base, supplierName: undefined };
      expect((await post(nobody).expect(400)).body.message).toMatch(/^supplierName:/);
      await post({ ...base, lines: [{ ...base.lines[0], materialId: randomUUID() }] }).expect(404);
      // a material that is not lot-tracked needs no batch
      const mat = receiptBody([{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '30' }]);
      delete (mat.lines[0] as Record<string, unknown>).batchNumber;
      await post(mat).expect(201);
    });

    it('takes the cost per unit from the supplier’s price for the pack when none is given', async () => {
      const [s] = await sql<{ id: string }>(t, `INSERT INTO suppliers (company_id, name) VALUES ($1, 'Marl Edge Composites') RETURNING id`, [w.companyId]);
      await sql(t, `INSERT INTO supplier_prices (company_id, supplier_id, material_id, pack_size, pack_price, valid_from) VALUES ($1, $2, $3, 25, 80.00, '2024-01-01'), ($1, $2, $3, 25, 87.50, '2025-01-01')`, [
        w.companyId,
        s!.id,
        w.material.resin,
      ]);
      const body = {
        supplierId: s!.id,
        receivedOn: new Date().toISOString().slice(0, 10),
        lines: [{ materialId: w.material.resin, locationId: w.location.bayA, packsReceived: 2, packSize: '25', batchNumber: 'ME-77' }],
      };
      const res = await post(body).expect(201);
      // £87.50 a 25 kg drum (the price valid now) = £3.50 per kg (arithmetic)
      expect(res.body.lines[0].unitCost).toBe('3.5000');
      expect(res.body.supplierName).toBe('Marl Edge Composites');
    });

    it('refuses an order line for now: purchase orders come later', async () => {
      const body = receiptBody([{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '30' }]);
      (body.lines[0] as Record<string, unknown>).purchaseOrderLineId = randomUUID();
      const res = await post(body).expect(422);
      expect(res.body.message).toMatch(/purchase orders are not in Potlife yet/);
    });

    it('the estimator reads receipts but cannot post one', async () => {
      await post(receiptBody([{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '30' }]), w.estimator).expect(403);
      await post(receiptBody([{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '30' }]), w.owner).expect(201);
    });
  });

  describe('against purchase-order lines (ReceivingService, as purchasing will call it)', () => {
    it('adds partial deliveries up, refuses over-delivery, and lets only an owner accept it', async () => {
      const receiving = t.app.get(ReceivingService);
      const db = t.app.get(DataSource);
      const orderLine = randomUUID();
      const orderLines = [{ id: orderLine, materialId: w.material.resin, orderedQuantity: '100' }];
      const body = (packs: number, allowOverDelivery?: boolean) => {
        const b = receiptBody([{ materialId: w.material.resin, locationId: w.location.bayA, packs, packSize: '25' }]);
        (b.lines[0] as Record<string, unknown>).purchaseOrderLineId = orderLine;
        return { ...b, ...(allowOverDelivery ? { allowOverDelivery } : {}) } as never;
      };
      const storeman = { id: w.storeman.user.id, role: 'storeman' as const };
      const owner = { id: w.owner.user.id, role: 'owner' as const };
      // ordered 100 kg: 50 now, 50 later (partial deliveries)
      await db.transaction((m) => receiving.post(m, w.companyId, storeman, body(2), { orderLines }));
      // 75 more would make 125 of 100
      await expect(db.transaction((m) => receiving.post(m, w.companyId, storeman, body(3), { orderLines }))).rejects.toThrow(
        /ordered 100, received before 50, this delivery 75 — 25 kg over the order\. Refuse the extra packs at the door, or an owner can accept/,
      );
      await expect(db.transaction((m) => receiving.post(m, w.companyId, storeman, body(3, true), { orderLines }))).rejects.toThrow(/Only an owner can accept an over-delivery/);
      const ok = await db.transaction((m) => receiving.post(m, w.companyId, owner, body(3, true), { orderLines }));
      expect(ok.warnings).toEqual(['Test base resin: 25 kg more than ordered, accepted by the owner.']);
      const got = await t.http().get(`/api/receipts/${ok.receiptId}`).set(auth(w.owner)).expect(200);
      expect(got.body.lines[0]).toMatchObject({ purchaseOrderLineId: orderLine, overDeliveryAllowed: true, quantity: '75.000' });
      await expect(
        db.transaction((m) => receiving.post(m, w.companyId, owner, body(1), { orderLines: [{ ...orderLines[0]!, materialId: w.material.mat }] })),
      ).rejects.toThrow(/is not the material on that order line/);
    });
  });

  describe('delivery note upload', () => {
    let receiptId: string;
    beforeAll(async () => {
      receiptId = (await receive(t, w.storeman, [{ materialId: w.material.mat, locationId: w.location.bayA, packs: 1, packSize: '30' }])).id;
    });
    const upload = (buf: Buffer, filename: string, contentType = 'application/pdf') =>
      t.http().post(`/api/receipts/${receiptId}/delivery-note`).set(auth(w.storeman)).attach('file', buf, { filename, contentType });

    it('reads the type from the bytes: a PNG named .pdf is kept as a PNG', async () => {
      const res = await upload(PNG, 'delivery-note.pdf').expect(200);
      expect(res.body.deliveryNote).toMatchObject({ contentType: 'image/png', sizeBytes: PNG.length, fileName: 'delivery-note.pdf' });
      const down = await t.http().get(`/api/receipts/${receiptId}/delivery-note`).set(auth(w.estimator)).buffer(true).parse(binary).expect(200);
      expect(down.headers['content-type']).toBe('image/png');
      expect(down.headers['content-disposition']).toBe('inline; filename="delivery-note.png"');
      expect(Buffer.compare(down.body as Buffer, PNG)).toBe(0);
      const dir = path.join(dataDir, 'uploads', w.companyId, 'delivery-notes');
      expect(existsSync(dir) && readdirSync(dir).some((f) => f.endsWith('.png'))).toBe(true);
    });

    it('accepts a PDF and a JPEG, the later one replacing the earlier', async () => {
      expect((await upload(PDF, 'note.pdf').expect(200)).body.deliveryNote.contentType).toBe('application/pdf');
      expect((await upload(JPEG, 'photo.JPG', 'image/jpeg').expect(200)).body.deliveryNote.contentType).toBe('image/jpeg');
      const got = await t.http().get(`/api/receipts/${receiptId}`).set(auth(w.storeman)).expect(200);
      expect(got.body.deliveryNote.url).toBe(`/api/receipts/${receiptId}/delivery-note`);
    });

    it('refuses a text file named .pdf with 415, whatever it says it is', async () => {
      const res = await upload(Buffer.from('Delivery note: 4 drums of resin\n'), 'note.pdf').expect(415);
      expect(res.body).toMatchObject({ statusCode: 415, code: 'unsupported_media_type' });
      expect(res.body.message).toMatch(/must be a PDF, JPEG or PNG file; this one is not a type Potlife recognises/);
    });

    it('refuses 11 MB with 413 and a message saying the limit', async () => {
      const big = Buffer.concat([PDF, Buffer.alloc(11 * 1024 * 1024 - PDF.length, 0x20)]);
      const res = await upload(big, 'big.pdf').expect(413);
      expect(res.body).toMatchObject({ statusCode: 413, code: 'too_large' });
      expect(res.body.message).toMatch(/larger than 10 MB/);
    });

    it('answers 400 with no file, 404 for another company’s receipt, 403 for the estimator', async () => {
      const none = await t.http().post(`/api/receipts/${receiptId}/delivery-note`).set(auth(w.storeman)).send({}).expect(400);
      expect(none.body.message).toMatch(/^file: attach the delivery note/);
      const wrongField = await t.http().post(`/api/receipts/${receiptId}/delivery-note`).set(auth(w.storeman)).attach('document', PNG, 'a.png').expect(400);
      expect(wrongField.body.message).toMatch(/form field "file"/);
      await t.http().post(`/api/receipts/${receiptId}/delivery-note`).set(auth(w.estimator)).attach('file', PNG, 'a.png').expect(403);
      const other = await stockWorld(t, 'Other Receipts Ltd');
      await t.http().post(`/api/receipts/${receiptId}/delivery-note`).set(auth(other.storeman)).attach('file', PNG, 'a.png').expect(404);
      await t.http().get(`/api/receipts/${receiptId}/delivery-note`).set(auth(other.storeman)).expect(404);
    });
  });

  describe('labels', () => {
    it('prints a label per pack received for a receipt, and copies of a lot’s label', async () => {
      const r = await receive(t, w.storeman, [
        { materialId: w.material.resin, locationId: w.location.bayA, packs: 3, packSize: '25' },
        { materialId: w.material.catalyst, locationId: w.location.peroxide, packs: 2, packSize: '1', packsRefused: 1 },
      ]);
      const pdf = await t.http().get(`/api/receipts/${r.id}/labels.pdf`).set(auth(w.storeman)).buffer(true).parse(binary).expect(200);
      expect(pdf.headers['content-type']).toBe('application/pdf');
      const body = pdf.body as Buffer;
      expect(body.subarray(0, 5).toString()).toBe('%PDF-');
      expect(pageCount(body)).toBe(5);
      const one = await t.http().get(`/api/lots/${r.lines[0]!.lotId}/label.pdf?copies=2`).set(auth(w.estimator)).buffer(true).parse(binary).expect(200);
      expect(pageCount(one.body as Buffer)).toBe(2);
      await t.http().get(`/api/lots/${r.lines[0]!.lotId}/label.pdf?copies=0`).set(auth(w.estimator)).expect(400);
      await t.http().get(`/api/lots/${randomUUID()}/label.pdf`).set(auth(w.estimator)).expect(404);
    });
  });
});
