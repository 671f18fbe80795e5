import type { PasswordResetInput } from '@mixmark/common';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { lazyYupResolver } from '@/lib/lazy-resolver';
import { useResetPassword } from '../api/reset-password';
import { FormAlert } from './form-alert';

/** The shared schema, loaded when the form is first used (see lib/lazy-resolver.ts). */
const resolver = lazyYupResolver<PasswordResetInput>(() => import('../schemas').then((m) => m.passwordResetSchema));

export function ResetPasswordForm({ token, onSuccess }: { token: string; onSuccess: () => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<PasswordResetInput>({
    resolver,
    defaultValues: { token, password: '' },
  });
  const reset = useResetPassword({ onSuccess });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    reset.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['password'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit} onFocus={() => void resolver.preload()}>
      <FormAlert
        message={
          formError ?? errors.root?.message ?? (errors.token ? 'This reset link is not complete. Open the link from the e-mail again.' : undefined)
        }
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        {...form.register('password')}
        error={Boolean(errors.password)}
        helperText={fieldHelp('password', errors.password) ?? 'At least 10 characters.'}
      />
      <Button type="submit" variant="contained" loading={reset.isPending}>
        Set the new password
      </Button>
    </Stack>
  );
}
