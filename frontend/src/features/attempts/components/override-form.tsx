import { yupResolver } from '@hookform/resolvers/yup';
import { overrideMarkSchema } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import FormControl from '@mui/material/FormControl';
import FormLabel from '@mui/material/FormLabel';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { applyServerErrors, fieldHelp } from '@/lib/form-errors';
import { useOverrideAttempt } from '../api/override-attempt';
import type { Attempt } from '../types';

/** A teacher's own score and pass over the machine's, with a comment the student is mailed. */
export function OverrideForm({ attempt }: { attempt: Attempt }) {
  const [formError, setFormError] = useState<string>();
  const form = useForm({
    resolver: yupResolver(overrideMarkSchema),
    defaultValues: {
      score: attempt.score ?? 0,
      pass: attempt.pass ?? false,
      comment: attempt.override?.comment ?? '',
    },
  });
  const override = useOverrideAttempt({ id: attempt.id });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(undefined);
    override.mutate(values, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['score', 'pass', 'comment'])),
    });
  });

  return (
    <Stack component="form" spacing={2} noValidate onSubmit={onSubmit}>
      {formError && <Alert severity="error">{formError}</Alert>}
      {override.isSuccess && (
        <Alert severity="success" role="status">
          Mark saved; the student has been told.
        </Alert>
      )}
      <TextField
        label="Score (0–100)"
        type="number"
        slotProps={{ htmlInput: { min: 0, max: 100, step: 1 } }}
        {...form.register('score', { valueAsNumber: true })}
        error={Boolean(errors.score)}
        helperText={errors.score ? 'A whole number from 0 to 100.' : undefined}
        sx={{ maxWidth: 200 }}
      />
      <FormControl>
        <FormLabel id="override-pass">Outcome</FormLabel>
        <Controller
          name="pass"
          control={form.control}
          render={({ field }) => (
            <RadioGroup
              row
              aria-labelledby="override-pass"
              value={field.value ? 'pass' : 'not-yet'}
              onChange={(event) => field.onChange(event.target.value === 'pass')}
            >
              <FormControlLabel value="pass" control={<Radio />} label="Pass" />
              <FormControlLabel value="not-yet" control={<Radio />} label="Not yet" />
            </RadioGroup>
          )}
        />
      </FormControl>
      <TextField
        label="Comment for the student"
        multiline
        minRows={3}
        {...form.register('comment')}
        error={Boolean(errors.comment)}
        helperText={fieldHelp('comment', errors.comment)}
      />
      <Button type="submit" variant="contained" loading={override.isPending} sx={{ alignSelf: 'flex-start' }}>
        Save the mark
      </Button>
    </Stack>
  );
}
