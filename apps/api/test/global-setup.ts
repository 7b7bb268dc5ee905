import { Client } from 'pg';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from '../src/database/data-source';

/** Migrates a template database once; each e2e suite then gets its own copy of it (see app.ts). */
export default async function globalSetup(): Promise<void> {
  const base = process.env.DATABASE_URL ?? 'postgres://potlife@127.0.0.1:54339/potlife';
  const admin = new Client({ connectionString: withDb(base, 'postgres') });
  await admin.connect();
  const stale = await admin.query<{ datname: string }>(`SELECT datname FROM pg_database WHERE datname LIKE 'potlife_t_%' OR datname = 'potlife_template'`);
  for (const { datname } of stale.rows) {
    await admin.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
  }
  await admin.query(`CREATE DATABASE potlife_template`);
  await admin.end();
  const ds = new DataSource(dataSourceOptions(withDb(base, 'potlife_template')));
  await ds.initialize();
  await ds.runMigrations({ transaction: 'each' });
  await ds.destroy();
}

export function withDb(url: string, db: string): string {
  const u = new URL(url);
  u.pathname = `/${db}`;
  return u.toString();
}
