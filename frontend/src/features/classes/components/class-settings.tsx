import { updateClassSchema } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { errorMessage } from '@/lib/error-words';
import { fieldMessage } from '@/lib/error-words';
import { useUpdateClass } from '../api/update-class';
import type { ClassSummary } from '../types';

/** Rename (shown at once, rolled back if the server says no) and archive or reopen. */
export function ClassSettings({ item }: { item: ClassSummary }) {
  const [name, setName] = useState(item.name);
  const [problem, setProblem] = useState<string>();
  const update = useUpdateClass({ id: item.id });

  const rename = (event: React.FormEvent) => {
    event.preventDefault();
    try {
      const input = updateClassSchema.validateSync({ name });
      setProblem(undefined);
      update.mutate(input);
    } catch (error) {
      setProblem(fieldMessage('name', (error as { type?: string }).type));
    }
  };

  return (
    <Stack spacing={1.5}>
      {update.isError && <Alert severity="error">{errorMessage(update.error)}</Alert>}
      <Stack component="form" direction={{ xs: 'column', sm: 'row' }} spacing={1} onSubmit={rename} noValidate>
        <TextField
          label="Class name"
          size="small"
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={Boolean(problem)}
          helperText={problem}
        />
        <Button type="submit" variant="outlined" disabled={name.trim() === item.name}>
          Rename
        </Button>
      </Stack>
      <Button
        variant="text"
        color="inherit"
        sx={{ alignSelf: 'flex-start' }}
        onClick={() => update.mutate({ archived: !item.archived })}
      >
        {item.archived ? 'Reopen this class' : 'Archive this class'}
      </Button>
    </Stack>
  );
}
