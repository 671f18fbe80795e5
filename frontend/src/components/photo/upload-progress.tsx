import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';

/**
 * How much of a photo has been sent (axios's `onUploadProgress`, 0..1), in a bar and in words.
 * With `afterSent`, the bar turns indeterminate once every byte is out, while the server works.
 */
export function UploadProgress({ progress, afterSent }: { progress: number; afterSent?: string }) {
  const percent = Math.round(progress * 100);
  const working = afterSent !== undefined && progress >= 1;
  return (
    <Stack spacing={0.5}>
      <LinearProgress
        variant={working ? 'indeterminate' : 'determinate'}
        value={percent}
        aria-label="Upload progress"
      />
      <Typography variant="body2" role="status">
        {working ? afterSent : `Sending… ${percent} %`}
      </Typography>
    </Stack>
  );
}
