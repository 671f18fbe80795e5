import { useNavigate, useSearchParams } from 'react-router-dom';
import { homeFor } from '@/config/paths';
import type { SessionReply } from '@/lib/api-client';

/** Where to go once signed in: back where the person was sent from, else their role's start. */
export function useAfterSignIn() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const redirectTo = search.get('redirectTo');
  return {
    redirectTo: redirectTo?.startsWith('/') && !redirectTo.startsWith('//') ? redirectTo : undefined,
    go(session: SessionReply) {
      const target =
        redirectTo?.startsWith('/') && !redirectTo.startsWith('//') ? redirectTo : homeFor(session.user.role);
      navigate(target, { replace: true });
    },
  };
}
