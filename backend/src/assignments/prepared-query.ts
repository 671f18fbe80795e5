import type { DataSource } from 'typeorm';

interface PgPool {
  query<T>(config: { name: string; text: string; values: unknown[] }): Promise<{ rows: T[] }>;
}

/**
 * A read as a named (prepared) statement on TypeORM's own pg pool, for the hot list routes:
 * PostgreSQL parses it once per connection and, after a few runs, keeps its plan, where an
 * unnamed query (all `dataSource.query` sends) is parsed and planned on every request (half a
 * millisecond for the assignments list). Each distinct text needs its own name: pg refuses one
 * name for two texts. Reads only; nothing here takes part in a TypeORM transaction.
 */
export async function preparedQuery<T>(
  dataSource: DataSource,
  name: string,
  text: string,
  values: unknown[],
): Promise<T[]> {
  const pool = (dataSource.driver as unknown as { master: PgPool }).master;
  return (await pool.query<T>({ name, text, values })).rows;
}
