import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { ExpressAdapter } from '@nestjs/platform-express';
import { ExpressLoader } from '@nestjs/serve-static';
import express from 'express';
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { webAppServeOptions } from '../src/app.module';

/**
 * The built web app's caching: hashed /assets/ for a year, index.html and the SPA fallback
 * revalidated. The e2e app cannot show this: a testing module is compiled before its HTTP adapter
 * exists, so ServeStaticModule picks its no-op loader there. Here the app module's own options go
 * through the module's real Express loader instead.
 */
describe('static web app caching (e2e)', () => {
  let http: express.Express;
  let dist: string;

  beforeAll(async () => {
    // A stand-in build laid out as Vite writes one: index.html, hashed files under assets/.
    dist = await mkdtemp(join(tmpdir(), 'mixmark-dist-'));
    await mkdir(join(dist, 'assets'));
    await writeFile(join(dist, 'index.html'), '<!doctype html><title>Mixmark</title><div id="root"></div>');
    await writeFile(join(dist, 'assets', 'index-3f9a1c2b.js'), 'console.log("app");');
    await writeFile(join(dist, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
    http = express();
    http.get('/api/health', (_req, res) => {
      res.json({ status: 'ok' });
    });
    new ExpressLoader().register(new ExpressAdapter(http), { getGlobalPrefix: () => 'api' } as never, webAppServeOptions(dist));
  });
  afterAll(async () => {
    await rm(dist, { recursive: true, force: true });
  });

  it('should let browsers keep hashed files under /assets/ for a year', async () => {
    const response = await request(http).get('/assets/index-3f9a1c2b.js').expect(200);
    expect(response.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(response.text).toContain('console.log');
  });

  it('should revalidate index.html, the SPA fallback and unhashed files', async () => {
    for (const path of ['/', '/index.html', '/classes/some-class', '/favicon.svg']) {
      const response = await request(http).get(path).expect(200);
      expect({ path, cacheControl: response.headers['cache-control'] }).toEqual({ path, cacheControl: 'no-cache' });
    }
    const fallback = await request(http).get('/drills/new').expect(200);
    expect(fallback.text).toContain('<div id="root">');
  });

  it('should serve nothing when the web app is not built', () => {
    expect(webAppServeOptions(join(dist, 'missing'))).toEqual([]);
  });

  it('should leave API answers alone', async () => {
    const response = await request(http).get('/api/health');
    expect(response.headers['cache-control'] ?? '').not.toContain('immutable');
  });
});
