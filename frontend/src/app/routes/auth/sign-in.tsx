import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useAfterSignIn } from './use-after-sign-in';

export default function SignInRoute() {
  const after = useAfterSignIn();
  return (
    <AuthCard
      title="Sign in"
      intro="Pick up your drills, results and classes where you left them."
      footer={
        <>
          New to Mixmark?{' '}
          <Link component={RouterLink} to={paths.auth.register.getHref(after.redirectTo)}>
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm onSuccess={after.go} />
    </AuthCard>
  );
}
