import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import DialogContentText from '@mui/material/DialogContentText';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { errorMessage } from '@/lib/error-words';
import { useDeleteAssignment } from '../api/delete-assignment';
import { useUpdateAssignment } from '../api/update-assignment';
import type { AssignmentView } from '../types';
import { toLocalInput } from './due-date';

/** The teacher's controls for one assignment: move its due date, or withdraw it (asks first). */
export function AssignmentManageActions({
  assignment,
  onDeleted,
}: {
  assignment: Pick<AssignmentView, 'id' | 'dueAt' | 'className' | 'drill'>;
  onDeleted?: () => void;
}) {
  const [editing, setEditing] = useState(false);
  const [due, setDue] = useState('');
  const [dueError, setDueError] = useState<string>();
  const [confirming, setConfirming] = useState(false);
  const update = useUpdateAssignment({ id: assignment.id, onSuccess: () => setEditing(false) });
  const remove = useDeleteAssignment({
    onSuccess: () => {
      setConfirming(false);
      onDeleted?.();
    },
  });

  const openEditor = () => {
    setDue(toLocalInput(new Date(assignment.dueAt)));
    setDueError(undefined);
    update.reset();
    setEditing(true);
  };

  const saveDue = () => {
    const when = new Date(due);
    if (!due || Number.isNaN(when.getTime())) {
      setDueError('Choose a due date and time.');
      return;
    }
    setDueError(undefined);
    update.mutate({ dueAt: when });
  };

  return (
    <>
      <Button variant="outlined" onClick={openEditor}>
        Change the due date
      </Button>
      <Button color="error" onClick={() => setConfirming(true)}>
        Delete the assignment
      </Button>
      <ConfirmDialog
        open={editing}
        title="Change the due date"
        confirmLabel="Save the due date"
        busy={update.isPending}
        onConfirm={saveDue}
        onCancel={() => setEditing(false)}
      >
        <DialogContentText sx={{ mb: 2 }}>
          {assignment.drill.title} for {assignment.className}. Students see the new date at once.
        </DialogContentText>
        <TextField
          label="Due"
          type="datetime-local"
          value={due}
          onChange={(event) => setDue(event.target.value)}
          slotProps={{ inputLabel: { shrink: true } }}
          error={Boolean(dueError)}
          helperText={dueError}
          fullWidth
        />
        {update.isError && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {errorMessage(update.error)}
          </Alert>
        )}
      </ConfirmDialog>
      <ConfirmDialog
        open={confirming}
        title={`Delete the assignment “${assignment.drill.title}” for ${assignment.className}?`}
        confirmLabel="Delete the assignment"
        destructive
        busy={remove.isPending}
        onConfirm={() => remove.mutate(assignment.id)}
        onCancel={() => {
          setConfirming(false);
          remove.reset();
        }}
      >
        <DialogContentText>
          The class no longer sees it, and it leaves the gradebook. Photos students already sent stay with them as practice; the drill stays in your library.
        </DialogContentText>
        {remove.isError && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {errorMessage(remove.error)}
          </Alert>
        )}
      </ConfirmDialog>
    </>
  );
}
