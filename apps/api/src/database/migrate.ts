import dataSource from './data-source';

/** `node dist/database/migrate.js`: runs pending migrations, each in its own transaction. */
async function main(): Promise<void> {
  await dataSource.initialize();
  const ran = await dataSource.runMigrations({ transaction: 'each' });
  console.log(ran.length ? `migrations applied: ${ran.map((m) => m.name).join(', ')}` : 'migrations: up to date');
  await dataSource.destroy();
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
