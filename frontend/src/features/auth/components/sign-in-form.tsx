import type { SignInInput } from '@mixmark/common';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { TextInput } from '@/components/ui/text-input';
import { paths } from '@/config/paths';
import type { SessionReply } from '@/lib/api-client';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { lazyYupResolver } from '@/lib/lazy-resolver';
import { useSignIn } from '../api/sign-in';
import { FormAlert } from './form-alert';

/** The shared schema, loaded when the form is first used (see lib/lazy-resolver.ts). */
const resolver = lazyYupResolver<SignInInput>(() => import('../schemas').then((m) => m.signInSchema));

export function SignInForm({ onSuccess }: { onSuccess: (session: SessionReply) => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<SignInInput>({ resolver });
  const signIn = useSignIn({ onSuccess });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    signIn.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['email', 'password'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit} onFocus={() => void resolver.preload()}>
      <FormAlert message={formError ?? errors.root?.message} />
      <TextInput
        label="E-mail"
        type="email"
        autoComplete="email"
        {...form.register('email')}
        error={Boolean(errors.email)}
        helperText={fieldHelp('email', errors.email)}
      />
      <TextInput
        label="Password"
        type="password"
        autoComplete="current-password"
        {...form.register('password')}
        error={Boolean(errors.password)}
        helperText={fieldHelp('password', errors.password)}
      />
      <Button type="submit" variant="contained" size="large" loading={signIn.isPending}>
        Sign in
      </Button>
      <Link component={RouterLink} to={paths.auth.forgotPassword.getHref()}>
        Forgot your password?
      </Link>
    </Stack>
  );
}
