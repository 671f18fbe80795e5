import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { MainErrorFallback } from '@/components/errors/main-error-fallback';

/** The router's error element: a page that failed to load or render. */
export default function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}.`
    : error instanceof Error
      ? `${error.message}.`
      : undefined;
  return <MainErrorFallback message={message} />;
}
