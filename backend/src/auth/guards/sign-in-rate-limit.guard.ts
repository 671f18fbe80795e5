import { HttpException, HttpStatus, Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Request, Response } from 'express';
import { DataSource } from 'typeorm';
import type { AllConfigType } from '../../config/config.type';

const WINDOW_SECONDS = 60;

/**
 * Limits sign-in attempts per client address and per e-mail address, counted in PostgreSQL so
 * that every server process behind a load balancer shares the same counts (an in-memory limiter
 * would give each process its own allowance). One upsert per attempt, fixed one-minute windows.
 *
 * Why not @nestjs/throttler: its 6.x release is CommonJS and cannot be loaded beside NestJS 12
 * (ESM) by jest on Node 20, and it counts per process unless given a shared store.
 */
@Injectable()
export class SignInRateLimitGuard implements CanActivate {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request>();
    const auth = this.configService.getOrThrow('auth', { infer: true });
    const email = typeof request.body?.email === 'string' ? request.body.email.trim().toLowerCase() : '';
    const limits = new Map([[`sign-in:ip:${request.ip ?? 'unknown'}`, auth.signInIpLimitPerMinute]]);
    if (email) limits.set(`sign-in:email:${email}`, auth.signInLimitPerMinute);
    const keys = [...limits.keys()];
    const rows = await this.dataSource.query<{ key: string; hits: number; reset_in: number }[]>(
      `INSERT INTO rate_limits (key, window_start, hits)
         SELECT k, to_timestamp(floor(extract(epoch FROM now()) / $2) * $2), 1 FROM unnest($1::text[]) AS k
       ON CONFLICT (key, window_start) DO UPDATE SET hits = rate_limits.hits + 1
       RETURNING key, hits, ceil(extract(epoch FROM window_start + make_interval(secs => $2) - now()))::int AS reset_in`,
      [keys, WINDOW_SECONDS],
    );
    const over = rows.find((row) => row.hits > (limits.get(row.key) ?? Infinity));
    if (!over) return true;
    context.switchToHttp().getResponse<Response>().setHeader('retry-after', String(Math.max(1, over.reset_in)));
    throw new HttpException(
      { code: 'too_many_requests', message: 'Too many sign-in attempts. Wait a minute, then try again.' },
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}
