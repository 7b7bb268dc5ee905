import { allocateFefo, Decimal, lotUsableOn } from '@potlife/domain';
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
} from './jobs-fixtures';

/**
 * The pick list for needs that were not reserved: the lots that could go to the job now, FEFO,
 * with the suggestion marked, and issuing from them. The numbers are worked by hand below; the
 * FEFO rule itself is the domain's tested allocateFefo (packages/domain/src/stock.test.ts), which
 * is first expired, first out as in general warehousing texts on stock rotation and, for resin
 * batches, "used oldest first, never after expiry" (TRADE.md: classification-society rules for
 * composite materials, e.g. Lloyd's Register Rules for Materials, ch. 14).
 */
describe('the pick list for unreserved needs', () => {
  let t: TestApp;
  let db: Client;
  let owner: Session;
  let estimator: Session;
  let storeman: Session;
  let cat: CatalogueIds;
  let store: string;
  let van: string;
  let job: { id: string; reference: string };
  let other: { id: string; reference: string };
  const jobDay = 14;
  const margin = 7;
  const lots = {} as Record<
    'held' | 'part' | 'twoPlaces' | 'quarantined' | 'flagged' | 'withinMargin' | 'beforeJob' | 'late',
    string
  >;

  beforeAll(async () => {
    t = await createTestApp();
    db = await dbClient(t);
    owner = await registerCompany(t, 'Unreserved Pick Roofing');
    estimator = await addUser(t, owner, 'estimator');
    storeman = await addUser(t, owner, 'storeman');
    cat = await seedTestCatalogue(db, owner.user.companyId);
    const customerId = await createCustomer(t, estimator);
    const buildUpId = await createBuildUp(t, owner);
    store = await addLocation(db, owner.user.companyId, 'Main store');
    van = await addLocation(db, owner.user.companyId, 'Van 1');
    await t
      .http()
      .patch('/api/settings/jobs')
      .set(auth(owner))
      .send({ reservationMarginDays: margin })
      .expect(200);
    const lot = (quantity: string, expiresIn: number, batch: string, more: Record<string, unknown> = {}) =>
      addLot(db, {
        companyId: owner.user.companyId,
        userId: owner.user.id,
        materialId: cat.resin,
        locationId: store,
        quantity,
        expiresOn: inDays(expiresIn),
        batch,
        ...more,
      });
    // Another job reserves first, while only these two lots are in: 15 kg (3 × 5 kg tins for the
    // small roof) FEFO = all 10 kg of U-HELD, then 5 kg of U-PART (allocateFefo, checked below).
    lots.held = await lot('10', jobDay + 20, 'U-HELD');
    lots.part = await lot('12', jobDay + 40, 'U-PART');
    other = await readyJob(t, estimator, {
      customerId,
      buildUpId,
      scheduledOn: inDays(jobDay),
      status: 'scheduled',
    });
    await t.http().post(`/api/jobs/${other.id}/reservations`).set(auth(estimator)).expect(200);
    // Then more stock arrives.
    lots.twoPlaces = await lot('4', jobDay + 16, 'U-TWO');
    lots.quarantined = await lot('25', jobDay + 10, 'U-Q', { status: 'quarantined' });
    lots.flagged = await lot('25', jobDay + 12, 'U-F', { exposureFlagged: true });
    lots.withinMargin = await lot('10', jobDay + 3, 'U-MARGIN');
    lots.beforeJob = await lot('10', jobDay - 1, 'U-OLD');
    lots.late = await lot('20', jobDay + 60, 'U-LATE');
    // 1 kg of U-TWO goes onto the van: the lot is then in two places (3 kg store, 1 kg van).
    await t
      .http()
      .post('/api/stock-movements')
      .set(auth(storeman))
      .send({
        kind: 'transfer',
        lotId: lots.twoPlaces,
        fromLocationId: store,
        toLocationId: van,
        quantity: '1',
      })
      .expect(201);
    // Our job is won and scheduled for the same day but never reserved: every need is unreserved.
    job = await readyJob(t, estimator, {
      customerId,
      buildUpId,
      scheduledOn: inDays(jobDay),
      status: 'scheduled',
    });
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const pickList = async () =>
    (await t.http().get(`/api/jobs/${job.id}/pick-list`).set(auth(storeman)).expect(200)).body;
  const resinNeed = (body: any) => body.unreserved.find((u: any) => u.material.id === cat.resin);

  it('the other job holds what allocateFefo gave it', async () => {
    const held: { lot_id: string; q: string }[] = (
      await db.query(
        `SELECT lot_id, sum(quantity - issued_quantity)::text AS q FROM reservations WHERE job_id = $1 AND material_id = $2 AND status = 'held' GROUP BY lot_id`,
        [other.id, cat.resin],
      )
    ).rows;
    // By hand: 15 kg FEFO from U-HELD (10 kg, earlier) then U-PART: 10 + 5.
    expect(Object.fromEntries(held.map((r) => [r.lot_id, new Decimal(r.q).toString()]))).toEqual({
      [lots.held]: '10',
      [lots.part]: '5',
    });
  });

  it('lists the lots that could go to the job now, FEFO, with free quantity, places and the suggestion', async () => {
    const body = await pickList();
    // Lots must be usable until the job date + the owner's 7-day margin.
    expect(body).toMatchObject({ useBy: inDays(jobDay + margin), marginDays: margin, lines: [] });
    const need = resinNeed(body);
    // Nothing reserved, nothing issued: the whole 15 kg is outstanding.
    expect(need.quantity).toBe('15');
    // By hand, lots in date on job day + 7 and usable, free = on hand − other jobs' holds:
    //   U-TWO  +16 d  4 kg, free 4     U-HELD +20 d  10 kg, free 0 (all held for the other job)
    //   U-PART +40 d 12 kg, free 7     U-LATE +60 d  20 kg, free 20
    // Left out: U-Q (quarantined), U-OLD (expires the day before the job). Passed over with why:
    // U-F (flagged), U-MARGIN (+3 d: in date on the job day, not on job day + 7), U-HELD.
    // FEFO for 15 kg: 4 of U-TWO, 7 of U-PART, 4 of U-LATE; nothing short.
    expect(need.candidates.map((c: any) => [c.lot.batchNumber, c.onHand, c.free, c.suggested])).toEqual([
      ['U-TWO', '4', '4', '4'],
      ['U-PART', '12', '7', '7'],
      ['U-LATE', '20', '20', '4'],
    ]);
    expect(need.short).toBe('0');
    // The same through the domain rule (no second implementation): the suggestion is allocateFefo's.
    const fefo = allocateFefo(
      [
        { id: lots.held, quantity: '0', expiresOn: inDays(jobDay + 20), usable: true },
        { id: lots.part, quantity: '7', expiresOn: inDays(jobDay + 40), usable: true },
        { id: lots.twoPlaces, quantity: '4', expiresOn: inDays(jobDay + 16), usable: true },
        { id: lots.quarantined, quantity: '25', expiresOn: inDays(jobDay + 10), usable: false },
        { id: lots.flagged, quantity: '25', expiresOn: inDays(jobDay + 12), usable: false },
        { id: lots.withinMargin, quantity: '10', expiresOn: inDays(jobDay + 3), usable: true },
        { id: lots.beforeJob, quantity: '10', expiresOn: inDays(jobDay - 1), usable: true },
        { id: lots.late, quantity: '20', expiresOn: inDays(jobDay + 60), usable: true },
      ],
      '15',
      inDays(jobDay + margin),
    );
    expect(
      need.candidates.filter((c: any) => c.suggested !== null).map((c: any) => [c.lot.id, c.suggested]),
    ).toEqual(fefo.allocations.map((a) => [a.lotId, a.quantity.toString()]));
    // The lot in two places says where each part is.
    expect(need.candidates[0].places).toEqual(
      expect.arrayContaining([
        { locationId: store, locationName: 'Main store', quantity: '3' },
        { locationId: van, locationName: 'Van 1', quantity: '1' },
      ]),
    );
    expect(need.candidates[0].places).toHaveLength(2);
    const ids = need.candidates.map((c: any) => c.lot.id);
    expect(ids).not.toContain(lots.quarantined);
    expect(ids).not.toContain(lots.beforeJob);
    expect(ids).not.toContain(lots.flagged);
    expect(ids).not.toContain(lots.held);
    // U-MARGIN is in date on the job day but not 7 days after (domain lotUsableOn).
    expect(lotUsableOn({ expiresOn: inDays(jobDay + 3), usable: true }, inDays(jobDay))).toBe(true);
    expect(lotUsableOn({ expiresOn: inDays(jobDay + 3), usable: true }, inDays(jobDay), margin)).toBe(false);
    expect(
      Object.fromEntries(
        need.passedOver.map((p: any) => [p.lot.batchNumber, p.flags.map((f: any) => f.code)]),
      ),
    ).toEqual({
      'U-F': ['exposure-flagged'],
      'U-MARGIN': ['expires-within-margin'],
      'U-HELD': ['held-for-other-jobs'],
    });
    const heldFor = need.passedOver.find((p: any) => p.lot.batchNumber === 'U-HELD');
    expect(heldFor.flags[0].message).toContain(other.reference);
    // A material with no stock at all: no candidates, all of it short.
    const topcoat = body.unreserved.find((u: any) => u.material.id === cat.topcoat);
    expect(topcoat).toMatchObject({ quantity: '5', candidates: [], short: '5', passedOver: [] });
  });

  it('issuing from a suggested lot works, once per key, and lowers the outstanding need', async () => {
    const key = `unreserved-${job.id}`;
    const send = () =>
      t
        .http()
        .post(`/api/jobs/${job.id}/issues`)
        .set(auth(storeman))
        .set('Idempotency-Key', key)
        .send({ lines: [{ lotId: lots.part, quantity: '7' }] });
    const first = await send().expect(201);
    expect(first.body.lines).toMatchObject([{ lotId: lots.part, quantity: '7', locationId: store }]);
    await send().expect(201);
    const body = await pickList();
    const need = resinNeed(body);
    // By hand: 15 − 7 issued = 8 kg outstanding. U-PART now has 5 kg, all held for the other job.
    expect(need.quantity).toBe('8');
    expect(need.candidates.map((c: any) => [c.lot.batchNumber, c.free, c.suggested])).toEqual([
      ['U-TWO', '4', '4'],
      ['U-LATE', '20', '4'],
    ]);
    expect(need.passedOver.map((p: any) => p.lot.batchNumber)).toContain('U-PART');
    expect(body.issued).toEqual([
      { material: { id: cat.resin, name: 'Deck base resin' }, unit: 'kg', issued: '7', returned: '0' },
    ]);
    const reservations = await t
      .http()
      .get(`/api/jobs/${job.id}/reservations`)
      .set(auth(storeman))
      .expect(200);
    expect(reservations.body.materials.find((m: any) => m.material.id === cat.resin)).toMatchObject({
      needed: '15',
      held: '0',
      issued: '7',
      outstanding: '8',
    });
    // Something went out but 8 kg is still neither held nor issued: the list says "not reserved"
    // (a reservation would look for it), not "issued".
    const list = await t.http().get(`/api/jobs`).set(auth(estimator)).expect(200);
    expect(list.body.items.find((j: any) => j.id === job.id).materialState).toBe('not-reserved');
  });

  it('a lot in two places needs its location; another job’s stock is refused with the reason', async () => {
    const noPlace = await t
      .http()
      .post(`/api/jobs/${job.id}/issues`)
      .set(auth(storeman))
      .send({ lines: [{ lotId: lots.twoPlaces, quantity: '1' }] })
      .expect(400);
    expect(noPlace.body.message).toMatch(/^lines\.0\.fromLocationId: .*several places/);
    await t
      .http()
      .post(`/api/jobs/${job.id}/issues`)
      .set(auth(storeman))
      .send({ lines: [{ lotId: lots.twoPlaces, quantity: '1', fromLocationId: van }] })
      .expect(201);
    const refused = await t
      .http()
      .post(`/api/jobs/${job.id}/issues`)
      .set(auth(storeman))
      .send({ lines: [{ lotId: lots.part, quantity: '1' }] })
      .expect(409);
    expect(refused.body).toMatchObject({ code: 'reserved_for_another_job' });
    expect(refused.body.message).toContain(other.reference);
    // 8 − 1 = 7 kg still outstanding; U-TWO has 3 kg left, all at the store.
    const need = resinNeed(await pickList());
    expect(need.quantity).toBe('7');
    expect(need.candidates[0]).toMatchObject({
      lot: { id: lots.twoPlaces },
      free: '3',
      suggested: '3',
      places: [{ locationId: store, locationName: 'Main store', quantity: '3' }],
    });
  });

  it('prints the pick list with the unreserved needs (its text: pick-list-pdf.spec.ts)', async () => {
    const pdf = await t
      .http()
      .get(`/api/jobs/${job.id}/pick-list.pdf`)
      .set(auth(storeman))
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(pdf.headers['content-type']).toContain('application/pdf');
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
  });
});
