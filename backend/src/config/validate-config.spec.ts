import { describe, expect, it } from '@jest/globals';
import { readDatabaseConfig } from './database.config';

describe('configuration', () => {
  it('should fall back to the start command database on 127.0.0.1 when nothing is set', () => {
    expect(readDatabaseConfig({})).toEqual({ url: 'postgres://postgres@127.0.0.1:54310/mixmark', poolSize: 10, listCacheMb: 32 });
  });

  it('should list every bad variable in one error', () => {
    expect(() => readDatabaseConfig({ DATABASE_URL: 'mysql://x', DATABASE_POOL_SIZE: 'lots' })).toThrow(
      /Invalid configuration:\n {2}- DATABASE_URL must be a postgres:\/\/ URL\n {2}- DATABASE_POOL_SIZE must be a `number` type/,
    );
  });

  it('should keep no assignment lists when LIST_CACHE_MB is 0, and refuse a negative size', () => {
    expect(readDatabaseConfig({ LIST_CACHE_MB: '0' }).listCacheMb).toBe(0);
    expect(() => readDatabaseConfig({ LIST_CACHE_MB: '-1' })).toThrow(/LIST_CACHE_MB must be greater than or equal to 0/);
  });
});
