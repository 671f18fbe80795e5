import { registerAs } from '@nestjs/config';
import { number, object, string } from 'yup';
import { validateConfig } from './validate-config';
import type { DatabaseConfig } from './config.type';

const schema = object({
  DATABASE_URL: string()
    .matches(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL')
    .default('postgres://postgres@127.0.0.1:54310/mixmark'),
  DATABASE_POOL_SIZE: number().integer().min(1).max(200).default(10),
  LIST_CACHE_MB: number().integer().min(0).max(4096).default(32),
});

/** Reads the database settings from the environment (also used by the TypeORM CLI). */
export function readDatabaseConfig(env = process.env): DatabaseConfig {
  const parsed = validateConfig(schema, env);
  return {
    url: parsed.DATABASE_URL,
    poolSize: parsed.DATABASE_POOL_SIZE,
    listCacheMb: parsed.LIST_CACHE_MB,
  };
}

export default registerAs('database', (): DatabaseConfig => readDatabaseConfig());
