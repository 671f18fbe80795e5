import { yupResolver } from '@hookform/resolvers/yup';
import { profileUpdateSchema, type ProfileUpdate } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import { useId, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useUpdateProfile } from '../api/update-profile';
import type { Profile } from '../types';

const digestWords = {
  teacher: 'On Mondays: each class’s attempts, who is behind and what waits for review.',
  student:
    'On Mondays: your attempts, pass rate and how your value, temperature and chroma errors moved.',
  admin: 'On Mondays: your own practice, if you have any.',
} as const;

/** The person's own settings: the name others see, and the weekly progress e-mail on or off. */
export function AccountForm({ profile }: { profile: Profile }) {
  const [formError, setFormError] = useState<string>();
  const digestHelpId = useId();
  const form = useForm<ProfileUpdate>({
    resolver: yupResolver(profileUpdateSchema),
    defaultValues: { displayName: profile.displayName, weeklyDigest: profile.weeklyDigest },
  });
  const update = useUpdateProfile({
    // The saved values become the form's new starting point, so "Saved" shows until the next change.
    onSuccess: (saved) =>
      form.reset({ displayName: saved.displayName, weeklyDigest: saved.weeklyDigest }),
  });
  const { errors, isDirty } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    update.mutate(values, {
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, ['displayName', 'weeklyDigest'])),
    });
  });

  return (
    <Stack component="form" spacing={2.5} noValidate onSubmit={onSubmit} sx={{ maxWidth: 520 }}>
      {formError && <Alert severity="error">{formError}</Alert>}
      <TextField
        label="Display name"
        autoComplete="name"
        {...form.register('displayName')}
        error={Boolean(errors.displayName)}
        helperText={
          fieldHelp('displayName', errors.displayName) ?? 'Shown to your teacher and classmates.'
        }
      />
      <TextField
        label="E-mail"
        value={profile.email}
        disabled
        helperText="Your sign-in address; it cannot be changed here."
      />
      <Stack spacing={0}>
        <Controller
          name="weeklyDigest"
          control={form.control}
          render={({ field }) => (
            <FormControlLabel
              control={
                <Switch
                  checked={Boolean(field.value)}
                  onChange={(event) => field.onChange(event.target.checked)}
                  onBlur={field.onBlur}
                  slotProps={{ input: { ref: field.ref, 'aria-describedby': digestHelpId } }}
                />
              }
              label={
                <>
                  Weekly progress e-mail{' '}
                  {/* The state in words beside the switch's position (its role already says it). */}
                  <strong aria-hidden>· {field.value ? 'on' : 'off'}</strong>
                </>
              }
            />
          )}
        />
        <FormHelperText id={digestHelpId} sx={{ mt: 0 }}>
          {digestWords[profile.role]}
        </FormHelperText>
      </Stack>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
        <Button type="submit" variant="contained" loading={update.isPending} disabled={!isDirty}>
          Save
        </Button>
        {update.isSuccess && !isDirty && (
          <Alert severity="success" role="status" sx={{ py: 0 }}>
            Saved.
          </Alert>
        )}
      </Stack>
    </Stack>
  );
}
