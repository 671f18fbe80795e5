import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';

describe('GET /api/health (e2e, real PostgreSQL)', () => {
  let app: INestApplication;

  beforeAll(async () => {
    app = await createTestApp();
  });

  afterAll(async () => {
    await app.close();
  });

  it('should report the database up, its version, and no pending migrations', async () => {
    const response = await request(app.getHttpServer()).get('/api/health').expect(200);
    expect(response.body).toMatchObject({ status: 'ok', database: { up: true, migrationsPending: 0 } });
    expect(response.body.database.serverVersion).toMatch(/^\d+\.\d+/);
    expect(response.body.database.latencyMs).toBeGreaterThanOrEqual(0);
  });

  it('should agree with the migrations table about what is applied', async () => {
    const dataSource = app.get(DataSource);
    const [{ count }] = await dataSource.query<{ count: number }[]>('SELECT count(*)::int AS count FROM migrations');
    expect(count).toBe(dataSource.migrations.length);
  });

  it('should send security headers from helmet', async () => {
    const response = await request(app.getHttpServer()).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('should answer an unknown API route with the one JSON error shape', async () => {
    const response = await request(app.getHttpServer()).get('/api/no-such-thing').expect(404);
    expect(response.body).toEqual({ statusCode: 404, code: 'not_found', message: 'Cannot GET /api/no-such-thing' });
  });

  it('should answer a malformed JSON body with a 400 in the same shape', async () => {
    const response = await request(app.getHttpServer())
      .post('/api/health')
      .set('content-type', 'application/json')
      .send('{"not json');
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ statusCode: 400, code: expect.any(String), message: expect.any(String) });
  });
});

describe('GET /api/docs (OpenAPI)', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('should describe every route of the API', async () => {
    const response = await request(app.getHttpServer()).get('/api/docs/openapi.json').expect(200);
    const paths = Object.keys(response.body.paths);
    for (const path of ['/api/auth/sign-in', '/api/classes', '/api/drills', '/api/assignments', '/api/attempts', '/api/classes/{id}/gradebook.csv', '/api/admin/users']) {
      expect(paths).toContain(path);
    }
    await request(app.getHttpServer()).get('/api/docs').expect(200);
  });
});
