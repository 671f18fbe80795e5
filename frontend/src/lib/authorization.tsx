import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import { Loading } from '@/components/ui/loading';
import { useAuth, type UserRole } from './auth-store';

/**
 * Guards a group of routes: waits while the session is being restored, sends a signed-out
 * person to sign in (and back here afterwards), and a signed-in person of another role home.
 */
export function RequireRole({ roles, children }: { roles: readonly UserRole[]; children?: ReactNode }) {
  const auth = useAuth();
  const location = useLocation();
  if (auth.status === 'restoring') return <Loading label="Restoring your session…" />;
  if (auth.status === 'signed-out') {
    const here = `${location.pathname}${location.search}`;
    return <Navigate to={paths.auth.signIn.getHref(here)} replace />;
  }
  if (!roles.includes(auth.user.role)) return <Navigate to={homeFor(auth.user.role)} replace />;
  return children ?? <Outlet />;
}
