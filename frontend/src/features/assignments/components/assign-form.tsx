import { yupResolver } from '@hookform/resolvers/yup';
import { createAssignmentSchema } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { schemaSentence } from '@/lib/error-words';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useCreateAssignment } from '../api/create-assignment';
import type { AssignmentView } from '../types';
import { toLocalInput } from './due-date';

/** `datetime-local` wants local time without a zone: a week from now at 18:00 by default. */
function defaultDue(now = new Date()): string {
  const due = new Date(now.getTime() + 7 * 24 * 60 * 60 * 1000);
  due.setHours(18, 0, 0, 0);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${due.getFullYear()}-${pad(due.getMonth() + 1)}-${pad(due.getDate())}T18:00`;
}

export function AssignForm({
  classes,
  drills,
  defaultClassId = '',
  defaultDrillId = '',
  onAssigned,
}: {
  classes: { id: string; name: string }[];
  drills: { id: string; title: string }[];
  defaultClassId?: string;
  defaultDrillId?: string;
  onAssigned: (created: AssignmentView) => void;
}) {
  const [formError, setFormError] = useState<string>();
  const form = useForm({
    resolver: yupResolver(createAssignmentSchema),
    defaultValues: {
      classId: defaultClassId,
      drillId: defaultDrillId,
      dueAt: defaultDue() as unknown as Date,
      note: '',
    },
  });
  const create = useCreateAssignment({ onSuccess: onAssigned });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    create.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['classId', 'drillId', 'dueAt', 'note'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit} sx={{ maxWidth: 560 }}>
      {formError && <Alert severity="error">{formError}</Alert>}
      <TextField
        select
        label="Class"
        defaultValue={defaultClassId}
        {...form.register('classId')}
        error={Boolean(errors.classId)}
        helperText={errors.classId ? 'Choose the class.' : undefined}
      >
        {classes.map((item) => (
          <MenuItem key={item.id} value={item.id}>
            {item.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Drill"
        defaultValue={defaultDrillId}
        {...form.register('drillId')}
        error={Boolean(errors.drillId)}
        helperText={errors.drillId ? 'Choose the drill.' : undefined}
      >
        {drills.map((drill) => (
          <MenuItem key={drill.id} value={drill.id}>
            {drill.title}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label="Due"
        type="datetime-local"
        {...form.register('dueAt')}
        error={Boolean(errors.dueAt)}
        slotProps={{ inputLabel: { shrink: true }, htmlInput: { min: toLocalInput(new Date()) } }}
        helperText={errors.dueAt ? (errors.dueAt.type === 'future' ? schemaSentence(errors.dueAt.message) : 'Choose a due date and time.') : undefined}
      />
      <TextField
        label="Note for the students (optional)"
        multiline
        minRows={2}
        {...form.register('note')}
        error={Boolean(errors.note)}
        helperText={fieldHelp('note', errors.note)}
      />
      <Button type="submit" variant="contained" loading={create.isPending} sx={{ alignSelf: 'flex-start' }}>
        Assign
      </Button>
    </Stack>
  );
}
