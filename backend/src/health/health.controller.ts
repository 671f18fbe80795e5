import { Controller, Get, Res } from '@nestjs/common';
import type { Health } from '@mixmark/common';
import type { Response } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { HealthService } from './health.service';

@Controller('health')
export class HealthController {
  constructor(private readonly healthService: HealthService) {}

  /** The cheapest database round trip (one indexed lookup): for readiness probes and as the API benchmark's floor. */
  @Public()
  @Get('db')
  async db(): Promise<{ up: true }> {
    await this.healthService.ping();
    return { up: true };
  }

  /** 200 when the database answers, 503 (same body) when it does not, for load balancers. */
  @Public()
  @Get()
  async check(@Res({ passthrough: true }) response: Response): Promise<Health> {
    const health = await this.healthService.check();
    response.status(health.database.up ? 200 : 503);
    return health;
  }
}
