import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';
import { AxiosError, AxiosHeaders } from 'axios';
import { api, readBlobReply, refreshSession, toApiError } from './api-client';
import { authStore, type SessionUser } from './auth-store';

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

  it('should send again without a second refresh when another request already refreshed', async () => {
    signInAs('student');
    let refreshes = 0;
    server.use(
      http.post('*/api/auth/refresh', () => {
        refreshes += 1;
        return HttpResponse.json(newSession);
      }),
      http.get('*/api/classes', ({ request }) => {
        if (request.headers.get('authorization') === 'Bearer fresh-token') return HttpResponse.json([{ id: 'c1' }]);
        // While this request was on its way, another one refreshed the session.
        authStore.signIn('fresh-token', newSession.user as SessionUser);
        return HttpResponse.json({ statusCode: 401, code: 'unauthorized', message: 'Sign in first.' }, { status: 401 });
      }),
    );
    const reply = await api.get('/classes');
    expect(reply.data).toEqual([{ id: 'c1' }]);
    expect(refreshes).toBe(0);
  });

  it('should not refresh for a failed sign-in, and reject with the API’s error', async () => {
    let refreshes = 0;
    server.use(
      http.post('*/api/auth/refresh', () => {
        refreshes += 1;
        return HttpResponse.json(newSession);
      }),
      http.post('*/api/auth/sign-in', () =>
        HttpResponse.json({ statusCode: 401, code: 'invalid_credentials', message: 'Wrong e-mail or password.' }, { status: 401 }),
      ),
    );
    await expect(api.post('/auth/sign-in', { email: 'a@b.test', password: 'x' })).rejects.toMatchObject({
      message: 'Wrong e-mail or password.',
      apiError: { code: 'invalid_credentials' },
    });
    expect(refreshes).toBe(0);
  });

  it('should read a download\'s error reply (a Blob) back as the API\'s error', async () => {
    // Built by hand: msw cannot answer an XHR with a Blob under jsdom.
    const reply = { statusCode: 400, code: 'card_kind_unknown', message: 'There is no "rainbow" card.' };
    const error = new AxiosError('Request failed with status code 400', 'ERR_BAD_REQUEST', undefined, undefined, {
      status: 400,
      statusText: 'Bad Request',
      headers: {},
      config: { headers: new AxiosHeaders() },
      data: new Blob([JSON.stringify(reply)], { type: 'application/json' }),
    });
    await readBlobReply(error);
    expect(toApiError(error)).toEqual(reply);
    const notJson = new AxiosError('failed', 'ERR_BAD_RESPONSE', undefined, undefined, {
      status: 502, statusText: 'Bad Gateway', headers: {}, config: { headers: new AxiosHeaders() }, data: new Blob(['<html>'], { type: 'text/html' }),
    });
    await readBlobReply(notJson);
    expect(toApiError(notJson)).toMatchObject({ statusCode: 502, code: 'unexpected_reply' });
  });

  it('should report upload progress and put defined params in the query', async () => {
    let url = '';
    server.use(
      http.post('*/api/attempts', ({ request }) => {
        url = request.url;
        return HttpResponse.json({ id: 'a1' }, { status: 202 });
      }),
    );
    const body = new FormData();
    body.append('photo', new File([new Uint8Array(2048)], 'swatch.jpg', { type: 'image/jpeg' }));
    const seen: number[] = [];
    await api.post('/attempts', body, {
      params: { drillId: 'd1', classId: undefined },
      onUploadProgress: (event) => seen.push(event.loaded),
    });
    expect(new URL(url).search).toBe('?drillId=d1');
    expect(seen.length).toBeGreaterThan(0);
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
    document.cookie = 'mixmark_session=1; path=/';
    server.use(http.post('*/api/auth/refresh', () => HttpResponse.json(newSession)));
    await refreshSession();
    expect(authStore.get()).toMatchObject({ status: 'signed-in', accessToken: 'fresh-token' });
  });

  it('should not ask for a refresh without the session hint cookie, and be signed out', async () => {
    let refreshes = 0;
    server.use(
      http.post('*/api/auth/refresh', () => {
        refreshes += 1;
        return HttpResponse.json(newSession);
      }),
    );
    expect(await refreshSession()).toBeUndefined();
    expect(refreshes).toBe(0);
    expect(authStore.get().status).toBe('signed-out');
    // Another cookie whose name only ends the same way does not count.
    document.cookie = 'not_mixmark_session=1; path=/';
    await refreshSession();
    expect(refreshes).toBe(0);
  });
});
