import { existsSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { registerAs } from '@nestjs/config';
import { boolean, number, object, string } from 'yup';
import type { StorageConfig } from './config.type';
import { validateConfig } from './validate-config';

const schema = object({
  STORAGE_DIR: string().default('.data/photos'),
  UPLOAD_MAX_BYTES: number().integer().min(1024).max(200 * 1024 * 1024).default(20 * 1024 * 1024),
  GRADING_IN_SERVER: boolean().default(true),
  GRADING_CONCURRENCY: number().integer().min(1).max(32).default(1),
  // How long a grading job may stay active before pg-boss counts its worker as dead and retries it
  // (a 12 MP photo takes a few seconds; the default leaves room for a slow machine).
  GRADING_EXPIRE_SECONDS: number().integer().min(1).max(3600).default(300),
  // How often the queue looks for expired jobs (and archives finished ones).
  QUEUE_MAINTENANCE_SECONDS: number().integer().min(1).max(3600).default(120),
});

/** The repository root (nearest package.json with workspaces), for relative folders. */
function repoRoot(from = process.cwd()): string {
  let dir = resolve(from);
  for (;;) {
    if (existsSync(join(dir, 'package-lock.json')) && existsSync(join(dir, 'backend'))) return dir;
    const parent = dirname(dir);
    if (parent === dir) return resolve(from);
    dir = parent;
  }
}

export function readStorageConfig(env = process.env): StorageConfig {
  const parsed = validateConfig(schema, env);
  return {
    dir: isAbsolute(parsed.STORAGE_DIR) ? parsed.STORAGE_DIR : join(repoRoot(), parsed.STORAGE_DIR),
    uploadMaxBytes: parsed.UPLOAD_MAX_BYTES,
    gradingInServer: parsed.GRADING_IN_SERVER,
    gradingConcurrency: parsed.GRADING_CONCURRENCY,
    gradingExpireSeconds: parsed.GRADING_EXPIRE_SECONDS,
    queueMaintenanceSeconds: parsed.QUEUE_MAINTENANCE_SECONDS,
  };
}

export default registerAs('storage', (): StorageConfig => readStorageConfig());
