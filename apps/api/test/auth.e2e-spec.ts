import { Client } from 'pg';
import { JwtService } from '@nestjs/jwt';
import { addUser, auth, createTestApp, invitationToken, registerCompany, TestApp, uniqueEmail } from './app';

describe('sign-in, registration and invitations', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_MAX_FAILURES: '5' });
  });
  afterAll(() => t.close());

  it('registers a company whose first user is its owner', async () => {
    const email = uniqueEmail();
    const res = await t.http().post('/api/auth/register').send({ companyName: 'Ash Lane Roofing', name: 'Ann', email, password: 'long-enough-pw' }).expect(201);
    expect(res.body.user).toMatchObject({ email, role: 'owner', companyName: 'Ash Lane Roofing' });
    expect(res.body.accessToken).toEqual(expect.any(String));
    expect(JSON.stringify(res.body)).not.toMatch(/password|scrypt/i);
    const me = await t.http().get('/api/auth/me').set('Authorization', `Bearer ${res.body.accessToken}`).expect(200);
    expect(me.body).toMatchObject({ email, role: 'owner' });
  });

  it('refuses a second registration with the same e-mail (any case)', async () => {
    const email = uniqueEmail();
    await t.http().post('/api/auth/register').send({ companyName: 'One Ltd', name: 'A', email, password: 'long-enough-pw' }).expect(201);
    const res = await t.http().post('/api/auth/register').send({ companyName: 'Two Ltd', name: 'B', email: email.toUpperCase(), password: 'long-enough-pw' }).expect(409);
    expect(res.body.message).toMatch(/already has a Potlife sign-in/);
  });

  it('refuses passwords shorter than 10 characters, naming the field', async () => {
    const res = await t.http().post('/api/auth/register').send({ companyName: 'Short Ltd', name: 'A', email: uniqueEmail(), password: 'short' }).expect(400);
    expect(res.body).toMatchObject({ statusCode: 400, code: 'validation_failed' });
    expect(res.body.message).toMatch(/password: must be at least 10 characters/);
  });

  it('signs in with the right password and answers 401 with a clear message otherwise', async () => {
    const owner = await registerCompany(t);
    const ok = await t.http().post('/api/auth/login').send({ email: owner.user.email, password: owner.password }).expect(200);
    expect(ok.body.user).toEqual({ id: owner.user.id, email: owner.user.email, name: 'Olive Owner', role: 'owner', companyId: owner.user.companyId, companyName: 'Test Roofing Ltd' });
    const bad = await t.http().post('/api/auth/login').send({ email: owner.user.email, password: 'wrong-password' }).expect(401);
    expect(bad.body.message).toBe('That e-mail address and password do not match a Potlife sign-in');
    const unknown = await t.http().post('/api/auth/login').send({ email: uniqueEmail(), password: 'whatever-it-is' }).expect(401);
    expect(unknown.body.message).toBe(bad.body.message);
  });

  it('throttles repeated failures with 429, even for the right password, until the window ends', async () => {
    const owner = await registerCompany(t);
    for (let i = 0; i < 5; i++) {
      await t.http().post('/api/auth/login').send({ email: owner.user.email, password: `wrong-${i}-password` }).expect(401);
    }
    const res = await t.http().post('/api/auth/login').send({ email: owner.user.email, password: owner.password }).expect(429);
    expect(res.body.message).toMatch(/Too many failed sign-ins/);
    // Another address from the same client is not affected.
    const other = await registerCompany(t);
    await t.http().post('/api/auth/login').send({ email: other.user.email, password: other.password }).expect(200);
  });

  it('answers 401 with an expiry message for an expired token, and 401 for a forged one', async () => {
    const owner = await registerCompany(t);
    const jwt = t.app.get(JwtService);
    const expired = await jwt.signAsync({ sub: owner.user.id, cid: owner.user.companyId, role: 'owner' }, { expiresIn: -10 });
    const r1 = await t.http().get('/api/auth/me').set('Authorization', `Bearer ${expired}`).expect(401);
    expect(r1.body.message).toBe('Your session has expired; please sign in again');
    const forged = new JwtService({ secret: 'some-other-secret-entirely-0123456789' }).sign({ sub: owner.user.id, cid: owner.user.companyId });
    await t.http().get('/api/auth/me').set('Authorization', `Bearer ${forged}`).expect(401);
    await t.http().get('/api/auth/me').expect(401);
  });

  it('invites by e-mail: the one-time link sets a password once, and signs the invitee in', async () => {
    const owner = await registerCompany(t);
    const email = uniqueEmail('invitee');
    const inv = await t.http().post('/api/users/invitations').set(auth(owner)).send({ email, name: 'Ivy Invitee', role: 'estimator' }).expect(201);
    expect(inv.body).toMatchObject({ email, status: 'invited', role: 'estimator' });
    const token = await invitationToken(t, email);
    const info = await t.http().get(`/api/auth/invitations/${token}`).expect(200);
    expect(info.body).toEqual({ email, name: 'Ivy Invitee', role: 'estimator', companyName: 'Test Roofing Ltd' });
    await t.http().post(`/api/auth/invitations/${token}/accept`).send({ password: 'short' }).expect(400);
    const accepted = await t.http().post(`/api/auth/invitations/${token}/accept`).send({ password: 'a-good-long-password' }).expect(200);
    expect(accepted.body.user).toMatchObject({ email, role: 'estimator', companyId: owner.user.companyId });
    await t.http().post(`/api/auth/invitations/${token}/accept`).send({ password: 'a-second-password' }).expect(404);
    await t.http().post('/api/auth/login').send({ email, password: 'a-good-long-password' }).expect(200);
  });

  it('refuses an invitation for an address that already signs in', async () => {
    const owner = await registerCompany(t);
    const res = await t.http().post('/api/users/invitations').set(auth(owner)).send({ email: owner.user.email, name: 'Again', role: 'storeman' }).expect(409);
    expect(res.body.message).toMatch(/already has a Potlife sign-in/);
  });

  it('an expired invitation link answers 404', async () => {
    const owner = await registerCompany(t);
    const email = uniqueEmail('late');
    await t.http().post('/api/users/invitations').set(auth(owner)).send({ email, name: 'Late', role: 'storeman' }).expect(201);
    const token = await invitationToken(t, email);
    const c = new Client({ connectionString: t.databaseUrl });
    await c.connect();
    await c.query(`UPDATE users SET invitation_expires_at = now() - interval '1 minute' WHERE email = $1`, [email]);
    await c.end();
    await t.http().get(`/api/auth/invitations/${token}`).expect(404);
  });

  it('deactivating a user ends their session and their sign-in; a company keeps one active owner', async () => {
    const owner = await registerCompany(t);
    const storeman = await addUser(t, owner, 'storeman');
    await t.http().get('/api/auth/me').set(auth(storeman)).expect(200);
    await t.http().patch(`/api/users/${storeman.user.id}`).set(auth(owner)).send({ active: false }).expect(200);
    await t.http().get('/api/auth/me').set(auth(storeman)).expect(401);
    const login = await t.http().post('/api/auth/login').send({ email: storeman.user.email, password: 'another-long-password' }).expect(401);
    expect(login.body.message).toMatch(/deactivated/);

    const last = await t.http().patch(`/api/users/${owner.user.id}`).set(auth(owner)).send({ role: 'estimator' }).expect(409);
    expect(last.body.message).toMatch(/at least one active owner/);
    const self = await t.http().patch(`/api/users/${owner.user.id}`).set(auth(owner)).send({ active: false }).expect(409);
    expect(self.body.message).toMatch(/at least one active owner/);

    const second = await addUser(t, owner, 'estimator');
    await t.http().patch(`/api/users/${second.user.id}`).set(auth(owner)).send({ role: 'owner' }).expect(200);
    await t.http().patch(`/api/users/${owner.user.id}`).set(auth(second)).send({ role: 'estimator' }).expect(200);
    // The demoted owner's token now carries the old role, but the role is read afresh on each request.
    await t.http().get('/api/users').set(auth(owner)).expect(403);
  });

  it('health is public and reports both servers', async () => {
    const res = await t.http().get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', database: 'up', redis: 'up' });
    expect(res.headers['x-request-id']).toEqual(expect.any(String));
  });

  it('serves the OpenAPI document', async () => {
    const res = await t.http().get('/api/docs-json').expect(200);
    expect(Object.keys(res.body.paths)).toEqual(expect.arrayContaining(['/api/auth/login', '/api/users']));
  });
});
