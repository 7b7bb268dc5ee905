import { randomBytes } from 'node:crypto';
import { Client } from 'pg';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from '../src/database/data-source';

/**
 * Migrates a template database once per jest run; each e2e suite then gets its own copy of it
 * (see app.ts). Names carry a run id, so two jest runs on one server never touch each other's
 * databases; the teardown drops this run's.
 */
export default async function globalSetup(): Promise<void> {
  const run = randomBytes(4).toString('hex');
  process.env.POTLIFE_TEST_RUN = run;
  const base = process.env.DATABASE_URL ?? 'postgres://potlife@127.0.0.1:54339/potlife';
  const admin = new Client({ connectionString: withDb(base, 'postgres') });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${templateName(run)}`);
  await admin.end();
  const ds = new DataSource(dataSourceOptions(withDb(base, templateName(run))));
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
}

export const templateName = (run: string) => `potlife_tpl_${run}`;
export const suitePrefix = (run: string) => `potlife_t_${run}_`;

export function withDb(url: string, db: string): string {
  const u = new URL(url);
  u.pathname = `/${db}`;
  return u.toString();
}
