import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { buildUrl, createHttpClient, HttpError } from './http-client';

describe('http client', () => {
  it('should put defined params in the query and leave the others out', () => {
    expect(buildUrl({ baseURL: '/api', url: '/attempts', params: { drillId: 'd1', studentId: undefined, archived: true } })).toBe(
      '/api/attempts?drillId=d1&archived=true',
    );
    expect(buildUrl({ baseURL: '/api', url: '/classes' })).toBe('/api/classes');
  });

  it('should send JSON, read JSON and lower-case the reply headers', async () => {
    let body: unknown;
    server.use(
      http.post('*/api/palette/paints', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ id: 'p1' }, { status: 201, headers: { 'X-Card-Id': 'abc' } });
      }),
    );
    const client = createHttpClient({ baseURL: 'http://localhost/api' });
    const reply = await client.post<{ id: string }>('/palette/paints', { name: 'Night blue' });
    expect(body).toEqual({ name: 'Night blue' });
    expect(reply).toMatchObject({ status: 201, data: { id: 'p1' } });
    expect(reply.headers['x-card-id']).toBe('abc');
  });

  it('should reject with the server’s reply unless validateStatus accepts it', async () => {
    server.use(http.get('*/api/health', () => HttpResponse.json({ status: 'degraded' }, { status: 503 })));
    const client = createHttpClient({ baseURL: 'http://localhost/api' });
    const error = await client.get('/health').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(HttpError);
    expect((error as HttpError).response).toMatchObject({ status: 503, data: { status: 'degraded' } });
    const accepted = await client.get('/health', { validateStatus: (s) => s === 503 });
    expect(accepted.data).toEqual({ status: 'degraded' });
  });
});
