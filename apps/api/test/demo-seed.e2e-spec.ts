import { DataSource } from 'typeorm';
import { seedDemo } from '../src/database/seed';
import { createTestApp, TestApp } from './app';
import { sql } from './stock-fixtures';

/**
 * The whole demo, as `npm start` seeds it: a dozen jobs at every stage, the nearer scheduled jobs
 * holding all they need, the big walkway job short (it is there to show a shortfall), a job in
 * progress with stock out, a completed job with returns, hours booked by the crews. Safe to run twice.
 */
describe('demo seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
    await seedDemo(t.app.get(DataSource));
  });
  afterAll(() => t.close());

  it('has a dozen jobs at different stages, and a second run adds nothing', async () => {
    const before = await sql<{ status: string; n: number }>(
      t,
      `SELECT status, count(*)::int AS n FROM jobs GROUP BY status ORDER BY status`,
    );
    expect(before.reduce((s, r) => s + r.n, 0)).toBe(12);
    expect(before.map((r) => r.status)).toEqual([
      'cancelled',
      'complete',
      'enquiry',
      'in-progress',
      'invoiced',
      'lost',
      'quoted',
      'scheduled',
      'won',
    ]);
    await seedDemo(t.app.get(DataSource));
    const counts = `SELECT (SELECT count(*)::int FROM jobs) AS jobs, (SELECT count(*)::int FROM estimates) AS estimates,
                           (SELECT count(*)::int FROM reservations) AS reservations, (SELECT count(*)::int FROM stock_movements) AS movements,
                           (SELECT count(*)::int FROM job_labour_entries) AS labour`;
    const [again] = await sql<Record<string, number>>(t, counts);
    await seedDemo(t.app.get(DataSource));
    expect((await sql(t, counts))[0]).toEqual(again);
  });

  it('shows one scheduled job short of stock and the others holding all they need', async () => {
    const rows = await sql<{ title: string; short: number; held: number }>(
      t,
      `SELECT j.title,
              (SELECT count(*)::int FROM reservation_shortfalls s WHERE s.job_id = j.id) AS short,
              (SELECT count(*)::int FROM reservations r WHERE r.job_id = j.id AND r.status = 'held') AS held
         FROM jobs j WHERE j.status = 'scheduled' ORDER BY j.scheduled_on`,
    );
    expect(rows.filter((r) => r.short > 0).map((r) => r.title)).toEqual(['Hall walkway, Chapel Green']);
    const full = rows.filter((r) => r.short === 0);
    expect(full.length).toBeGreaterThanOrEqual(2);
    full.forEach((r) => expect(r.held).toBeGreaterThan(0));
  });

  it('has stock out on the job in progress and returns from the completed one', async () => {
    const [out] = await sql<{ issued: number; returned: number; inProgressShort: number }>(
      t,
      `SELECT (SELECT count(*)::int FROM stock_movements sm JOIN jobs j ON j.id = sm.job_id WHERE j.status = 'in-progress' AND sm.kind = 'issue') AS issued,
              (SELECT count(*)::int FROM stock_movements sm JOIN jobs j ON j.id = sm.job_id WHERE j.status = 'complete' AND sm.kind = 'return') AS returned,
              (SELECT count(*)::int FROM reservation_shortfalls s JOIN jobs j ON j.id = s.job_id WHERE j.status = 'in-progress') AS "inProgressShort"`,
    );
    expect(out!.issued).toBeGreaterThan(5);
    expect(out!.returned).toBeGreaterThanOrEqual(1);
    expect(out!.inProgressShort).toBe(0);
  });

  it('says so on screen: the job in progress has everything out, the bay window all reserved, the walkway short', async () => {
    const login = await t
      .http()
      .post('/api/auth/login')
      .send({ email: 'estimator@demo.test', password: 'potlife-demo' })
      .expect(200);
    const headers = { Authorization: `Bearer ${login.body.accessToken as string}` };
    const jobs = await t.http().get('/api/jobs?pageSize=50').set(headers).expect(200);
    const byTitle = (title: string) => jobs.body.items.find((j: { title: string }) => j.title === title);
    const states: Record<string, string> = {};
    for (const title of [
      'Workshop roof, Unit 2 Fenn Yard',
      'Bay window roof, 3 Orchard Rise',
      'Hall walkway, Chapel Green',
    ]) {
      const r = await t
        .http()
        .get(`/api/jobs/${byTitle(title).id as string}/reservations`)
        .set(headers)
        .expect(200);
      states[title] = `${byTitle(title).materialState as string}/${r.body.state as string}`;
    }
    expect(states).toEqual({
      'Workshop roof, Unit 2 Fenn Yard': 'issued/issued',
      'Bay window roof, 3 Orchard Rise': 'reserved/reserved',
      'Hall walkway, Chapel Green': 'short/short',
    });
  });

  it('has the hours the crews booked on the finished and started jobs', async () => {
    const rows = await sql<{ status: string; hours: string }>(
      t,
      `SELECT j.status, sum(l.hours)::text AS hours FROM job_labour_entries l JOIN jobs j ON j.id = l.job_id
        WHERE l.removed_at IS NULL GROUP BY j.status ORDER BY j.status`,
    );
    // the demo's own figures: 4.5 + 4.5 + 1.5 on the kitchen roof, 4 + 4 so far on the workshop, 4 on the summerhouse
    expect(rows).toEqual([
      { status: 'complete', hours: '10.50' },
      { status: 'in-progress', hours: '8.00' },
      { status: 'invoiced', hours: '4.00' },
    ]);
  });
});
