import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';
import { api, refreshSession } from './api-client';
import { authStore } from './auth-store';

const newSession = {
  accessToken: 'fresh-token',
  expiresIn: 900,
  user: { id: 'u1', email: 'pip@example.test', displayName: 'Pip', role: 'student', createdAt: '2025-01-01T00:00:00Z' },
};

describe('api client', () => {
  it('should send the access token as a Bearer header', async () => {
    signInAs('student');
    let header: string | null = null;
    server.use(
      http.get('*/api/classes', ({ request }) => {
        header = request.headers.get('authorization');
        return HttpResponse.json([]);
      }),
    );
    await api.get('/classes');
    expect(header).toBe('Bearer test-access-token');
  });

  it('should refresh once on a 401 and send the request again with the new token', async () => {
    signInAs('student');
    let refreshes = 0;
    server.use(
      http.post('*/api/auth/refresh', () => {
        refreshes += 1;
        return HttpResponse.json(newSession);
      }),
      http.get('*/api/classes', ({ request }) =>
        request.headers.get('authorization') === 'Bearer fresh-token'
          ? HttpResponse.json([{ id: 'c1' }])
          : HttpResponse.json({ statusCode: 401, code: 'unauthorized', message: 'Sign in first.' }, { status: 401 }),
      ),
    );
    const [a, b] = await Promise.all([api.get('/classes'), api.get('/classes')]);
    expect(a.data).toEqual([{ id: 'c1' }]);
    expect(b.data).toEqual([{ id: 'c1' }]);
    expect(refreshes).toBe(1);
  });

  it('should sign out when the refresh fails', async () => {
    signInAs('student');
    server.use(
      http.post('*/api/auth/refresh', () =>
        HttpResponse.json({ statusCode: 401, code: 'session_expired', message: 'Your session has ended.' }, { status: 401 }),
      ),
      http.get('*/api/classes', () =>
        HttpResponse.json({ statusCode: 401, code: 'unauthorized', message: 'Sign in first.' }, { status: 401 }),
      ),
    );
    await expect(api.get('/classes')).rejects.toMatchObject({ apiError: { code: 'unauthorized' } });
    expect(authStore.get().status).toBe('signed-out');
  });

  it('should restore a session from the refresh cookie', async () => {
    server.use(http.post('*/api/auth/refresh', () => HttpResponse.json(newSession)));
    await refreshSession();
    expect(authStore.get()).toMatchObject({ status: 'signed-in', accessToken: 'fresh-token' });
  });
});
