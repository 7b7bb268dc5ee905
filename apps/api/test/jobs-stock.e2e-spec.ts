import { allocateFefo, choosePacks, Decimal, shortfallToOrder } from '@potlife/domain';
import { Client } from 'pg';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';
import {
  addLocation,
  addLot,
  CatalogueIds,
  createBuildUp,
  createCustomer,
  dbClient,
  inDays,
  readyJob,
  seedTestCatalogue,
  SMALL_ROOF,
} from './jobs-fixtures';

describe('reservations, pick lists, issues, returns and the reconciliation', () => {
  let t: TestApp;
  let db: Client;
  let owner: Session;
  let estimator: Session;
  let storeman: Session;
  let cat: CatalogueIds;
  let customerId: string;
  let buildUpId: string;
  let store: string;
  const jobDay = 14;
  const lots = {} as Record<'soon' | 'b' | 'c' | 'quarantined' | 'flagged', string>;

  beforeAll(async () => {
    t = await createTestApp();
    db = await dbClient(t);
    owner = await registerCompany(t, 'Reserve Test Roofing');
    estimator = await addUser(t, owner, 'estimator');
    storeman = await addUser(t, owner, 'storeman');
    cat = await seedTestCatalogue(db, owner.user.companyId);
    customerId = await createCustomer(t, estimator);
    buildUpId = await createBuildUp(t, owner);
    store = await addLocation(db, owner.user.companyId);
    const lot = (
      materialId: string,
      quantity: string,
      expiresIn: number | null,
      more: Record<string, unknown> = {},
    ) =>
      addLot(db, {
        companyId: owner.user.companyId,
        userId: owner.user.id,
        materialId,
        locationId: store,
        quantity,
        expiresOn: expiresIn === null ? null : inDays(expiresIn),
        ...more,
      });
    lots.soon = await lot(cat.resin, '10', jobDay + 3, { batch: 'R-SOON' });
    lots.b = await lot(cat.resin, '8', jobDay + 20, { batch: 'R-B' });
    lots.c = await lot(cat.resin, '25', jobDay + 60, { batch: 'R-C', unitCost: '3.49' });
    lots.quarantined = await lot(cat.resin, '25', jobDay + 30, { batch: 'R-Q', status: 'quarantined' });
    lots.flagged = await lot(cat.resin, '25', jobDay + 15, { batch: 'R-F', exposureFlagged: true });
    await t
      .http()
      .patch('/api/settings/jobs')
      .set(auth(owner))
      .send({ reservationMarginDays: 7 })
      .expect(200);
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const held = async (lotId: string) =>
    new Decimal(
      (
        await db.query(
          `SELECT coalesce(sum(quantity - issued_quantity), 0)::text AS q FROM reservations WHERE lot_id = $1 AND status = 'held'`,
          [lotId],
        )
      ).rows[0].q,
    ).toString();
  const resin = (body: any) => body.materials.find((m: any) => m.material.id === cat.resin);

  describe('reservation rules', () => {
    let job: { id: string; reference: string; estimate: any };

    it('needs a date and an accepted estimate; only the owner sets the margin', async () => {
      await t
        .http()
        .patch('/api/settings/jobs')
        .set(auth(estimator))
        .send({ reservationMarginDays: 1 })
        .expect(403);
      const settings = await t.http().get('/api/settings/jobs').set(auth(estimator)).expect(200);
      expect(settings.body).toMatchObject({ reservationMarginDays: 7, quoteValidityDays: 30 });
      const early = await readyJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(jobDay) });
      await t
        .http()
        .patch(`/api/jobs/${early.id}`)
        .set(auth(estimator))
        .send({ scheduledOn: null })
        .expect(200);
      const noDate = await t
        .http()
        .post(`/api/jobs/${early.id}/reservations`)
        .set(auth(estimator))
        .expect(409);
      expect(noDate.body.message).toContain('scheduled date');
      await t
        .http()
        .post(`/api/jobs/${early.id}/status`)
        .set(auth(estimator))
        .send({ status: 'cancelled' })
        .expect(200);
      await t.http().post(`/api/jobs/${early.id}/reservations`).set(auth(estimator)).expect(409);
      await t.http().post(`/api/jobs/${early.id}/reservations`).set(auth(storeman)).expect(403);
    });

    it('reserves FEFO from lots in date on the job date + margin, not quarantined, not flagged (allocateFefo)', async () => {
      job = await readyJob(t, estimator, {
        customerId,
        buildUpId,
        scheduledOn: inDays(jobDay),
        status: 'scheduled',
      });
      const res = await t.http().post(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
      expect(res.body).toMatchObject({
        jobDate: inDays(jobDay),
        marginDays: 7,
        useBy: inDays(jobDay + 7),
        estimate: { version: 1 },
      });
      const r = resin(res.body);
      // 11.38 kg of resin for the small roof is bought as 3 × 5 kg tins (choosePacks over 25 and 5).
      const packs = choosePacks(
        job.estimate.materials.find((m: any) => m.material?.id === cat.resin).quantity,
        ['25', '5'],
      );
      expect(r.needed).toBe(packs.total.toString());
      expect(r.needed).toBe('15');
      // The same lots through the domain: the soon-expiring lot is expired by job date + 7, Q and F are unusable.
      const expected = allocateFefo(
        [
          { id: lots.soon, quantity: '10', expiresOn: inDays(jobDay + 3), usable: true },
          { id: lots.b, quantity: '8', expiresOn: inDays(jobDay + 20), usable: true },
          { id: lots.c, quantity: '25', expiresOn: inDays(jobDay + 60), usable: true },
          { id: lots.quarantined, quantity: '25', expiresOn: inDays(jobDay + 30), usable: false },
          { id: lots.flagged, quantity: '25', expiresOn: inDays(jobDay + 15), usable: false },
        ],
        '15',
        inDays(jobDay + 7),
      );
      expect(r.reservations.map((x: any) => [x.lot.id, x.heldQuantity])).toEqual(
        expected.allocations.map((a) => [a.lotId, a.quantity.toString()]),
      );
      expect(r.reservations.map((x: any) => x.lot.batchNumber)).toEqual(['R-B', 'R-C']);
      expect(r).toMatchObject({ held: '15', issued: '0', outstanding: '0', shortfall: null });
      expect(await held(lots.soon)).toBe('0');
    });

    it('lists shortfalls with what is needed by when (job date − supplier lead time) and what to order', async () => {
      const res = await t.http().get(`/api/jobs/${job.id}/reservations`).set(auth(storeman)).expect(200);
      expect(res.body.state).toBe('short');
      const topcoat = res.body.materials.find((m: any) => m.material.id === cat.topcoat);
      // 7.5 m² × 0.5 kg/m² = 3.75 kg → one 5 kg tin; none in stock. Supplier A's lead time is 3 days.
      expect(topcoat.shortfall).toMatchObject({
        quantity: '5',
        neededBy: inDays(jobDay - 3),
        leadTimeDays: 3,
        supplier: { id: cat.supplierA },
      });
      const order = shortfallToOrder('5', ['20', '5'], '0');
      expect(topcoat.shortfall.toOrder).toEqual({
        packs: order.packs.map((p) => ({ size: p.size.toString(), label: '5 kg tin', count: p.count })),
        total: order.total.toString(),
      });
      const list = await t.http().get(`/api/jobs?status=scheduled`).set(auth(estimator)).expect(200);
      expect(list.body.items.find((j: any) => j.id === job.id).materialState).toBe('short');
      const cal = await t
        .http()
        .get(`/api/jobs/calendar?from=${inDays(0)}&to=${inDays(30)}`)
        .set(auth(storeman))
        .expect(200);
      expect(cal.body.find((j: any) => j.id === job.id)).toMatchObject({
        materialState: 'short',
        scheduledOn: inDays(jobDay),
      });
      expect(cal.body.find((j: any) => j.id === job.id).shortfalls).toBeGreaterThan(0);
      await t
        .http()
        .get(`/api/jobs/calendar?from=${inDays(30)}&to=${inDays(0)}`)
        .set(auth(storeman))
        .expect(400);
    });

    it('running it again holds nothing twice', async () => {
      const again = await t.http().post(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
      expect(resin(again.body).held).toBe('15');
      expect(await held(lots.b)).toBe('8');
      expect(await held(lots.c)).toBe('7');
    });

    it('flags a reserved lot that would expire before the job date, and re-reserving replaces it', async () => {
      await t
        .http()
        .patch(`/api/jobs/${job.id}`)
        .set(auth(estimator))
        .send({ scheduledOn: inDays(jobDay + 25) })
        .expect(200);
      const flagged = await t.http().get(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
      const b = resin(flagged.body).reservations.find((x: any) => x.lot.id === lots.b);
      expect(b.flags.map((f: any) => f.code)).toEqual(['expires-before-job']);
      expect(b.flags[0].message).toContain(
        `expires on ${inDays(jobDay + 20)}, before the job date ${inDays(jobDay + 25)}`,
      );
      expect(flagged.body.flagged).toBe(1);
      const redone = await t.http().post(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
      expect(resin(redone.body).reservations.map((x: any) => [x.lot.batchNumber, x.heldQuantity])).toEqual([
        ['R-C', '7'],
        ['R-C', '8'],
      ]);
      expect(redone.body.flagged).toBe(0);
      expect(await held(lots.b)).toBe('0');
      // Back to the first date for the rest of the suite.
      await t
        .http()
        .patch(`/api/jobs/${job.id}`)
        .set(auth(estimator))
        .send({ scheduledOn: inDays(jobDay) })
        .expect(200);
    });

    it('does not give another job what one holds; releases on cancel; DELETE releases', async () => {
      const other = await readyJob(t, estimator, {
        customerId,
        buildUpId,
        scheduledOn: inDays(jobDay),
        status: 'won',
      });
      const res = await t.http().post(`/api/jobs/${other.id}/reservations`).set(auth(estimator)).expect(200);
      // 25 − 15 held by the first job leaves 10 of lot C; lot B (8) is free again; 15 needed.
      expect(resin(res.body).reservations.map((x: any) => [x.lot.batchNumber, x.heldQuantity])).toEqual([
        ['R-B', '8'],
        ['R-C', '7'],
      ]);
      expect(await held(lots.c)).toBe('22');
      const cancelled = await t
        .http()
        .post(`/api/jobs/${other.id}/status`)
        .set(auth(estimator))
        .send({ status: 'cancelled' })
        .expect(200);
      expect(cancelled.body.status).toBe('cancelled');
      expect(await held(lots.c)).toBe('15');
      expect(await held(lots.b)).toBe('0');
      const reason = await db.query(`SELECT DISTINCT release_reason FROM reservations WHERE job_id = $1`, [
        other.id,
      ]);
      expect(reason.rows).toEqual([{ release_reason: `Job ${other.reference} cancelled` }]);
      const third = await readyJob(t, estimator, {
        customerId,
        buildUpId,
        scheduledOn: inDays(jobDay),
        status: 'won',
      });
      await t.http().post(`/api/jobs/${third.id}/reservations`).set(auth(estimator)).expect(200);
      const released = await t
        .http()
        .delete(`/api/jobs/${third.id}/reservations`)
        .set(auth(owner))
        .expect(200);
      expect(resin(released.body)).toMatchObject({ held: '0', reservations: [] });
      expect(released.body.state).toBe('not-reserved');
    });

    it('refuses to accept another version while stock is held for this one', async () => {
      await t.http().post(`/api/jobs/${job.id}/estimates`).set(auth(estimator)).send({}).expect(201);
      const res = await t
        .http()
        .post(`/api/jobs/${job.id}/estimates/2/accept`)
        .set(auth(estimator))
        .expect(409);
      expect(res.body.message).toContain('Stock is reserved for estimate version 1');
    });

    describe('the pick list, issues and returns', () => {
      it('gives the storeman a pick list lot by lot with locations and cautions, and no prices', async () => {
        const res = await t.http().get(`/api/jobs/${job.id}/pick-list`).set(auth(storeman)).expect(200);
        const line = res.body.lines.find((l: any) => l.lot.id === lots.c);
        expect(line).toMatchObject({
          quantity: '7',
          places: [{ locationId: store, locationName: 'Main store', quantity: '25' }],
          unit: 'kg',
        });
        expect(res.body.unreserved.map((u: any) => u.material.id)).toContain(cat.topcoat);
        expect(res.body.cautions.map((c: any) => c.id)).toEqual([
          'work-at-height',
          'styrene-vapour',
          'catalyst',
          'flammable',
          'dust',
        ]);
        expect(JSON.stringify(res.body)).not.toMatch(/price|cost|87\.25/i);
        const pdf = await t
          .http()
          .get(`/api/jobs/${job.id}/pick-list.pdf`)
          .set(auth(storeman))
          .buffer(true)
          .parse(binary)
          .expect(200);
        expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
        await t.http().get(`/api/jobs/${job.id}/reconciliation`).set(auth(storeman)).expect(403);
      });

      it('issues partly, once per Idempotency-Key, consuming the job’s reservation', async () => {
        const body = { lines: [{ lotId: lots.c, quantity: '5' }], note: 'Van 2' };
        const first = await t
          .http()
          .post(`/api/jobs/${job.id}/issues`)
          .set(auth(storeman))
          .set('Idempotency-Key', 'issue-1')
          .send(body)
          .expect(201);
        expect(first.body.lines).toEqual([
          expect.objectContaining({
            lotId: lots.c,
            quantity: '5',
            locationId: store,
            locationName: 'Main store',
          }),
        ]);
        const retry = await t
          .http()
          .post(`/api/jobs/${job.id}/issues`)
          .set(auth(storeman))
          .set('Idempotency-Key', 'issue-1')
          .send(body)
          .expect(201);
        expect(retry.body).toEqual(first.body);
        const moved = await db.query(
          `SELECT count(*)::int AS n, sum(quantity)::text AS q FROM stock_movements WHERE job_id = $1`,
          [job.id],
        );
        expect(moved.rows[0]).toEqual({ n: 1, q: '-5.000' });
        expect(
          (await db.query(`SELECT quantity::text AS q FROM lots WHERE id = $1`, [lots.c])).rows[0].q,
        ).toBe('20.000');
        const reused = await t
          .http()
          .post(`/api/jobs/${job.id}/issues`)
          .set(auth(storeman))
          .set('Idempotency-Key', 'issue-1')
          .send({ lines: [{ lotId: lots.c, quantity: '6' }] })
          .expect(422);
        expect(reused.body.code).toBe('idempotency_key_reused');
        const view = await t.http().get(`/api/jobs/${job.id}/reservations`).set(auth(estimator)).expect(200);
        expect(resin(view.body)).toMatchObject({ held: '10', issued: '5', outstanding: '0' });
        // The oldest hold on lot C (7) is used first: 5 issued, 2 still held; the next hold of 8 untouched.
        expect(
          resin(view.body).reservations.map((x: any) => [x.status, x.issuedQuantity, x.heldQuantity]),
        ).toEqual([
          ['held', '5', '2'],
          ['held', '0', '8'],
        ]);
      });

      it('never issues what another job holds', async () => {
        const other = await readyJob(t, estimator, {
          customerId,
          buildUpId,
          scheduledOn: inDays(jobDay),
          status: 'won',
        });
        // Lot C holds 20 with 10 held by the first job: 10 are free.
        const res = await t
          .http()
          .post(`/api/jobs/${other.id}/issues`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: lots.c, quantity: '12' }] })
          .expect(409);
        expect(res.body.message).toContain(
          `only 10 kg of Deck base resin, batch R-C may go to this job; 10 is reserved for ${job.reference}`,
        );
        const flagged = await t
          .http()
          .post(`/api/jobs/${other.id}/issues`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: lots.flagged, quantity: '1' }] })
          .expect(409);
        expect(flagged.body.message).toContain('check before use');
        await t
          .http()
          .post(`/api/jobs/${other.id}/issues`)
          .set(auth(estimator))
          .send({ lines: [{ lotId: lots.c, quantity: '1' }] })
          .expect(403);
      });

      it('takes back full packs and a weighed part-pack into the same lot; never more than went out', async () => {
        const matLot = await addLot(db, {
          companyId: owner.user.companyId,
          userId: owner.user.id,
          materialId: cat.mat,
          locationId: store,
          quantity: '60',
          expiresOn: null,
          unitCost: '3.9',
          batch: 'M-1',
        });
        await t
          .http()
          .post(`/api/jobs/${job.id}/issues`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: matLot, quantity: '60', fromLocationId: store }] })
          .expect(201);
        const back = await t
          .http()
          .post(`/api/jobs/${job.id}/returns`)
          .set(auth(storeman))
          .set('Idempotency-Key', 'return-1')
          .send({
            lines: [
              { lotId: matLot, fullPacks: 1, partQuantity: '4.2' },
              { lotId: lots.c, partQuantity: '1.35' },
            ],
          })
          .expect(201);
        // One 30 kg roll (the material's only pack) and 4.2 kg weighed back; 1.35 kg of resin.
        expect(back.body.lines.map((l: any) => [l.lotId, l.quantity, l.fullPacks, l.partQuantity])).toEqual([
          [matLot, '34.2', 1, '4.2'],
          [lots.c, '1.35', 0, '1.35'],
        ]);
        expect(
          (await db.query(`SELECT quantity::text AS q FROM lots WHERE id = $1`, [matLot])).rows[0].q,
        ).toBe('34.200');
        const notes = await db.query(
          `SELECT note FROM stock_movements WHERE job_id = $1 AND kind = 'return' ORDER BY quantity DESC`,
          [job.id],
        );
        expect(notes.rows[0].note).toBe('1 full pack of 30 kg; part-pack weighed back: 4.2 kg');
        const tooMuch = await t
          .http()
          .post(`/api/jobs/${job.id}/returns`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: lots.c, partQuantity: '4' }] })
          .expect(409);
        expect(tooMuch.body.code).toBe('return_exceeds_issue');
        const empty = await t
          .http()
          .post(`/api/jobs/${job.id}/returns`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: lots.c }] })
          .expect(400);
        expect(empty.body.message).toContain('lines.0: give fullPacks or partQuantity');
        const unknownPack = await t
          .http()
          .post(`/api/jobs/${job.id}/returns`)
          .set(auth(storeman))
          .send({ lines: [{ lotId: lots.c, fullPacks: 1 }] })
          .expect(400);
        expect(unknownPack.body.message).toContain(
          'lines.0.fullPacks: the pack size of this lot is not known',
        );
      });

      it('another company gets 404 for the job’s reservations, pick list, issues, returns and reconciliation, and for its lots', async () => {
        const other = await registerCompany(t, 'Nosy Roofing');
        for (const path of ['reservations', 'pick-list', 'pick-list.pdf', 'reconciliation']) {
          await t.http().get(`/api/jobs/${job.id}/${path}`).set(auth(other)).expect(404);
        }
        await t.http().post(`/api/jobs/${job.id}/reservations`).set(auth(other)).expect(404);
        await t.http().delete(`/api/jobs/${job.id}/reservations`).set(auth(other)).expect(404);
        await t.http().post(`/api/jobs/${job.id}/issues`).set(auth(other)).send({ lines: [{ lotId: lots.c, quantity: '1' }] }).expect(404);
        await t.http().post(`/api/jobs/${job.id}/returns`).set(auth(other)).send({ lines: [{ lotId: lots.c, partQuantity: '1' }] }).expect(404);
        const theirs = await readyJob(t, other, {
          customerId: await createCustomer(t, other),
          buildUpId: await createBuildUp(t, other),
          scheduledOn: inDays(jobDay),
          status: 'won',
        });
        const res = await t.http().post(`/api/jobs/${theirs.id}/issues`).set(auth(other)).send({ lines: [{ lotId: lots.c, quantity: '1' }] }).expect(404);
        expect(res.body.message).toBe('Lot not found');
        expect((await held(lots.c)).toString()).toBe('10');
      });

      it('reconciles estimated against issued, returned and used, with the margin', async () => {
        const res = await t.http().get(`/api/jobs/${job.id}/reconciliation`).set(auth(owner)).expect(200);
        const r = res.body.materials.find((m: any) => m.material?.id === cat.resin);
        expect(r).toMatchObject({
          issued: '5',
          returned: '1.35',
          used: '3.65',
          estimatedPacks: '15',
          actualCost: '12.74',
        }); // 3.65 × 3.49 = 12.7385 → 12.74
        const mat = res.body.materials.find((m: any) => m.material?.id === cat.mat);
        expect(mat).toMatchObject({ issued: '60', returned: '34.2', used: '25.8', actualCost: '100.62' }); // 25.8 × 3.9
        expect(res.body.totals.actualMaterials).toBe('113.36');
        const est = job.estimate.price;
        expect(res.body.totals).toMatchObject({
          price: est.net,
          labour: est.labourCost,
          estimatedMaterials: est.materialCost,
        });
        // margin = price − actual materials − labour (GLOSSARY "margin")
        expect(res.body.totals.margin).toBe(
          new Decimal(est.net).minus('113.36').minus(est.labourCost).toFixed(2),
        );
      });
    });
  });

  it('50 estimators reserving the last drum at once: exactly one gets it, the rest see a shortfall', async () => {
    const boss = await registerCompany(t, 'Last Drum Roofing');
    const c = boss.user.companyId;
    const { rows } = await db.query<{ id: string }>(
      `INSERT INTO materials (company_id, code, name, kind, stock_unit, pack_sizes) VALUES ($1, 'RES-1', 'Resin', 'base-resin', 'kg', '[{"size":"25","label":"25 kg drum"}]') RETURNING id`,
      [c],
    );
    const location = await addLocation(db, c);
    const drum = await addLot(db, {
      companyId: c,
      userId: boss.user.id,
      materialId: rows[0]!.id,
      locationId: location,
      quantity: '25',
      expiresOn: inDays(200),
      batch: 'LAST',
    });
    const customer = await createCustomer(t, boss);
    const bu = await createBuildUp(t, boss);
    const jobs: string[] = [];
    for (let i = 0; i < 5; i++) {
      const batch = await Promise.all(
        Array.from({ length: 10 }, () =>
          readyJob(t, boss, {
            customerId: customer,
            buildUpId: bu,
            scheduledOn: inDays(10),
            roof: SMALL_ROOF,
            status: 'won',
          }),
        ),
      );
      jobs.push(...batch.map((j) => j.id));
    }
    const results = await Promise.all(
      jobs.map((id) => t.http().post(`/api/jobs/${id}/reservations`).set(auth(boss))),
    );
    expect(results.map((r) => r.status)).toEqual(jobs.map(() => 200));
    const holders = results.filter((r) => r.body.materials[0].held === '25');
    const short = results.filter(
      (r) => r.body.materials[0].shortfall?.quantity === '25' && r.body.materials[0].held === '0',
    );
    expect(holders).toHaveLength(1);
    expect(short).toHaveLength(49);
    const total = await db.query(
      `SELECT sum(quantity)::text AS q, count(*)::int AS n FROM reservations WHERE lot_id = $1 AND status = 'held'`,
      [drum],
    );
    expect(total.rows[0]).toEqual({ q: '25.000', n: 1 });
  });
});

function binary(res: any, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}
