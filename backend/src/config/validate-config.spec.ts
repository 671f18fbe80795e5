import { describe, expect, it } from '@jest/globals';
import { readDatabaseConfig } from './database.config';

describe('configuration', () => {
  it('should fall back to the start command database on 127.0.0.1 when nothing is set', () => {
    expect(readDatabaseConfig({})).toEqual({ url: 'postgres://postgres@127.0.0.1:54310/mixmark', poolSize: 10 });
  });

  it('should list every bad variable in one error', () => {
    expect(() => readDatabaseConfig({ DATABASE_URL: 'mysql://x', DATABASE_POOL_SIZE: 'lots' })).toThrow(
      /Invalid configuration:\n {2}- DATABASE_URL must be a postgres:\/\/ URL\n {2}- DATABASE_POOL_SIZE must be a `number` type/,
    );
  });
});
