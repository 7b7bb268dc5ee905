import { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { randomBytes } from 'node:crypto';
import { Client } from 'pg';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { suitePrefix, templateName, withDb } from './global-setup';

export interface TestApp {
  app: INestApplication;
  http: () => TestAgent;
  databaseUrl: string;
  close: () => Promise<void>;
}

/**
 * A whole API on its own database (a copy of the migrated template) and its own Redis prefix,
 * so suites never see each other's rows, queues or sign-in counters.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const base = process.env.DATABASE_URL ?? 'postgres://potlife@127.0.0.1:54339/potlife';
  const run = process.env.POTLIFE_TEST_RUN ?? 'norun';
  const name = `${suitePrefix(run)}${randomBytes(5).toString('hex')}`;
  const admin = new Client({ connectionString: withDb(base, 'postgres') });
  await admin.connect();
  await admin.query(`CREATE DATABASE "${name}" TEMPLATE ${templateName(run)}`);
  await admin.end();
  const databaseUrl = withDb(base, name);
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DATABASE_URL: databaseUrl,
    REDIS_URL: process.env.REDIS_URL ?? 'redis://127.0.0.1:6391',
    REDIS_PREFIX: `t-${name}`,
    JWT_SECRET: process.env.JWT_SECRET ?? 'a-test-secret-that-is-long-enough-to-pass',
    WEB_DIST_DIR: '/nonexistent',
    ...env,
  });
  // Import after the environment is set: modules read QUEUE_ROLE and the web folder at load.
  const { AppModule } = await import('../src/app.module');
  const { configureApp } = await import('../src/app.setup');
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = configureApp(moduleRef.createNestApplication({ logger: ['error'] }));
  await app.init();
  return {
    app,
    databaseUrl,
    http: () => request(app.getHttpServer()),
    close: async () => {
      await app.close();
      const c = new Client({ connectionString: withDb(base, 'postgres') });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await c.end();
    },
  };
}

let counter = 0;
/** A unique e-mail address per call, so factories never collide. */
export const uniqueEmail = (who = 'user') => `${who}.${Date.now().toString(36)}.${(counter++).toString(36)}@example.test`;

export interface Session {
  token: string;
  user: { id: string; email: string; name: string; role: string; companyId: string; companyName: string };
}

/** Registers a company; returns its owner's session. */
export async function registerCompany(t: TestApp, companyName = 'Test Roofing Ltd'): Promise<Session & { password: string }> {
  const password = 'correct-horse-battery';
  const res = await t.http().post('/api/auth/register').send({ companyName, name: 'Olive Owner', email: uniqueEmail('owner'), password }).expect(201);
  return { token: res.body.accessToken, user: res.body.user, password };
}

/** Adds a signed-in user with the role to the owner's company, through the invitation flow. */
export async function addUser(t: TestApp, owner: Session, role: 'owner' | 'estimator' | 'storeman'): Promise<Session> {
  const email = uniqueEmail(role);
  await t.http().post('/api/users/invitations').set('Authorization', `Bearer ${owner.token}`).send({ email, name: `A ${role}`, role }).expect(201);
  const token = await invitationToken(t, email);
  const res = await t.http().post(`/api/auth/invitations/${token}/accept`).send({ password: 'another-long-password' }).expect(200);
  return { token: res.body.accessToken, user: res.body.user };
}

/** Reads the invitation link from the queued mail (tests do not wait for SMTP for this). */
export async function invitationToken(t: TestApp, email: string): Promise<string> {
  const c = new Client({ connectionString: t.databaseUrl });
  await c.connect();
  try {
    const r = await c.query<{ text: string }>(`SELECT text FROM outgoing_mail WHERE to_address = $1 ORDER BY created_at DESC LIMIT 1`, [email]);
    const m = /\/invitation\/([\w-]+)/.exec(r.rows[0]?.text ?? '');
    if (!m) {
      throw new Error(`no invitation mail for ${email}`);
    }
    return m[1]!;
  } finally {
    await c.end();
  }
}

export const auth = (s: Session) => ({ Authorization: `Bearer ${s.token}` });
