import { QueryClient } from '@tanstack/react-query';
import { http, HttpResponse } from 'msw';
import { createMemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { createRoutes } from './router';
import { getMyProgressQueryOptions } from '@/features/progress/api/get-my-progress';
import { server } from '@/testing/mocks/server';
import { signInAs } from '@/testing/test-utils';
import { authStore } from '@/lib/auth-store';
import { prefetchLoader } from '@/lib/route-loader';

const progress = { weeks: [], totals: { attempts: 0, graded: 0, passed: 0 }, streakDays: 0 };
const args = {
  params: {},
  request: new Request('http://localhost/student/progress'),
  context: undefined,
} as never;

function countRequests() {
  const seen = { count: 0 };
  server.use(
    http.get('*/api/progress/me', () => {
      seen.count += 1;
      return HttpResponse.json(progress);
    }),
  );
  return seen;
}

describe('prefetchLoader', () => {
  const loader = prefetchLoader(['student'], (queryClient) => [
    queryClient.ensureQueryData(getMyProgressQueryOptions()),
  ]);

  it('should fill the cache for a signed-in person of the route’s role', async () => {
    signInAs('student');
    const seen = countRequests();
    const queryClient = new QueryClient();
    await expect(loader(queryClient)(args)).resolves.toBeNull();
    expect(queryClient.getQueryData(getMyProgressQueryOptions().queryKey)).toEqual(progress);
    expect(seen.count).toBe(1);
  });

  it('should fetch nothing while the session is restored, when signed out, or for another role', async () => {
    const seen = countRequests();
    const queryClient = new QueryClient();
    await loader(queryClient)(args); // restoring
    authStore.signOut();
    await loader(queryClient)(args);
    signInAs('teacher');
    await loader(queryClient)(args);
    expect(seen.count).toBe(0);
  });

  it('should let the page show (and word the error itself) when the request fails', async () => {
    signInAs('student');
    server.use(
      http.get('*/api/progress/me', () =>
        HttpResponse.json(
          { statusCode: 500, code: 'internal_error', message: 'Boom.' },
          { status: 500 },
        ),
      ),
    );
    await expect(
      loader(new QueryClient({ defaultOptions: { queries: { retry: false } } }))(args),
    ).resolves.toBeNull();
  });
});

describe('the routes’ loaders', () => {
  it('should have the progress in the cache when a navigation to the progress page is done', async () => {
    signInAs('student');
    countRequests();
    server.use(http.get('*/api/assignments', () => HttpResponse.json([])));
    const queryClient = new QueryClient();
    const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: ['/student'] });
    await router.navigate('/student/progress');
    expect(router.state.location.pathname).toBe('/student/progress');
    expect(queryClient.getQueryData(getMyProgressQueryOptions().queryKey)).toEqual(progress);
    router.dispose();
  });
});
