import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { registerAs } from '@nestjs/config';
import { number, object, string } from 'yup';
import { validateConfig } from './validate-config';
import type { AppConfig } from './config.type';

const schema = object({
  NODE_ENV: string().oneOf(['development', 'production', 'test']).default('development'),
  HOST: string().default('127.0.0.1'),
  PORT: number().integer().min(0).max(65535).default(4310),
  PUBLIC_URL: string().url().optional(),
  FRONTEND_DIST: string().optional(),
  LOG_LEVEL: string().oneOf(['error', 'warn', 'log', 'debug', 'verbose']).default('log'),
});

/** Finds the built web app: `frontend/dist` next to the backend, from wherever the server runs. */
function defaultFrontendDist(): string {
  const candidates = [resolve('frontend/dist'), resolve('../frontend/dist')];
  return candidates.find((dir) => existsSync(dir)) ?? candidates[1];
}

export default registerAs('app', (): AppConfig => {
  const env = validateConfig(schema, process.env);
  return {
    nodeEnv: env.NODE_ENV,
    host: env.HOST,
    port: env.PORT,
    publicUrl: env.PUBLIC_URL ?? `http://${env.HOST}:${env.PORT}`,
    frontendDist: env.FRONTEND_DIST ? resolve(env.FRONTEND_DIST) : defaultFrontendDist(),
    logLevel: env.LOG_LEVEL,
    version: process.env.npm_package_version ?? '0.1.0',
  };
});
