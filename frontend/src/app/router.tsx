import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { paths } from '@/config/paths';
import RouteError from './routes/route-error';

/** Routes load their module lazily, so each page's code comes only when it is visited. */
export function createAppRouter() {
  return createBrowserRouter([
    {
      element: <AppLayout />,
      errorElement: <RouteError />,
      children: [
        { path: paths.home.path, lazy: async () => ({ Component: (await import('./routes/landing')).default }) },
        { path: paths.status.path, lazy: async () => ({ Component: (await import('./routes/status')).default }) },
        { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).default }) },
      ],
    },
  ]);
}

export function AppRouter() {
  return <RouterProvider router={createAppRouter()} />;
}
