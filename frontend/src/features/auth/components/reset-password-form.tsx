import { yupResolver } from '@hookform/resolvers/yup';
import { passwordResetSchema, type PasswordResetInput } from '@mixmark/common';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useResetPassword } from '../api/reset-password';
import { FormAlert } from './form-alert';

export function ResetPasswordForm({ token, onSuccess }: { token: string; onSuccess: () => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<PasswordResetInput>({
    resolver: yupResolver(passwordResetSchema),
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
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit}>
      <FormAlert
        message={
          formError ?? (errors.token ? 'This reset link is not complete. Open the link from the e-mail again.' : undefined)
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
