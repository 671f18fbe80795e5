import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import { errorMessage } from '@/lib/error-words';

/** A failed request in words, with a way to try again when there is one. */
export function ErrorAlert({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  return (
    <Alert
      severity="error"
      action={
        onRetry ? (
          <Button color="inherit" size="small" onClick={onRetry}>
            Try again
          </Button>
        ) : undefined
      }
    >
      {errorMessage(error)}
    </Alert>
  );
}
