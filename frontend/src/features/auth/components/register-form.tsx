import type { RegisterInput } from '@mixmark/common';
import Button from '@mui/material/Button';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import type { SessionReply } from '@/lib/api-client';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { lazyYupResolver } from '@/lib/lazy-resolver';
import { useRegister } from '../api/register';
import { FormAlert } from './form-alert';

/** The shared schema, loaded when the form is first used (see lib/lazy-resolver.ts). */
const resolver = lazyYupResolver<RegisterInput>(() =>
  import('../schemas').then((m) => m.registerSchema),
);

export function RegisterForm({
  defaultRole = 'student',
  defaultEmail = '',
  onSuccess,
}: {
  defaultRole?: RegisterInput['role'];
  /** Filled in, still editable (an invitation link passes the address it was sent to). */
  defaultEmail?: string;
  onSuccess: (session: SessionReply) => void;
}) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<RegisterInput>({
    resolver,
    defaultValues: { role: defaultRole, displayName: '', email: defaultEmail, password: '' },
  });
  const registerAccount = useRegister({ onSuccess });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    registerAccount.mutate(values, {
      onError: (error) =>
        setFormError(
          applyServerErrors(error, form.setError, ['email', 'password', 'displayName', 'role']),
        ),
    });
  });

  return (
    <Stack
      component="form"
      spacing={2}
      noValidate
      onSubmit={onSubmit}
      onFocus={() => void resolver.preload()}
    >
      <FormAlert message={formError ?? errors.root?.message} />
      <FormControl error={Boolean(errors.role)}>
        <FormLabel id="register-role">I am joining as</FormLabel>
        <Controller
          name="role"
          control={form.control}
          render={({ field }) => (
            <RadioGroup row aria-labelledby="register-role" {...field}>
              <FormControlLabel
                value="student"
                control={<Radio />}
                label="A student or self-learner"
              />
              <FormControlLabel value="teacher" control={<Radio />} label="A teacher" />
            </RadioGroup>
          )}
        />
        {errors.role && <FormHelperText>{fieldHelp('role', errors.role)}</FormHelperText>}
      </FormControl>
      <TextField
        label="Your name"
        autoComplete="name"
        {...form.register('displayName')}
        error={Boolean(errors.displayName)}
        helperText={
          fieldHelp('displayName', errors.displayName) ?? 'Shown to your teacher or students.'
        }
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        {...form.register('email')}
        error={Boolean(errors.email)}
        helperText={
          fieldHelp('email', errors.email) ??
          (defaultEmail
            ? 'The address your invitation was sent to; you may use another one.'
            : undefined)
        }
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        {...form.register('password')}
        error={Boolean(errors.password)}
        helperText={fieldHelp('password', errors.password) ?? 'At least 10 characters.'}
      />
      <Button type="submit" variant="contained" size="large" loading={registerAccount.isPending}>
        Create account
      </Button>
    </Stack>
  );
}
