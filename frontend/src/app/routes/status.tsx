import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { HealthStatus } from '@/features/health/components/health-status';

export default function StatusRoute() {
  return (
    <Stack spacing={2}>
      <Typography variant="h2">Server status</Typography>
      <HealthStatus />
    </Stack>
  );
}
