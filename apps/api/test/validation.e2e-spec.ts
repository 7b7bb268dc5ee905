import { auth, createTestApp, registerCompany, Session, TestApp, uniqueEmail } from './app';

/**
 * Bad input on every body: missing, mistyped, overlong and unknown fields answer 400 naming the
 * field, never 500. Each body route lists a valid body and which fields are required.
 */
interface BodyRoute {
  method: 'post' | 'patch';
  path: (s: Session) => string;
  valid: () => Record<string, unknown>;
  required: string[];
  token: boolean;
}

const BODY_ROUTES: Record<string, BodyRoute> = {
  'POST /api/auth/register': {
    method: 'post',
    path: () => '/api/auth/register',
    valid: () => ({ companyName: 'Valid Ltd', name: 'Val', email: uniqueEmail(), password: 'long-enough-pw' }),
    required: ['companyName', 'name', 'email', 'password'],
    token: false,
  },
  'POST /api/auth/login': {
    method: 'post',
    path: () => '/api/auth/login',
    valid: () => ({ email: uniqueEmail(), password: 'whatever-password' }),
    required: ['email', 'password'],
    token: false,
  },
  'POST /api/auth/invitations/{token}/accept': {
    method: 'post',
    path: () => '/api/auth/invitations/some-token/accept',
    valid: () => ({ password: 'long-enough-pw' }),
    required: ['password'],
    token: false,
  },
  'POST /api/users/invitations': {
    method: 'post',
    path: () => '/api/users/invitations',
    valid: () => ({ email: uniqueEmail(), name: 'New Person', role: 'storeman' }),
    required: ['email', 'name', 'role'],
    token: true,
  },
  'PATCH /api/users/{id}': {
    method: 'patch',
    path: (s) => `/api/users/${s.user.id}`,
    valid: () => ({ role: 'owner', active: true }),
    required: [],
    token: true,
  },
};

describe('bad input on every body', () => {
  let t: TestApp;
  let owner: Session;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_MAX_FAILURES: '1000' });
    owner = await registerCompany(t);
  });
  afterAll(() => t.close());

  const cases = Object.entries(BODY_ROUTES).flatMap(([name, r]) => {
    const fields = Object.keys(r.valid());
    return [
      ...r.required.map((f) => [name, `missing ${f}`, f, (b: Record<string, unknown>) => { delete b[f]; }] as const),
      ...fields.map((f) => [name, `mistyped ${f}`, f, (b: Record<string, unknown>) => { b[f] = { nested: [1, 2] }; }] as const),
      ...fields.map((f) => [name, `overlong ${f}`, f, (b: Record<string, unknown>) => { b[f] = 'x'.repeat(5000); }] as const),
      [name, 'unknown field', 'surprise', (b: Record<string, unknown>) => { b.surprise = 1; }] as const,
    ];
  });

  it.each(cases)('%s: %s answers 400 naming the field', async (name, _what, field, spoil) => {
    const r = BODY_ROUTES[name]!;
    const body = r.valid();
    spoil(body);
    let req = t.http()[r.method](r.path(owner));
    if (r.token) {
      req = req.set(auth(owner));
    }
    const res = await req.send(body);
    expect(res.status).toBe(400);
    expect(res.body.message).toContain(`${field}:`);
    expect(res.body.code).toBe('validation_failed');
  });

  it('a body that is not JSON answers 400', async () => {
    const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.statusCode).toBe(400);
  });

  it('a body over the size limit answers 413, not 500', async () => {
    const res = await t.http().post('/api/auth/login').set('Content-Type', 'application/json').send(JSON.stringify({ email: 'x'.repeat(3_000_000) }));
    expect(res.status).toBe(413);
  });
});
