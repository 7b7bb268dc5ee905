import 'reflect-metadata';
import path from 'node:path';
import { DataSource, DataSourceOptions } from 'typeorm';

/** Shared by the app, the migration runner, the seed and the tests. Never `synchronize`. */
export function dataSourceOptions(databaseUrl = process.env.DATABASE_URL): DataSourceOptions {
  return {
    type: 'postgres',
    url: databaseUrl ?? 'postgres://potlife@127.0.0.1:54329/potlife',
    entities: [path.join(__dirname, '../**/*.entity{.ts,.js}')],
    migrations: [path.join(__dirname, 'migrations/*{.ts,.js}')],
    migrationsTableName: 'migrations',
    synchronize: false,
    extra: { max: Number(process.env.PG_POOL_MAX ?? 20) },
  };
}

const dataSource = new DataSource(dataSourceOptions());
export default dataSource;
