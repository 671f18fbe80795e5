import { describe, expect, it, jest } from '@jest/globals';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { getDataSourceToken } from '@nestjs/typeorm';
import { HealthService } from './health.service';

async function serviceWith(query: () => Promise<unknown>) {
  const moduleRef = await Test.createTestingModule({
    providers: [
      HealthService,
      { provide: getDataSourceToken(), useValue: { query: jest.fn(query), migrations: [{}, {}] } },
      { provide: ConfigService, useValue: { getOrThrow: () => '9.9.9' } },
    ],
  }).compile();
  return moduleRef.get(HealthService);
}

describe('HealthService', () => {
  it('should count the migrations not yet applied', async () => {
    const service = await serviceWith(async () => [{ server_version: '15.18', applied: 1 }]);
    await expect(service.check()).resolves.toMatchObject({
      status: 'ok',
      version: '9.9.9',
      database: { up: true, serverVersion: '15.18', migrationsPending: 1 },
    });
  });

  it('should report the database down when the query fails', async () => {
    const service = await serviceWith(async () => {
      throw new Error('connect ECONNREFUSED 127.0.0.1:54310');
    });
    await expect(service.check()).resolves.toMatchObject({ status: 'degraded', database: { up: false, latencyMs: null } });
  });
});
