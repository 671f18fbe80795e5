import 'reflect-metadata';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { readDatabaseConfig } from '../config/database.config';
import type { DatabaseConfig } from '../config/config.type';
import { entities } from './entities';
import { migrations } from './migrations';

/**
 * TypeORM options shared by the Nest app, the CLI and the seed. `synchronize` stays off: the
 * schema changes only through migrations.
 */
export function dataSourceOptions(config: DatabaseConfig): DataSourceOptions {
  return {
    type: 'postgres',
    url: config.url,
    entities,
    migrations,
    migrationsTableName: 'migrations',
    synchronize: false,
    logging: ['error'],
    extra: { max: config.poolSize, connectionTimeoutMillis: 5000 },
  };
}

/** The DataSource the TypeORM CLI loads (`npm run typeorm -w backend -- migration:show`). */
export const AppDataSource = new DataSource(dataSourceOptions(readDatabaseConfig()));
export default AppDataSource;
