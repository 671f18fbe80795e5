/**
 * The rows of a raw TypeORM query: it answers SELECT and INSERT … RETURNING with rows, UPDATE …
 * RETURNING with `[rows, count]`.
 */
export function rowsOf<T>(result: unknown): T[] {
  return (Array.isArray(result) && Array.isArray(result[0]) ? result[0] : result) as T[];
}
