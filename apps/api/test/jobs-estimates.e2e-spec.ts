import {
  choosePacks,
  Decimal,
  estimateRoof,
  JOB_TRANSITIONS,
  priceEstimate,
  resolveBuildUp,
} from '@potlife/domain';
import { Client } from 'pg';
import { defaultRates, toDomainBuildUp } from '../src/build-ups/build-ups.service';
import { toDomainRoof } from '../src/jobs/roof/roof';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';
import {
  CatalogueIds,
  createBuildUp,
  createCustomer,
  createJob,
  dbClient,
  L_ROOF,
  seedTestCatalogue,
  STANDARD_BUILD_UP,
} from './jobs-fixtures';

describe('jobs, roofs, build-ups and estimates', () => {
  let t: TestApp;
  let db: Client;
  let owner: Session;
  let estimator: Session;
  let storeman: Session;
  let cat: CatalogueIds;
  let customerId: string;
  let buildUpId: string;

  beforeAll(async () => {
    t = await createTestApp();
    db = await dbClient(t);
    owner = await registerCompany(t, 'Tamsin Test Roofing');
    estimator = await addUser(t, owner, 'estimator');
    storeman = await addUser(t, owner, 'storeman');
    cat = await seedTestCatalogue(db, owner.user.companyId);
    customerId = await createCustomer(t, estimator);
    buildUpId = await createBuildUp(t, owner);
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  describe('customers', () => {
    it('creates, lists with a search, reads and edits a customer', async () => {
      const created = await t
        .http()
        .post('/api/customers')
        .set(auth(estimator))
        .send({ name: '  Quarry Row Flats (test) ', email: 'Manager@QuarryRow.test', phone: '01632 960 200' })
        .expect(201);
      expect(created.body).toMatchObject({
        name: 'Quarry Row Flats (test)',
        email: 'manager@quarryrow.test',
        jobCount: 0,
        contactName: null,
      });
      const list = await t.http().get('/api/customers?q=quarry').set(auth(owner)).expect(200);
      expect(list.body.items.map((c: { name: string }) => c.name)).toEqual(['Quarry Row Flats (test)']);
      expect(list.body.total).toBe(1);
      const edited = await t
        .http()
        .patch(`/api/customers/${created.body.id}`)
        .set(auth(estimator))
        .send({ contactName: 'Ada Hollis', phone: '' })
        .expect(200);
      expect(edited.body).toMatchObject({ contactName: 'Ada Hollis', phone: null });
      await t.http().get('/api/customers').set(auth(storeman)).expect(403);
    });
  });

  describe('build-ups', () => {
    it('keeps every rate of the costing engine, defaults from the domain, as decimal strings', async () => {
      const res = await t.http().get(`/api/build-ups/${buildUpId}`).set(auth(estimator)).expect(200);
      expect(res.body).toMatchObject({
        name: STANDARD_BUILD_UP.name,
        labourRate: '32.00',
        markupPct: '25',
        vatRatePct: '20',
        matGsm: '450',
        layers: '1',
      });
      expect(res.body.catalystBands[0]).toEqual({ fromC: '5', percent: '3' });
      expect(res.body.battenMPerEdgeM).toEqual({ drip: '2', kerb: '1', wall: '0', angle: '0' });
    });

    it('only the owner edits; rates the domain refuses answer 422 with its reason', async () => {
      await t
        .http()
        .post('/api/build-ups')
        .set(auth(estimator))
        .send({ ...STANDARD_BUILD_UP, name: 'Nope' })
        .expect(403);
      await t.http().get('/api/build-ups').set(auth(storeman)).expect(403);
      const bad = await t
        .http()
        .post('/api/build-ups')
        .set(auth(owner))
        .send({ ...STANDARD_BUILD_UP, name: 'Wide lap', lapM: '1.2' })
        .expect(422);
      expect(bad.body.message).toContain('lapM (1.2 m) must be narrower than rollWidthM (1 m)');
      const dup = await t.http().post('/api/build-ups').set(auth(owner)).send(STANDARD_BUILD_UP).expect(409);
      expect(dup.body.message).toContain('already a build-up called');
      const walkway = await t
        .http()
        .post('/api/build-ups')
        .set(auth(owner))
        .send({
          name: 'Walkway, two layers 450 g',
          layers: 2,
          labourHoursPerM2: '0.55',
          labourRate: '32',
          markupPct: '25',
          nailsPerEdgeM: { angle: 2 },
        })
        .expect(201);
      expect(walkway.body).toMatchObject({
        layers: '2',
        labourHoursPerM2: '0.55',
        nailsPerEdgeM: { drip: '5', kerb: '5', wall: '5', angle: '2' },
      });
      const patched = await t
        .http()
        .patch(`/api/build-ups/${walkway.body.id}`)
        .set(auth(owner))
        .send({ markupPct: '30', active: false })
        .expect(200);
      expect(patched.body).toMatchObject({ markupPct: '30', active: false, layers: '2' });
      const list = await t.http().get('/api/build-ups').set(auth(estimator)).expect(200);
      expect(list.body.map((b: { name: string }) => b.name)).not.toContain('Walkway, two layers 450 g');
    });
  });

  describe('jobs and their status machine', () => {
    it('creates a job with a reference, the caller as estimator, and history', async () => {
      const res = await t
        .http()
        .post('/api/jobs')
        .set(auth(estimator))
        .send({ customerId, siteAddress: '9 Mill Street, Hollowmere', substrate: 'osb', buildUpId })
        .expect(201);
      expect(res.body).toMatchObject({
        status: 'enquiry',
        nextStatuses: ['quoted', 'lost', 'cancelled'],
        title: 'Flat roof, 9 Mill Street',
        estimator: { id: estimator.user.id },
        buildUp: { id: buildUpId, name: STANDARD_BUILD_UP.name },
        hasRoof: false,
        materialState: 'no-estimate',
        value: null,
      });
      expect(res.body.reference).toMatch(/^J-\d{4}$/);
      expect(res.body.statusHistory).toEqual([expect.objectContaining({ from: null, to: 'enquiry' })]);
    });

    it('refuses a storeman as estimator, another company’s customer, and bad fields', async () => {
      const bad = await t
        .http()
        .post('/api/jobs')
        .set(auth(owner))
        .send({ customerId, siteAddress: 'x', substrate: 'osb', estimatorId: storeman.user.id })
        .expect(422);
      expect(bad.body.message).toContain('not a storeman');
      const other = await registerCompany(t, 'Elsewhere Roofing');
      const foreign = await createCustomer(t, other, 'Not yours');
      await t
        .http()
        .post('/api/jobs')
        .set(auth(owner))
        .send({ customerId: foreign, siteAddress: 'x', substrate: 'osb' })
        .expect(404);
      const sub = await t
        .http()
        .post('/api/jobs')
        .set(auth(owner))
        .send({ customerId, siteAddress: 'x', substrate: 'thatch' })
        .expect(400);
      expect(sub.body.message).toContain(
        'substrate: must be one of timber-deck, osb, existing-felt, asphalt, concrete, old-grp',
      );
      const date = await t
        .http()
        .post('/api/jobs')
        .set(auth(owner))
        .send({ customerId, siteAddress: 'x', substrate: 'osb', scheduledOn: '2026-02-30' })
        .expect(400);
      expect(date.body.message).toContain('scheduledOn: must be a date written YYYY-MM-DD');
    });

    it('refuses illegal moves with 409 naming from, to and the allowed next states', async () => {
      const job = await createJob(t, estimator, { customerId, buildUpId });
      const skip = await t
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(auth(estimator))
        .send({ status: 'won' })
        .expect(409);
      expect(skip.body).toMatchObject({ code: 'illegal_transition' });
      expect(skip.body.message).toBe(
        'A job cannot go from enquiry to won. From enquiry it may go to: quoted, lost, cancelled.',
      );
      const quote = await t
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(auth(estimator))
        .send({ status: 'quoted' })
        .expect(409);
      expect(quote.body.message).toContain('Accept an estimate');
      await t
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(auth(storeman))
        .send({ status: 'lost' })
        .expect(403);
      const lost = await t
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(auth(estimator))
        .send({ status: 'lost', reason: 'Went with a cheaper quote' })
        .expect(200);
      expect(lost.body).toMatchObject({ status: 'lost', nextStatuses: [] });
      expect(lost.body.statusHistory.at(-1)).toMatchObject({
        from: 'enquiry',
        to: 'lost',
        reason: 'Went with a cheaper quote',
        changedBy: { id: estimator.user.id },
      });
      const after = await t
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(auth(owner))
        .send({ status: 'quoted' })
        .expect(409);
      expect(after.body.message).toBe(
        'A job cannot go from lost to quoted. From lost it may go to: none: it is final.',
      );
      expect(JOB_TRANSITIONS.lost).toEqual([]);
    });
  });

  describe('the roof', () => {
    let jobId: string;
    beforeAll(async () => {
      jobId = (await createJob(t, estimator, { customerId, buildUpId })).id;
    });

    it('stores an L-shaped roof and gives deck, laminated area and fall checks from the domain', async () => {
      const res = await t.http().put(`/api/jobs/${jobId}/roof`).set(auth(estimator)).send(L_ROOF).expect(200);
      // 8 × 3 + 3 × 3 = 33 m² (arithmetic); upstands 5 × 0.2 + 3 × 0.15 (the build-up's default upstand)
      expect(res.body.summary).toMatchObject({
        deckAreaM2: '33',
        upstandAreaM2: '1.45',
        laminatedAreaM2: '34.45',
        trimM: '28',
        trimMByKind: { drip: '14', kerb: '6', wall: '8', angle: '0' },
        corners: { external: 3, internal: 1, derived: false },
        pipes: 2,
        outlets: 1,
      });
      // 60 mm over 3 m is 1:50: flatter than the 1:40 design fall, not flatter than 1:80 (BS 6229:2018)
      expect(res.body.summary.falls).toEqual([
        expect.objectContaining({ areaIndex: 0, ratio: '1:50', level: 'warning' }),
      ]);
      expect(res.body.summary.warnings[0]).toContain('Area 1 (“L roof”)');
      expect(res.body.roof.areas[0]).toEqual({
        name: 'L roof',
        shape: 'polygon',
        points: L_ROOF.areas[0]!.points,
        fall: { riseMm: '60', runM: '3' },
      });
      const read = await t.http().get(`/api/jobs/${jobId}/roof`).set(auth(storeman)).expect(200);
      expect(read.body.summary.laminatedAreaM2).toBe('34.45');
      const job = await t.http().get(`/api/jobs/${jobId}`).set(auth(storeman)).expect(200);
      expect(job.body.hasRoof).toBe(true);
    });

    it.each([
      [
        'a self-intersecting polygon',
        {
          name: 'Bow tie',
          shape: 'polygon',
          points: [
            ['0', '0'],
            ['4', '4'],
            ['4', '0'],
            ['0', '4'],
          ],
        },
        'Area 2 (“Bow tie”): Segments 1 and 3 of the polygon’s outline cross or touch',
      ],
      [
        'a polygon of zero area',
        {
          name: 'Flat line',
          shape: 'polygon',
          points: [
            [0, 0],
            [2, 0],
            [4, 0],
          ],
        },
        'Area 2 (“Flat line”): The polygon has zero area',
      ],
      [
        'a negative length',
        { name: 'Porch', shape: 'rectangle', lengthM: '-2', widthM: '1.5' },
        'Area 2 (“Porch”): lengthM of “Porch” must be more than zero (got -2).',
      ],
      [
        'a zero width',
        { name: 'Porch', shape: 'rectangle', lengthM: '2', widthM: 0 },
        'Area 2 (“Porch”): widthM of “Porch” must be more than zero (got 0).',
      ],
      [
        'a rectangle given points',
        {
          name: 'Porch',
          shape: 'rectangle',
          lengthM: '2',
          widthM: '1',
          points: [
            [0, 0],
            [1, 0],
            [1, 1],
          ],
        },
        'Area 2 (“Porch”) is a rectangle',
      ],
    ])('refuses %s with 422 pointing at the area', async (_what, area, message) => {
      const res = await t
        .http()
        .put(`/api/jobs/${jobId}/roof`)
        .set(auth(estimator))
        .send({ ...L_ROOF, areas: [L_ROOF.areas[0], area] })
        .expect(422);
      expect(res.body.code).toBe('invalid_roof');
      expect(res.body.message.replace(/'/g, '’')).toContain(message);
    });

    it('refuses bad edges naming the edge, and upstands on anything but a wall', async () => {
      const neg = await t
        .http()
        .put(`/api/jobs/${jobId}/roof`)
        .set(auth(estimator))
        .send({ ...L_ROOF, edges: [{ kind: 'drip', lengthM: '-1' }] })
        .expect(422);
      expect(neg.body.message).toContain('lengthM of edge 1 must not be negative');
      const up = await t
        .http()
        .put(`/api/jobs/${jobId}/roof`)
        .set(auth(estimator))
        .send({ ...L_ROOF, edges: [{ kind: 'kerb', lengthM: '2', upstandM: '0.2' }] })
        .expect(422);
      expect(up.body.message).toBe('Edge 1 is a kerb edge: only wall edges have an upstand.');
      const idx = await t
        .http()
        .put(`/api/jobs/${jobId}/roof`)
        .set(auth(estimator))
        .send({ ...L_ROOF, edges: [{ kind: 'kerb', lengthM: '2', areaIndex: 3 }] })
        .expect(422);
      expect(idx.body.message).toContain('Edge 1: areaIndex 3 is not an area');
      const shape = await t
        .http()
        .put(`/api/jobs/${jobId}/roof`)
        .set(auth(estimator))
        .send({ ...L_ROOF, areas: [{ name: 'A', shape: 'circle' }] })
        .expect(400);
      expect(shape.body.message).toContain('areas.0.shape: must be rectangle or polygon');
      await t.http().put(`/api/jobs/${jobId}/roof`).set(auth(storeman)).send(L_ROOF).expect(403);
      // The stored roof is unchanged by the refusals.
      const read = await t.http().get(`/api/jobs/${jobId}/roof`).set(auth(estimator)).expect(200);
      expect(read.body.summary.deckAreaM2).toBe('33');
    });
  });

  describe('estimates', () => {
    let jobId: string;
    let v1: any;
    beforeAll(async () => {
      jobId = (await createJob(t, estimator, { customerId, buildUpId })).id;
      await t.http().put(`/api/jobs/${jobId}/roof`).set(auth(estimator)).send(L_ROOF).expect(200);
    });

    it('numbers equal the costing engine’s for the same roof and build-up (no second implementation)', async () => {
      const res = await t
        .http()
        .post(`/api/jobs/${jobId}/estimates`)
        .set(auth(estimator))
        .send({ airC: '12' })
        .expect(201);
      v1 = res.body;
      const buildUp = (await t.http().get(`/api/build-ups/${buildUpId}`).set(auth(owner)).expect(200)).body;
      const roof = (await t.http().get(`/api/jobs/${jobId}/roof`).set(auth(owner)).expect(200)).body.roof;
      const domain = estimateRoof(
        toDomainRoof(roof, '12'),
        toDomainBuildUp({ ...defaultRates(), ...pickRates(buildUp) }),
      );
      expect(v1.version).toBe(1);
      expect(v1.deckAreaM2).toBe(domain.deckAreaM2.toString());
      expect(v1.laminatedAreaM2).toBe(domain.laminatedAreaM2.toString());
      expect(v1.catalystPercent).toBe(domain.catalystPercent.toString()); // 2.5 % at 12 °C from the build-up's bands
      expect(v1.labour.totalHours).toBe(domain.labour.totalHours.toString());
      expect(v1.lines.map((l: any) => [l.role, l.unit, l.quantity])).toEqual(
        domain.lines.map((l) => [l.role, l.unit, l.quantity.toString()]),
      );
      expect(v1.cautions.map((c: any) => c.id)).toEqual(domain.cautions.map((c) => c.id));

      // Packs by the domain's choosePacks over the material's pack sizes, in its stock unit.
      const resin = v1.materials.find((m: any) => m.material?.id === cat.resin);
      expect(resin.roles).toEqual(['base-resin', 'bandage-resin']);
      const resinKg = domain.lines
        .filter((l) => l.material === 'base-resin')
        .reduce((s, l) => s.plus(l.quantity), new Decimal(0));
      expect(resin.quantity).toBe(resinKg.toString());
      const chosen = choosePacks(resinKg, ['25', '5']);
      expect(resin.packs.map((p: any) => [p.size, p.count])).toEqual(
        chosen.packs.map((p) => [p.size.toString(), p.count]),
      );
      // The cheapest current price per drum: supplier B's 87.25 (A's 89.50, a future 70.00 not yet valid).
      expect(resin.packs.find((p: any) => p.size === '25')).toMatchObject({
        packPrice: '87.25',
        supplier: { id: cat.supplierB, leadTimeDays: 5 },
      });
      // Mat in kg: m² × 0.45 kg/m² (450 g/m², arithmetic).
      const mat = v1.materials.find((m: any) => m.material?.id === cat.mat);
      expect(mat.quantity).toBe(
        domain.lines
          .find((l) => l.role === 'mat')!
          .quantity.times('0.45')
          .toString(),
      );
      // Wall trim stocked in metres: lengths × 3 m.
      const wall = v1.materials.find((m: any) => m.material?.id === cat.wall);
      expect(wall.quantity).toBe(
        new Decimal(domain.lines.find((l) => l.role === 'trim:wall')!.lengths!).times(3).toString(),
      );

      // The price is the domain's priceEstimate over the packs and their prices.
      const price = priceEstimate(
        v1.materials.flatMap((m: any) =>
          m.packs.map((p: any) => ({ quantity: p.count, unitCost: p.packPrice })),
        ),
        domain.labour.totalHours,
        '32',
        '25',
        '20',
      );
      expect(v1.price).toEqual({
        materialCost: price.materialCost.toFixed(2),
        labourCost: price.labourCost.toFixed(2),
        markupPct: '25',
        markup: price.markup.toFixed(2),
        net: price.net.toFixed(2),
        vatRatePct: '20',
        vat: price.vat.toFixed(2),
        gross: price.gross.toFixed(2),
      });
      expect(v1.unpriced).toBe(0);
      expect(v1.problems).toEqual([]);
      expect(resolveBuildUp(toDomainBuildUp(defaultRates())).matGsm.toString()).toBe('450');
    });

    it('says “no price” on a material without one and leaves it out of the cost', async () => {
      const job = await createJob(t, estimator, { customerId, buildUpId });
      await t
        .http()
        .put(`/api/jobs/${job.id}/roof`)
        .set(auth(estimator))
        .send({
          areas: [{ name: 'Porch', shape: 'rectangle', lengthM: '2', widthM: '1.5' }],
          edges: [
            { kind: 'angle', lengthM: '2' },
            { kind: 'drip', lengthM: 2 },
          ],
        })
        .expect(200);
      const res = await t
        .http()
        .post(`/api/jobs/${job.id}/estimates`)
        .set(auth(estimator))
        .send({})
        .expect(201);
      const angle = res.body.materials.find((m: any) => m.material?.id === cat.angle);
      expect(angle).toMatchObject({ priced: false, cost: null });
      expect(angle.problem).toMatch(/^No price: no current supplier price for 3 m length of Angle trim 3 m/);
      expect(angle.packs[0]).toMatchObject({ packPrice: null, supplier: null, cost: null });
      expect(res.body.unpriced).toBe(1);
      expect(res.body.problems).toEqual([angle.problem]);
      const priced = res.body.materials.filter((m: any) => m.priced);
      const sum = priced.reduce((s: Decimal, m: any) => s.plus(m.cost), new Decimal(0));
      expect(res.body.price.materialCost).toBe(sum.toFixed(2));
    });

    it('says which material is missing when the catalogue has none for a role', async () => {
      const job = await createJob(t, estimator, { customerId, buildUpId, topcoatColour: 'Moss green' });
      await t
        .http()
        .put(`/api/jobs/${job.id}/roof`)
        .set(auth(estimator))
        .send({ areas: [{ name: 'Garage', shape: 'rectangle', lengthM: 3, widthM: 3 }], edges: [] })
        .expect(200);
      const res = await t
        .http()
        .post(`/api/jobs/${job.id}/estimates`)
        .set(auth(estimator))
        .send({})
        .expect(201);
      const topcoat = res.body.materials.find((m: any) => m.roles.includes('topcoat'));
      expect(topcoat).toMatchObject({ material: null, priced: false });
      expect(topcoat.problem).toContain('add a topcoat of the job’s colour');
    });

    it('keeps numbered versions, accepts one as the basis, and shows its value in the job list', async () => {
      const v2 = await t
        .http()
        .post(`/api/jobs/${jobId}/estimates`)
        .set(auth(owner))
        .send({ note: 'Re-run at 20 °C' })
        .expect(201);
      expect(v2.body.version).toBe(2);
      expect(v2.body.catalystPercent).toBe('2'); // 2 % at 20 °C (the default bands)
      const list = await t.http().get(`/api/jobs/${jobId}/estimates`).set(auth(estimator)).expect(200);
      expect(list.body.map((e: any) => [e.version, e.accepted])).toEqual([
        [2, false],
        [1, false],
      ]);
      const accepted = await t
        .http()
        .post(`/api/jobs/${jobId}/estimates/1/accept`)
        .set(auth(estimator))
        .expect(200);
      expect(accepted.body).toMatchObject({ version: 1, accepted: true });
      const again = await t.http().get(`/api/jobs/${jobId}/estimates/1`).set(auth(owner)).expect(200);
      expect(again.body).toEqual({ ...accepted.body });
      const job = await t.http().get(`/api/jobs/${jobId}`).set(auth(estimator)).expect(200);
      expect(job.body).toMatchObject({
        acceptedEstimate: { version: 1 },
        value: v1.price.net,
        materialState: 'not-reserved',
      });
      const forStoreman = await t.http().get(`/api/jobs/${jobId}`).set(auth(storeman)).expect(200);
      expect(forStoreman.body).not.toHaveProperty('value');
      expect(JSON.stringify(forStoreman.body)).not.toContain(v1.price.net);
      await t.http().get(`/api/jobs/${jobId}/estimates/1`).set(auth(storeman)).expect(403);
      await t.http().get(`/api/jobs/${jobId}/estimates/9`).set(auth(owner)).expect(404);
      await t.http().get(`/api/jobs/${jobId}/estimates/x`).set(auth(owner)).expect(404);
      // Now the job may be quoted.
      await t
        .http()
        .post(`/api/jobs/${jobId}/status`)
        .set(auth(estimator))
        .send({ status: 'quoted' })
        .expect(200);
    });

    it('lists, filters, sorts and pages jobs; a storeman cannot sort by value', async () => {
      const all = await t.http().get('/api/jobs?pageSize=2&sort=-value').set(auth(owner)).expect(200);
      expect(all.body.items).toHaveLength(2);
      expect(all.body.items[0].value).toBe(v1.price.net);
      expect(all.body.total).toBeGreaterThanOrEqual(5);
      const page2 = await t
        .http()
        .get('/api/jobs?pageSize=2&page=2&sort=-value')
        .set(auth(owner))
        .expect(200);
      expect(page2.body.page).toBe(2);
      const quoted = await t.http().get('/api/jobs?status=quoted').set(auth(storeman)).expect(200);
      expect(quoted.body.items.map((j: any) => j.id)).toEqual([jobId]);
      expect(quoted.body.items[0]).not.toHaveProperty('value');
      const several = await t
        .http()
        .get('/api/jobs?status=quoted,lost&sort=number')
        .set(auth(owner))
        .expect(200);
      expect(several.body.items.map((j: any) => j.status).sort()).toEqual(['lost', 'quoted']);
      const bad = await t.http().get('/api/jobs?status=finished').set(auth(owner)).expect(400);
      expect(bad.body.message).toContain('status: finished is not a job status');
      await t.http().get('/api/jobs?sort=-value').set(auth(storeman)).expect(400);
      const search = await t.http().get('/api/jobs?q=mill street').set(auth(owner)).expect(200);
      expect(search.body.items.every((j: any) => j.siteAddress.includes('Mill Street'))).toBe(true);
    });

    it('gives the customer a quote PDF with Manrope embedded', async () => {
      const res = await t
        .http()
        .get(`/api/jobs/${jobId}/estimates/1/quote.pdf`)
        .set(auth(estimator))
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      const pdf = (res.body as Buffer).toString('latin1');
      expect(pdf.startsWith('%PDF-')).toBe(true);
      expect(pdf).toContain('Manrope');
      await t.http().get(`/api/jobs/${jobId}/estimates/1/quote.pdf`).set(auth(storeman)).expect(403);
    });
  });

  it('the laying check: fit or not, the catalyst dose and a working time from the domain', async () => {
    const ok = await t
      .http()
      .post('/api/laying-check')
      .set(auth(storeman))
      .send({ airC: '18', surfaceC: '17', relativeHumidityPct: '60', raining: false })
      .expect(200);
    // Magnus formula (WMO-No. 8): dew point at 18 °C and 60 % RH ≈ 10.1 °C
    expect(ok.body).toMatchObject({
      ok: true,
      problems: [],
      dewPointC: '10.1',
      catalystPercent: '2',
      workingTime: { minMinutes: 15, maxMinutes: 25 },
    });
    expect(ok.body.cautions.map((c: any) => c.id)).toContain('catalyst');
    const cold = await t
      .http()
      .post('/api/laying-check')
      .set(auth(estimator))
      .send({ airC: 3, surfaceC: 2, relativeHumidityPct: 90, raining: true })
      .expect(200);
    expect(cold.body).toMatchObject({ ok: false, catalystPercent: null, workingTime: null });
    expect(cold.body.problems).toHaveLength(5); // rain, air, deck, dew point margin, humidity (common trade practice, no source)
    const bad = await t
      .http()
      .post('/api/laying-check')
      .set(auth(estimator))
      .send({ airC: '18', surfaceC: '17', relativeHumidityPct: '0', raining: false })
      .expect(400);
    expect(bad.body.message).toContain(
      'relativeHumidityPct: must be a decimal number more than 0 and at most 100',
    );
  });

  it('another company sees none of it: 404 for the job, its roof, estimates, customer and build-up', async () => {
    const other = await registerCompany(t, 'Second Test Roofing');
    const job = (await t.http().get('/api/jobs?status=quoted').set(auth(owner)).expect(200)).body.items[0];
    for (const path of [
      `/api/jobs/${job.id}`,
      `/api/jobs/${job.id}/roof`,
      `/api/jobs/${job.id}/estimates`,
      `/api/jobs/${job.id}/estimates/1`,
      `/api/customers/${customerId}`,
      `/api/build-ups/${buildUpId}`,
    ]) {
      await t.http().get(path).set(auth(other)).expect(404);
    }
    await t.http().patch(`/api/jobs/${job.id}`).set(auth(other)).send({ crew: 'x' }).expect(404);
    await t.http().post(`/api/jobs/${job.id}/estimates`).set(auth(other)).send({}).expect(404);
    await t.http().put(`/api/jobs/${job.id}/roof`).set(auth(other)).send(L_ROOF).expect(404);
    expect((await t.http().get('/api/jobs').set(auth(other)).expect(200)).body.total).toBe(0);
    expect((await t.http().get('/api/customers').set(auth(other)).expect(200)).body.total).toBe(0);
  });
});

/** The rate fields of a build-up response. */
function pickRates(b: Record<string, unknown>): Record<string, any> {
  const {
    id: _i,
    name: _n,
    description: _d,
    active: _a,
    labourRate: _l,
    markupPct: _m,
    vatRatePct: _v,
    createdAt: _c,
    updatedAt: _u,
    ...rates
  } = b;
  return rates;
}
