// Types for `throwaway-cluster.mjs`, for the TypeScript e2e tests.
export interface ThrowawayCluster {
  /** A new database with every migration applied; resolves to its URL. */
  migratedDatabase(name: string): Promise<string>;
  /** Stops the server (fast shutdown: open connections are cut). */
  stop(): Promise<void>;
  start(): Promise<void>;
  /** Stops the server and deletes its folder. */
  remove(): Promise<void>;
}

export function startThrowawayCluster(): Promise<ThrowawayCluster>;

/** A migrated database of the test's own on the shared e2e server; resolves to its URL. */
export function migratedTestDatabase(name: string): Promise<string>;
