import Alert from '@mui/material/Alert';

/** The sentence for a form-wide failure, read out when it appears. */
export function FormAlert({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <Alert severity="error" role="alert">
      {message}
    </Alert>
  );
}
