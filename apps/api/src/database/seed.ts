import { DataSource } from 'typeorm';
import dataSource from './data-source';
import { seedCatalogue } from './seeds/catalogue';
import { seedDemoCompany } from './seeds/demo-company';
import { seedJobs } from './seeds/jobs';
import { seedStock } from './seeds/stock';

/**
 * The demo company and its data. Safe to run twice: every step looks for what it would create.
 * Add a step per bounded context (catalogue, stock, jobs…) after the company step.
 */
export async function seedDemo(ds: DataSource): Promise<void> {
  await ds.transaction(async (m) => {
    // One seed at a time, even if two processes start together.
    await m.query(`SELECT pg_advisory_xact_lock(7301)`);
    const ctx = await seedDemoCompany(m);
    await seedCatalogue(m, ctx);
    await seedStock(m, ctx);
    await seedJobs(m, ctx);
  });
}

if (require.main === module) {
  dataSource
    .initialize()
    .then(async (ds) => {
      await seedDemo(ds);
      await ds.destroy();
      console.log('demo data: ready');
    })
    .catch((err: unknown) => {
      console.error(err);
      process.exit(1);
    });
}
