import type { PasswordResetRequestInput } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { lazyYupResolver } from '@/lib/lazy-resolver';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { FormAlert } from './form-alert';

/** The shared schema, loaded when the form is first used (see lib/lazy-resolver.ts). */
const resolver = lazyYupResolver<PasswordResetRequestInput>(() => import('../schemas').then((m) => m.passwordResetRequestSchema));

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string>();
  const form = useForm<PasswordResetRequestInput>({
    resolver,
  });
  const request = useRequestPasswordReset();
  const { errors } = form.formState;

  if (request.isSuccess) {
    return (
      <Alert severity="info" role="status">
        If an account uses this address, a reset link is on its way. It works once and expires
        soon; look in the spam folder if it does not arrive within a few minutes.
      </Alert>
    );
  }

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    request.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['email'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit} onFocus={() => void resolver.preload()}>
      <FormAlert message={formError ?? errors.root?.message} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        {...form.register('email')}
        error={Boolean(errors.email)}
        helperText={fieldHelp('email', errors.email)}
      />
      <Button type="submit" variant="contained" loading={request.isPending}>
        Send a reset link
      </Button>
    </Stack>
  );
}
