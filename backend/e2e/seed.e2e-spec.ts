import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource, In } from 'typeorm';
import { readDatabaseConfig } from '../src/config/database.config';
import { dataSourceOptions } from '../src/database/data-source';
import { demoUsers } from '../src/database/seeds/demo-data';
import { seedDemo } from '../src/database/seeds/seed-demo';
import { User } from '../src/users/entities/user.entity';

describe('demo seed (e2e, real PostgreSQL)', () => {
  let dataSource: DataSource;

  beforeAll(async () => {
    dataSource = await new DataSource(dataSourceOptions(readDatabaseConfig())).initialize();
  });

  afterAll(async () => {
    await dataSource.query('DELETE FROM users WHERE email = ANY($1)', [demoUsers.map((user) => user.email)]);
    await dataSource.query('DELETE FROM studios');
    await dataSource.destroy();
  });

  it('should create the demo accounts once and keep them on a second run', async () => {
    const first = await seedDemo(dataSource);
    const second = await seedDemo(dataSource);
    expect(first.usersCreated + first.usersKept).toBe(demoUsers.length);
    expect(second).toEqual({ studios: 1, usersCreated: 0, usersKept: demoUsers.length });
    const emails = demoUsers.map((user) => user.email);
    expect(await dataSource.getRepository(User).countBy({ email: In(emails) })).toBe(demoUsers.length);
    const [{ count }] = await dataSource.query<{ count: number }[]>('SELECT count(*)::int AS count FROM studios');
    expect(count).toBe(1);
  });

  it('should keep a demo account that someone changed instead of overwriting it', async () => {
    const users = dataSource.getRepository(User);
    await users.update({ email: 'bram@saltmarsh-lane.test' }, { displayName: 'Bram Q.' });
    await seedDemo(dataSource);
    expect((await users.findOneByOrFail({ email: 'bram@saltmarsh-lane.test' })).displayName).toBe('Bram Q.');
  });

  it('should store only bcrypt hashes, never the demo password', async () => {
    const rows = await dataSource.query<{ password_hash: string }[]>('SELECT password_hash FROM users WHERE email = ANY($1)', [
      demoUsers.map((user) => user.email),
    ]);
    expect(rows.length).toBe(demoUsers.length);
    for (const row of rows) expect(row.password_hash).toMatch(/^\$2[aby]\$10\$/);
  });
});
