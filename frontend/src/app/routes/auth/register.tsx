import Link from '@mui/material/Link';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { RegisterForm } from '@/features/auth/components/register-form';
import { useAfterSignIn } from './use-after-sign-in';

export default function RegisterRoute() {
  const after = useAfterSignIn();
  const [search] = useSearchParams();
  return (
    <AuthCard
      title="Create your account"
      intro="Teachers set drills and follow their classes; students and self-learners paint, photograph and get marked."
      footer={
        <>
          Already have an account?{' '}
          <Link component={RouterLink} to={paths.auth.signIn.getHref(after.redirectTo)}>
            Sign in
          </Link>
        </>
      }
    >
      <RegisterForm
        defaultRole={search.get('role') === 'teacher' ? 'teacher' : 'student'}
        defaultEmail={search.get('email') ?? undefined}
        onSuccess={after.go}
      />
    </AuthCard>
  );
}
