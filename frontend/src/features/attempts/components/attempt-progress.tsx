import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { AttemptState } from '../types';

const words: Partial<Record<AttemptState, string>> = {
  queued: 'Your photo is in the queue…',
  measuring: 'Finding the card, correcting the light and measuring your swatch…',
};

/** Live status while the server works on the photo. */
export function AttemptProgress({ state }: { state: AttemptState }) {
  return (
    <Paper sx={{ p: 3 }}>
      <Stack spacing={1.5} role="status" aria-live="polite">
        <Typography variant="h3" component="p">
          {words[state] ?? 'Working…'}
        </Typography>
        <LinearProgress aria-label="Measuring" />
        <Typography variant="body2" color="text.secondary">
          This usually takes a few seconds. You can leave this page; the result will be in your history.
        </Typography>
      </Stack>
    </Paper>
  );
}
