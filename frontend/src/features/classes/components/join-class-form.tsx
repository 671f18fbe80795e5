import { yupResolver } from '@hookform/resolvers/yup';
import { joinClassSchema, type JoinClassInput } from '@mixmark/common';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Alert from '@mui/material/Alert';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useJoinClass } from '../api/join-class';
import type { ClassSummary } from '../types';

export function JoinClassForm({ onJoined }: { onJoined?: (joined: ClassSummary) => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<JoinClassInput>({ resolver: yupResolver(joinClassSchema), defaultValues: { code: '' } });
  const join = useJoinClass({ onSuccess: onJoined });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    join.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['code'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit} sx={{ maxWidth: 420 }}>
      {formError && <Alert severity="error">{formError}</Alert>}
      {join.isSuccess && (
        <Alert severity="success" role="status">
          You joined {join.data.name} ({join.data.teacher.displayName}).
        </Alert>
      )}
      <TextField
        label="Class code"
        autoComplete="off"
        slotProps={{ htmlInput: { autoCapitalize: 'characters', style: { letterSpacing: '0.2em', fontWeight: 700 } } }}
        {...form.register('code')}
        error={Boolean(errors.code)}
        helperText={fieldHelp('code', errors.code) ?? '6 letters and digits, from your teacher.'}
      />
      <Button type="submit" variant="contained" loading={join.isPending}>
        Join the class
      </Button>
    </Stack>
  );
}
