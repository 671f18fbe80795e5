import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import DialogContentText from '@mui/material/DialogContentText';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { errorMessage } from '@/lib/error-words';
import { useDeleteDrill } from '../api/delete-drill';
import { useDuplicateDrill } from '../api/duplicate-drill';
import type { Drill } from '../types';

/** Duplicate and delete for a drill the teacher owns; delete asks first, naming the drill. */
export function DrillManageActions({
  drill,
  onDuplicated,
  onDeleted,
}: {
  drill: Pick<Drill, 'id' | 'title'>;
  onDuplicated?: (copy: Drill) => void;
  onDeleted?: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const duplicate = useDuplicateDrill({ onSuccess: onDuplicated });
  const remove = useDeleteDrill({
    onSuccess: () => {
      setConfirming(false);
      onDeleted?.();
    },
  });
  return (
    <>
      <Button onClick={() => duplicate.mutate(drill.id)} loading={duplicate.isPending} aria-label={`Duplicate ${drill.title}`}>
        Duplicate
      </Button>
      <Button color="error" onClick={() => setConfirming(true)} aria-label={`Delete ${drill.title}`}>
        Delete
      </Button>
      {duplicate.isError && (
        <Alert severity="error" onClose={() => duplicate.reset()}>
          {errorMessage(duplicate.error)}
        </Alert>
      )}
      <ConfirmDialog
        open={confirming}
        title={`Delete “${drill.title}”?`}
        confirmLabel="Delete the drill"
        destructive
        busy={remove.isPending}
        onConfirm={() => remove.mutate(drill.id)}
        onCancel={() => {
          setConfirming(false);
          remove.reset();
        }}
      >
        <DialogContentText>
          It leaves your library and can no longer be assigned. Attempts already made keep their marks, and
          assignments already set keep it.
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
