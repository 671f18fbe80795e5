import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Health } from '@mixmark/common';
import { DataSource } from 'typeorm';
import type { AllConfigType } from '../config/config.type';

const startedAt = Date.now();

@Injectable()
export class HealthService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  /** Asks the database a real question (its version and the migrations applied), with a time limit. */
  async check(): Promise<Health> {
    const version = this.configService.getOrThrow('app.version', { infer: true });
    const uptimeSeconds = Math.round((Date.now() - startedAt) / 1000);
    const started = process.hrtime.bigint();
    try {
      const [row] = await this.withTimeout(
        this.dataSource.query<{ server_version: string; applied: number }[]>(
          `SELECT current_setting('server_version') AS server_version,
                  (SELECT count(*)::int FROM migrations) AS applied`,
        ),
        2000,
      );
      const latencyMs = Number(process.hrtime.bigint() - started) / 1e6;
      return {
        status: 'ok',
        version,
        uptimeSeconds,
        database: {
          up: true,
          latencyMs: Math.round(latencyMs * 10) / 10,
          serverVersion: row.server_version,
          migrationsPending: Math.max(0, this.dataSource.migrations.length - row.applied),
        },
      };
    } catch {
      return {
        status: 'degraded',
        version,
        uptimeSeconds,
        database: { up: false, latencyMs: null, serverVersion: null, migrationsPending: null },
      };
    }
  }

  /** One indexed SELECT on the primary key of users. */
  async ping(): Promise<void> {
    await this.dataSource.query('SELECT 1 FROM users WHERE id = $1', ['00000000-0000-0000-0000-000000000000']);
  }

  private withTimeout<T>(promise: Promise<T>, ms: number): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`timed out after ${ms} ms`)), ms);
      promise.then(
        (value) => (clearTimeout(timer), resolve(value)),
        (error: unknown) => (clearTimeout(timer), reject(error)),
      );
    });
  }
}
