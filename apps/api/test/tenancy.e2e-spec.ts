import { Client } from 'pg';
import { addUser, auth, createTestApp, registerCompany, TestApp } from './app';

describe('tenant isolation', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it("a second company sees none of the first's users, mail or records, and gets 404 for them", async () => {
    const first = await registerCompany(t, 'First Roofing');
    const firstStoreman = await addUser(t, first, 'storeman');
    const second = await registerCompany(t, 'Second Roofing');

    const list = await t.http().get('/api/users').set(auth(second)).expect(200);
    expect(list.body.map((u: { email: string }) => u.email)).toEqual([second.user.email]);
    expect(JSON.stringify(list.body)).not.toContain(first.user.email);

    const patch = await t.http().patch(`/api/users/${firstStoreman.user.id}`).set(auth(second)).send({ active: false }).expect(404);
    expect(patch.body).toEqual({ statusCode: 404, message: 'User not found', code: 'not_found' });
    await t.http().get('/api/auth/me').set(auth(firstStoreman)).expect(200);

    // A message the SMTP fake holds for the first company is invisible to the second.
    const c = new Client({ connectionString: t.databaseUrl });
    await c.connect();
    const { rows } = await c.query<{ id: string }>(
      `INSERT INTO mail_messages (company_id, message_id, from_address, to_address, subject, text) VALUES ($1, '<x@test>', 'a', 'b', 'Order', 'body') RETURNING id`,
      [first.user.companyId],
    );
    await c.end();
    const mine = await t.http().get('/api/mail/messages').set(auth(first)).expect(200);
    expect(mine.body).toHaveLength(1);
    expect((await t.http().get('/api/mail/messages').set(auth(second)).expect(200)).body).toEqual([]);
    await t.http().get(`/api/mail/messages/${rows[0]!.id}`).set(auth(second)).expect(404);
    await t.http().get(`/api/mail/messages/${rows[0]!.id}/attachments/0`).set(auth(second)).expect(404);
  });

  it('answers 404, not 500, for ids that are not ids', async () => {
    const owner = await registerCompany(t);
    await t.http().patch('/api/users/not-a-uuid').set(auth(owner)).send({ active: false }).expect(404);
    await t.http().get('/api/mail/messages/123').set(auth(owner)).expect(404);
  });
});
