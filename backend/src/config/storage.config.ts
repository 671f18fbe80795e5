import { existsSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { registerAs } from '@nestjs/config';
import { boolean, number, object, string } from 'yup';
import type { StorageConfig } from './config.type';
import { validateConfig } from './validate-config';

const schema = object({
  // Where photos live: a local folder (the default, and what `npm start` uses) or an
  // S3-compatible bucket.
  STORAGE_DRIVER: string().oneOf(['local', 's3'], 'STORAGE_DRIVER must be "local" or "s3"').default('local'),
  STORAGE_DIR: string().default('.data/photos'),
  S3_BUCKET: string()
    .trim()
    .when('STORAGE_DRIVER', { is: 's3', then: (s) => s.required('S3_BUCKET must be set when STORAGE_DRIVER is s3') }),
  S3_REGION: string().trim().default('us-east-1'),
  S3_ENDPOINT: string().trim().url('S3_ENDPOINT must be a URL such as http://127.0.0.1:9000').optional(),
  S3_FORCE_PATH_STYLE: boolean().default(false),
  S3_ACCESS_KEY_ID: string().trim().optional(),
  S3_SECRET_ACCESS_KEY: string()
    .trim()
    .when('S3_ACCESS_KEY_ID', { is: (v: unknown) => Boolean(v), then: (s) => s.required('S3_SECRET_ACCESS_KEY must be set with S3_ACCESS_KEY_ID') }),
  S3_PREFIX: string().trim().default(''),
  UPLOAD_MAX_BYTES: number().integer().min(1024).max(200 * 1024 * 1024).default(20 * 1024 * 1024),
  GRADING_IN_SERVER: boolean().default(true),
  GRADING_CONCURRENCY: number().integer().min(1).max(32).default(1),
  // libvips threads per image operation. 1 suits a server and workers that each run one photo's
  // work per core (threads inside one operation only compete with the other processes); 0 lets
  // libvips use one per core.
  IMAGE_THREADS: number().integer().min(0).max(64).default(1),
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
    driver: parsed.STORAGE_DRIVER as 'local' | 's3',
    s3: parsed.S3_BUCKET
      ? {
          bucket: parsed.S3_BUCKET,
          region: parsed.S3_REGION,
          endpoint: parsed.S3_ENDPOINT ?? null,
          forcePathStyle: parsed.S3_FORCE_PATH_STYLE,
          accessKeyId: parsed.S3_ACCESS_KEY_ID ?? null,
          secretAccessKey: parsed.S3_SECRET_ACCESS_KEY ?? null,
          prefix: parsed.S3_PREFIX,
        }
      : null,
    dir: isAbsolute(parsed.STORAGE_DIR) ? parsed.STORAGE_DIR : join(repoRoot(), parsed.STORAGE_DIR),
    uploadMaxBytes: parsed.UPLOAD_MAX_BYTES,
    gradingInServer: parsed.GRADING_IN_SERVER,
    gradingConcurrency: parsed.GRADING_CONCURRENCY,
    imageThreads: parsed.IMAGE_THREADS,
    gradingExpireSeconds: parsed.GRADING_EXPIRE_SECONDS,
    queueMaintenanceSeconds: parsed.QUEUE_MAINTENANCE_SECONDS,
  };
}

export default registerAs('storage', (): StorageConfig => readStorageConfig());
