import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { AuthCard } from '@/components/layouts/auth-card';
import { paths } from '@/config/paths';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export default function ResetPasswordRoute() {
  const { token = '' } = useParams();
  const [done, setDone] = useState(false);
  return (
    <AuthCard title="Choose a new password" intro="The link from the e-mail works once.">
      {done ? (
        <>
          <Alert severity="success" role="status">
            Your password is changed. Sign in with the new one.
          </Alert>
          <Button variant="contained" component={RouterLink} to={paths.auth.signIn.getHref()}>
            Sign in
          </Button>
        </>
      ) : (
        <ResetPasswordForm token={token} onSuccess={() => setDone(true)} />
      )}
    </AuthCard>
  );
}
