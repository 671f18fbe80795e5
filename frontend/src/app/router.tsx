import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { lazy, Suspense, useEffect, useState } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';
import { refreshSession } from '@/lib/api-client';
import { authStore } from '@/lib/auth-store';
import { Loading } from '@/components/ui/loading';
import { RequireRole } from '@/lib/authorization';
import type { RouteLoader } from '@/lib/route-loader';
import { NavigationProgress } from './navigation-progress';
import RouteError from './routes/route-error';

// The development outbox link loads on its own, after the page: it is never part of the
// first download (the sign-in route's size aim, `npm run bench:web -w frontend`).
const OutboxLink = lazy(() =>
  import('@/features/outbox/components/outbox-link').then((m) => ({ default: m.OutboxLink })),
);

type RouteModule = { default: React.ComponentType; loader?: RouteLoader };

/**
 * The app's routes. Each page's module loads only when it is visited; a module that exports a
 * `loader` (see `lib/route-loader.ts`) fills the query cache before the page shows.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  const lazyRoute = (path: string, load: () => Promise<RouteModule>): RouteObject => ({
    path,
    lazy: async () => {
      const module = await load();
      return module.loader
        ? { Component: module.default, loader: module.loader(queryClient) }
        : { Component: module.default };
    },
  });

  return [
    {
      element: (
        <>
          <NavigationProgress />
          <AppLayout
            footerLinks={
              <Suspense fallback={null}>
                <OutboxLink href={paths.devOutbox.getHref()} />
              </Suspense>
            }
          />
        </>
      ),
      errorElement: <RouteError />,
      // The first page load, while a page's code arrives (its loader does not wait then).
      hydrateFallbackElement: <Loading label="Opening Mixmark…" />,
      children: [
        lazyRoute(paths.home.path, () => import('./routes/landing')),
        lazyRoute(paths.status.path, () => import('./routes/status')),
        lazyRoute(paths.auth.signIn.path, () => import('./routes/auth/sign-in')),
        lazyRoute(paths.auth.register.path, () => import('./routes/auth/register')),
        lazyRoute(paths.auth.forgotPassword.path, () => import('./routes/auth/forgot-password')),
        lazyRoute(paths.auth.resetPassword.path, () => import('./routes/auth/reset-password')),
        lazyRoute(paths.invitation.path, () => import('./routes/invitation')),
        lazyRoute(paths.devOutbox.path, () => import('./routes/dev/outbox')),
        lazyRoute(paths.devOutbox.message.path, () => import('./routes/dev/outbox')),
        {
          element: <RequireRole roles={['student']} />,
          children: [
            lazyRoute(paths.student.assignments.path, () => import('./routes/student/assignments')),
            lazyRoute(paths.student.join.path, () => import('./routes/student/join')),
            lazyRoute(paths.student.library.path, () => import('./routes/student/library')),
            lazyRoute(paths.student.drill.path, () => import('./routes/student/drill')),
            lazyRoute(paths.student.history.path, () => import('./routes/student/history')),
            lazyRoute(paths.student.progress.path, () => import('./routes/student/progress')),
          ],
        },
        {
          element: <RequireRole roles={['student', 'teacher', 'admin']} />,
          children: [
            lazyRoute(paths.attempt.path, () => import('./routes/attempt')),
            lazyRoute(paths.palette.path, () => import('./routes/palette')),
            lazyRoute(paths.account.path, () => import('./routes/account')),
          ],
        },
        {
          element: <RequireRole roles={['teacher']} />,
          children: [
            lazyRoute(paths.teacher.dashboard.path, () => import('./routes/teacher/dashboard')),
            lazyRoute(paths.teacher.class.path, () => import('./routes/teacher/class')),
            lazyRoute(paths.teacher.gradebook.path, () => import('./routes/teacher/gradebook')),
            lazyRoute(
              paths.teacher.studentProgress.path,
              () => import('./routes/teacher/student-progress'),
            ),
            lazyRoute(paths.teacher.drills.path, () => import('./routes/teacher/drills')),
            lazyRoute(paths.teacher.newDrill.path, () => import('./routes/teacher/drill-editor')),
            lazyRoute(paths.teacher.editDrill.path, () => import('./routes/teacher/drill-editor')),
            lazyRoute(paths.teacher.assign.path, () => import('./routes/teacher/assign')),
            lazyRoute(paths.teacher.assignment.path, () => import('./routes/teacher/assignment')),
          ],
        },
        {
          element: <RequireRole roles={['admin']} />,
          children: [lazyRoute(paths.admin.users.path, () => import('./routes/admin/users'))],
        },
        lazyRoute('*', () => import('./routes/not-found')),
      ],
    },
  ];
}

/** On load, the refresh cookie (if any) brings the session back without a sign-in. */
function useRestoreSession() {
  useEffect(() => {
    if (authStore.get().status === 'restoring') void refreshSession();
  }, []);
}

export function AppRouter() {
  useRestoreSession();
  const queryClient = useQueryClient();
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
