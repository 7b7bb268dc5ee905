import { Client } from 'pg';
import { suitePrefix, templateName, withDb } from './global-setup';

/** Drops this run's template and any suite database a crashed suite left behind. */
export default async function globalTeardown(): Promise<void> {
  const run = process.env.POTLIFE_TEST_RUN;
  if (!run) {
    return;
  }
  const base = process.env.DATABASE_URL ?? 'postgres://potlife@127.0.0.1:54339/potlife';
  const admin = new Client({ connectionString: withDb(base, 'postgres') });
  await admin.connect();
  const { rows } = await admin.query<{ datname: string }>(
    `SELECT datname FROM pg_database WHERE datname = $1 OR starts_with(datname, $2)`,
    [templateName(run), suitePrefix(run)],
  );
  for (const { datname } of rows) {
    await admin.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
  }
  await admin.end();
}
