import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export default function ForgotPasswordRoute() {
  return (
    <AuthCard
      title="Forgot your password?"
      intro="Enter the address you signed up with and we will e-mail you a link to choose a new one."
      footer={
        <Link component={RouterLink} to={paths.auth.signIn.getHref()}>
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
