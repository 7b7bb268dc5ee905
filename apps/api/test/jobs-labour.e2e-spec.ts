import { Decimal } from '@potlife/domain';
import { Client } from 'pg';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';
import {
  createBuildUp,
  createCustomer,
  createJob,
  dbClient,
  inDays,
  readyJob,
  seedTestCatalogue,
  STANDARD_BUILD_UP,
} from './jobs-fixtures';

/**
 * The people of a job: hours the crew actually worked (and the reconciliation that uses them),
 * the estimator picker's list of people, and customers with their jobs.
 */
describe('labour, estimators and customers', () => {
  let t: TestApp;
  let db: Client;
  let owner: Session;
  let estimator: Session;
  let storeman: Session;
  let customerId: string;
  let buildUpId: string;

  beforeAll(async () => {
    t = await createTestApp();
    db = await dbClient(t);
    owner = await registerCompany(t, 'Labour Test Roofing');
    estimator = await addUser(t, owner, 'estimator');
    storeman = await addUser(t, owner, 'storeman');
    await seedTestCatalogue(db, owner.user.companyId);
    customerId = await createCustomer(t, estimator, 'Fernhill Bakery (test)');
    // A labour rate with pennies, so the rounding of recorded hours × rate shows.
    buildUpId = await createBuildUp(t, owner, { ...STANDARD_BUILD_UP, name: 'Pennies rate', labourRate: '31.55' });
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const status = (s: Session, jobId: string, to: string) =>
    t.http().post(`/api/jobs/${jobId}/status`).set(auth(s)).send({ status: to }).expect(200);

  describe('actual labour hours', () => {
    let job: { id: string; reference: string; estimate: any };

    beforeAll(async () => {
      job = await readyJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(-2), status: 'scheduled' });
    });

    it('refuses hours on a job that is not yet scheduled, with the reason (409)', async () => {
      const early = await createJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(3) });
      const res = await t
        .http()
        .post(`/api/jobs/${early.id}/labour`)
        .set(auth(estimator))
        .send({ workedOn: inDays(0), hours: '2', crewMember: 'Jonah Pell' })
        .expect(409);
      expect(res.body.code).toBe('labour_closed');
      expect(res.body.message).toBe(
        `Hours are recorded once a job is scheduled, until it is complete; ${early.reference} is enquiry`,
      );
      const sheet = await t.http().get(`/api/jobs/${early.id}/labour`).set(auth(estimator)).expect(200);
      expect(sheet.body).toMatchObject({ open: false, recordedHours: '0', estimatedHours: null, entries: [] });
    });

    it('while nothing is recorded the reconciliation uses the estimate’s labour and says so', async () => {
      const res = await t.http().get(`/api/jobs/${job.id}/reconciliation`).set(auth(owner)).expect(200);
      const price = job.estimate.price;
      expect(res.body.labour).toMatchObject({
        basis: 'estimate',
        estimatedHours: new Decimal(job.estimate.labour.totalHours).toString(),
        recordedHours: '0',
        entries: 0,
        rate: '31.55',
        estimatedCost: price.labourCost,
        recordedCost: null,
      });
      expect(res.body.totals).toMatchObject({ labour: price.labourCost, labourBasis: 'estimate' });
      // margin = price − actual materials (nothing issued: 0) − labour (GLOSSARY "margin")
      expect(res.body.totals.margin).toBe(new Decimal(price.net).minus(price.labourCost).toFixed(2));
    });

    it('bad hours and dates answer 400 naming the field', async () => {
      const post = (body: Record<string, unknown>) =>
        t.http().post(`/api/jobs/${job.id}/labour`).set(auth(estimator)).send(body).expect(400);
      const ok = { workedOn: inDays(-1), hours: '7.5', crewMember: 'Jonah Pell' };
      for (const hours of ['0', '-1', '24.01', '7.555', 'seven']) {
        expect((await post({ ...ok, hours })).body.message).toContain('hours:');
      }
      expect((await post({ ...ok, workedOn: '2026-02-30' })).body.message).toContain('workedOn:');
      const future = await post({ ...ok, workedOn: inDays(2) });
      expect(future.body.message).toBe('workedOn: hours are recorded for a day already worked, not a future date');
      expect((await post({ ...ok, crewMember: '   ' })).body.message).toContain('crewMember:');
    });

    it('the storeman reads the sheet (hours, no money) but cannot record or strike out', async () => {
      await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(storeman))
        .send({ workedOn: inDays(-1), hours: '1', crewMember: 'Rhys' })
        .expect(403);
      const sheet = await t.http().get(`/api/jobs/${job.id}/labour`).set(auth(storeman)).expect(200);
      expect(JSON.stringify(sheet.body)).not.toMatch(/cost|rate|price|margin/i);
    });

    it('records hours on a scheduled and an in-progress job; a mistake is struck out and kept', async () => {
      const first = await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(estimator))
        .send({ workedOn: inDays(-2), hours: '6.5', crewMember: 'Jonah Pell', note: 'Deck prep and first lay' })
        .expect(201);
      expect(first.body).toMatchObject({ open: true, recordedHours: '6.5', entries: [{ hours: '6.5', crewMember: 'Jonah Pell' }] });
      expect(first.body.entries[0].createdBy).toEqual({ id: estimator.user.id, name: estimator.user.name });
      await status(estimator, job.id, 'in-progress');
      await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(owner))
        .send({ workedOn: inDays(-1), hours: '2.33', crewMember: 'Bea Marr' })
        .expect(201);
      const wrong = await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(estimator))
        .send({ workedOn: inDays(-1), hours: '8', crewMember: 'jonah pell ' })
        .expect(201);
      expect(wrong.body.recordedHours).toBe('16.83'); // 6.5 + 2.33 + 8
      // One person typed two ways is one person on the sheet.
      expect(wrong.body.byCrewMember).toEqual([
        { crewMember: 'Bea Marr', hours: '2.33' },
        { crewMember: 'Jonah Pell', hours: '14.5' },
      ]);
      const mistake = wrong.body.entries.find((e: any) => e.hours === '8');
      const struck = await t
        .http()
        .delete(`/api/jobs/${job.id}/labour/${mistake.id}?reason=Booked twice`)
        .set(auth(owner))
        .expect(200);
      expect(struck.body.recordedHours).toBe('8.83'); // 6.5 + 2.33
      expect(struck.body.entries).toHaveLength(3);
      expect(struck.body.entries.find((e: any) => e.id === mistake.id).removed).toMatchObject({
        by: { id: owner.user.id, name: owner.user.name },
        reason: 'Booked twice',
      });
      const again = await t.http().delete(`/api/jobs/${job.id}/labour/${mistake.id}`).set(auth(owner)).expect(409);
      expect(again.body.message).toBe('This entry is already struck out');
      await t.http().delete(`/api/jobs/${job.id}/labour/${mistake.id}`).set(auth(storeman)).expect(403);
    });

    it('the reconciliation then uses the recorded hours at the estimate’s rate', async () => {
      const res = await t.http().get(`/api/jobs/${job.id}/reconciliation`).set(auth(estimator)).expect(200);
      expect(res.body.labour).toMatchObject({ basis: 'recorded', recordedHours: '8.83', entries: 2, rate: '31.55' });
      // 8.83 h × £31.55 = £278.5865 → £278.59 (to the penny, half up: worked by hand)
      expect(res.body.labour.recordedCost).toBe('278.59');
      expect(res.body.totals).toMatchObject({ labour: '278.59', labourBasis: 'recorded', actualMaterials: '0.00' });
      // margin = price − actual materials − labour = net − 0 − 278.59 (GLOSSARY "margin")
      expect(res.body.totals.margin).toBe(new Decimal(job.estimate.price.net).minus('278.59').toFixed(2));
    });

    it('a complete job still takes hours; an invoiced one is read only (409 with the reason)', async () => {
      await status(estimator, job.id, 'complete');
      await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(estimator))
        .send({ workedOn: inDays(0), hours: '1.25', crewMember: 'Bea Marr', note: 'Snagging' })
        .expect(201);
      await status(owner, job.id, 'invoiced');
      const res = await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(estimator))
        .send({ workedOn: inDays(0), hours: '1', crewMember: 'Bea Marr' })
        .expect(409);
      expect(res.body.message).toBe(`${job.reference} is invoiced: its hours are closed and can only be read`);
      const sheet = await t.http().get(`/api/jobs/${job.id}/labour`).set(auth(owner)).expect(200);
      expect(sheet.body).toMatchObject({ open: false, recordedHours: '10.08' }); // 6.5 + 2.33 + 1.25
      const entry = sheet.body.entries.find((e: any) => e.removed === null);
      await t.http().delete(`/api/jobs/${job.id}/labour/${entry.id}`).set(auth(owner)).expect(409);
    });

    it('another company, or an entry of another job, answers 404', async () => {
      const other = await registerCompany(t, 'Nosy Labour Roofing');
      await t.http().get(`/api/jobs/${job.id}/labour`).set(auth(other)).expect(404);
      await t
        .http()
        .post(`/api/jobs/${job.id}/labour`)
        .set(auth(other))
        .send({ workedOn: inDays(0), hours: '1', crewMember: 'X' })
        .expect(404);
      const sheet = await t.http().get(`/api/jobs/${job.id}/labour`).set(auth(owner)).expect(200);
      const entryId = sheet.body.entries[0].id;
      await t.http().delete(`/api/jobs/${job.id}/labour/${entryId}`).set(auth(other)).expect(404);
      const second = await readyJob(t, estimator, { customerId, buildUpId, scheduledOn: inDays(-1), status: 'scheduled' });
      const res = await t.http().delete(`/api/jobs/${second.id}/labour/${entryId}`).set(auth(owner)).expect(404);
      expect(res.body.message).toBe('Labour entry not found');
      await t.http().delete(`/api/jobs/${second.id}/labour/not-a-uuid`).set(auth(owner)).expect(404);
    });
  });

  describe('who can estimate', () => {
    it('every role reads the active owners and estimators: id, name and role, no e-mail', async () => {
      const leaver = await addUser(t, owner, 'estimator');
      await t.http().patch(`/api/users/${leaver.user.id}`).set(auth(owner)).send({ active: false }).expect(200);
      await registerCompany(t, 'Other Estimators Ltd');
      for (const s of [owner, estimator, storeman]) {
        const res = await t.http().get('/api/users/estimators').set(auth(s)).expect(200);
        expect(res.body).toEqual(
          [
            { id: owner.user.id, name: owner.user.name, role: 'owner' },
            { id: estimator.user.id, name: estimator.user.name, role: 'estimator' },
          ].sort((a, b) => a.name.toLowerCase().localeCompare(b.name.toLowerCase())),
        );
      }
    });

    it('a job takes any of them as its estimator, and shows who', async () => {
      const job = await t
        .http()
        .post('/api/jobs')
        .set(auth(owner))
        .send({ customerId, siteAddress: '2 Kiln Row, Hollowmere', substrate: 'osb', estimatorId: estimator.user.id })
        .expect(201);
      expect(job.body.estimator).toEqual({ id: estimator.user.id, name: estimator.user.name });
      const res = await t
        .http()
        .patch(`/api/jobs/${job.body.id}`)
        .set(auth(estimator))
        .send({ estimatorId: storeman.user.id })
        .expect(422);
      expect(res.body.message).toContain('estimatorId:');
    });
  });

  describe('customers', () => {
    it('sorts by name, newest or number of jobs, and searches', async () => {
      const boss = await registerCompany(t, 'Customer Sort Roofing');
      const a = await createCustomer(t, boss, 'Alder Court Flats');
      const b = await createCustomer(t, boss, 'birch lane dental');
      const c = await createCustomer(t, boss, 'Cedar Works');
      await createJob(t, boss, { customerId: c });
      await createJob(t, boss, { customerId: c });
      await createJob(t, boss, { customerId: b });
      const names = async (query: string) =>
        (await t.http().get(`/api/customers?${query}`).set(auth(boss)).expect(200)).body.items.map((x: any) => x.id);
      expect(await names('')).toEqual([a, b, c]);
      expect(await names('sort=-name')).toEqual([c, b, a]);
      expect(await names('sort=-createdAt')).toEqual([c, b, a]);
      expect(await names('sort=-jobCount')).toEqual([c, b, a]);
      expect(await names('sort=jobCount')).toEqual([a, b, c]);
      expect(await names('sort=jobCount&pageSize=1&page=2')).toEqual([b]);
      expect(await names('q=lane')).toEqual([b]);
      const bad = await t.http().get('/api/customers?sort=value').set(auth(boss)).expect(400);
      expect(bad.body.message).toContain('sort:');
    });

    it('edits a customer, and lists their jobs', async () => {
      const id = await createCustomer(t, estimator, 'Gorse Hill Garage');
      const res = await t
        .http()
        .patch(`/api/customers/${id}`)
        .set(auth(estimator))
        .send({ contactName: 'Ivo Penhale', phone: '01632 960 442', email: 'IVO@gorsehill.test', billingAddress: '9 Gorse Hill, Hollowmere' })
        .expect(200);
      expect(res.body).toMatchObject({ contactName: 'Ivo Penhale', email: 'ivo@gorsehill.test', billingAddress: '9 Gorse Hill, Hollowmere', jobCount: 0 });
      const job = await createJob(t, estimator, { customerId: id });
      const jobs = await t.http().get(`/api/jobs?customerId=${id}`).set(auth(estimator)).expect(200);
      expect(jobs.body.items.map((j: any) => j.id)).toEqual([job.id]);
      expect((await t.http().get(`/api/customers/${id}`).set(auth(estimator)).expect(200)).body.jobCount).toBe(1);
      const cleared = await t.http().patch(`/api/customers/${id}`).set(auth(estimator)).send({ phone: '' }).expect(200);
      expect(cleared.body.phone).toBeNull();
      await t.http().get(`/api/customers/${id}`).set(auth(storeman)).expect(403);
      const other = await registerCompany(t, 'Nosy Customer Roofing');
      await t.http().patch(`/api/customers/${id}`).set(auth(other)).send({ name: 'Mine' }).expect(404);
    });
  });
});
