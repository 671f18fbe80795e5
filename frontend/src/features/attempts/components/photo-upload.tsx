import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useRef, useState } from 'react';
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
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [photo, setPhoto] = useState<File>();
  const upload = useCreateAttempt({ onSuccess: onUploaded });

  const send = () => {
    if (photo) upload.mutate({ photo, assignmentId, drillId: assignmentId ? undefined : drillId });
  };

  return (
    <Stack spacing={2}>
      <Box>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept="image/*"
          capture="environment"
          style={{ position: 'absolute', width: 1, height: 1, opacity: 0 }}
          onChange={(event) => {
            upload.reset();
            setPhoto(event.target.files?.[0]);
          }}
        />
        <Button
          component="label"
          htmlFor={inputId}
          variant={photo ? 'outlined' : 'contained'}
          size="large"
          startIcon={<PhotoCameraOutlined />}
          fullWidth
          sx={{ maxWidth: { sm: 360 } }}
        >
          {photo ? 'Choose another photo' : 'Take or choose a photo'}
        </Button>
      </Box>
      {photo && (
        <Typography>
          Ready to send: <strong>{photo.name}</strong> ({megabytes(photo.size)})
        </Typography>
      )}
      {upload.isPending && (
        <Stack spacing={0.5}>
          <LinearProgress
            variant="determinate"
            value={Math.round(upload.progress * 100)}
            aria-label="Upload progress"
          />
          <Typography variant="body2" role="status">
            Sending… {Math.round(upload.progress * 100)} %
          </Typography>
        </Stack>
      )}
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
