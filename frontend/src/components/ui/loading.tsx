import CircularProgress from '@mui/material/CircularProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

/** A spinner with words, announced politely to screen readers. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', py: 3 }} role="status">
      <CircularProgress size={20} aria-hidden />
      <Typography>{label}</Typography>
    </Stack>
  );
}
