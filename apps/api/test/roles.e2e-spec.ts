import { randomUUID } from 'node:crypto';
import { ROLES, Role } from '../src/common/roles';
import { addUser, auth, createTestApp, registerCompany, Session, TestApp } from './app';
import { ROUTE_ROLES } from './route-roles';

describe('role matrix over every route', () => {
  let t: TestApp;
  const sessions = {} as Record<Role, Session>;
  let routes: string[] = [];

  beforeAll(async () => {
    t = await createTestApp();
    const owner = await registerCompany(t);
    sessions.owner = owner;
    sessions.estimator = await addUser(t, owner, 'estimator');
    sessions.storeman = await addUser(t, owner, 'storeman');
    const doc = (await t.http().get('/api/docs-json').expect(200)).body as { paths: Record<string, Record<string, unknown>> };
    routes = Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m.toUpperCase()} ${p}`));
  });
  afterAll(() => t.close());

  it('the table names exactly the routes the API has', () => {
    expect([...routes].sort()).toEqual(Object.keys(ROUTE_ROLES).sort());
  });

  const concrete = (path: string) =>
    path.replace(/\{(\w+)\}/g, (_m, name: string) => (name === 'index' ? '0' : name === 'token' ? 'no-such-token' : randomUUID()));

  it.each(Object.entries(ROUTE_ROLES))('%s', async (route, allowed) => {
    const [method, path] = route.split(' ') as [string, string];
    const call = () => (t.http() as unknown as Record<string, (p: string) => import('supertest').Test>)[method.toLowerCase()]!(concrete(path));
    if (allowed === 'public') {
      const res = await call().send({});
      expect([401, 403]).not.toContain(res.status);
      return;
    }
    const anonymous = await call().send({});
    expect(anonymous.status).toBe(401);
    for (const role of ROLES) {
      const res = await call().set(auth(sessions[role])).send({});
      if (allowed.includes(role)) {
        expect([401, 403]).not.toContain(res.status);
      } else {
        expect(res.status).toBe(403);
        expect(res.body.message).toMatch(new RegExp(`needs an? (${allowed.join('|')})`));
      }
      expect(res.status).toBeLessThan(500);
    }
  });
});
