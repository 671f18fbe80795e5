import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { PhotoPicker } from '@/components/photo/photo-picker';
import { UploadProgress } from '@/components/photo/upload-progress';
import { errorMessage } from '@/lib/error-words';
import { useCreateAttempt } from '../api/create-attempt';
import type { Attempt } from '../types';

const megabytes = (bytes: number) => `${(bytes / 1_000_000).toFixed(1)} MB`;

/**
 * Take the photo with the phone's camera (or pick a file), send it with a real progress bar,
 * and hand the queued attempt on. The server checks the file by its bytes, not its name.
 */
export function PhotoUpload({
  assignmentId,
  drillId,
  onUploaded,
}: {
  assignmentId?: string;
  drillId: string;
  onUploaded: (attempt: Attempt) => void;
}) {
  const [photo, setPhoto] = useState<File>();
  const upload = useCreateAttempt({ onSuccess: onUploaded });

  const send = () => {
    if (photo) upload.mutate({ photo, assignmentId, drillId: assignmentId ? undefined : drillId });
  };

  return (
    <Stack spacing={2}>
      <PhotoPicker
        label={photo ? 'Choose another photo' : 'Take or choose a photo'}
        variant={photo ? 'outlined' : 'contained'}
        size="large"
        fullWidth
        sx={{ maxWidth: { sm: 360 } }}
        onPick={(picked) => {
          upload.reset();
          setPhoto(picked);
        }}
      />
      {photo && (
        <Typography>
          Ready to send: <strong>{photo.name}</strong> ({megabytes(photo.size)})
        </Typography>
      )}
      {upload.isPending && <UploadProgress progress={upload.progress} />}
      {upload.isError && (
        <Alert severity="error" role="alert">
          {errorMessage(upload.error)}
        </Alert>
      )}
      <Button
        variant="contained"
        size="large"
        disabled={!photo || upload.isPending}
        onClick={send}
        sx={{ alignSelf: { xs: 'stretch', sm: 'flex-start' } }}
      >
        Send for marking
      </Button>
    </Stack>
  );
}
