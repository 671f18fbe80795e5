import { yupResolver } from '@hookform/resolvers/yup';
import { createClassSchema, type CreateClassInput } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useCreateClass } from '../api/create-class';
import type { ClassSummary } from '../types';

export function CreateClassForm({ onCreated }: { onCreated?: (created: ClassSummary) => void }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm<CreateClassInput>({ resolver: yupResolver(createClassSchema), defaultValues: { name: '' } });
  const create = useCreateClass({
    onSuccess: (created) => {
      form.reset();
      onCreated?.(created);
    },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    create.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['name'])),
    });
  });

  return (
    <Stack component="form" noValidate onSubmit={onSubmit} spacing={1}>
      {formError && <Alert severity="error">{formError}</Alert>}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1} sx={{ alignItems: 'flex-start' }}>
        <TextField
          label="New class name"
          size="small"
          {...form.register('name')}
          error={Boolean(errors.name)}
          helperText={fieldHelp('name', errors.name)}
          sx={{ minWidth: 260 }}
        />
        <Button type="submit" variant="contained" loading={create.isPending}>
          Create class
        </Button>
      </Stack>
    </Stack>
  );
}
