import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import ErrorOutlined from '@mui/icons-material/ErrorOutlined';
import Alert from '@mui/material/Alert';
import CircularProgress from '@mui/material/CircularProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useHealth } from '../api/get-health';

/** Whether the server and its database answer; state by icon and words, never by colour alone. */
export function HealthStatus() {
  const health = useHealth();
  if (health.isPending) {
    return (
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }} role="status">
        <CircularProgress size={18} aria-hidden />
        <Typography>Checking the server…</Typography>
      </Stack>
    );
  }
  if (health.isError) {
    return <Alert severity="error">{health.error.message}</Alert>;
  }
  const { database, version } = health.data;
  return database.up ? (
    <Alert icon={<CheckCircleOutlined />} severity="success" role="status">
      Server {version} is up; database connected (PostgreSQL {database.serverVersion}, answered in {database.latencyMs} ms
      {database.migrationsPending ? `, ${database.migrationsPending} migrations pending` : ''}).
    </Alert>
  ) : (
    <Alert icon={<ErrorOutlined />} severity="error" role="status">
      Server {version} is up, but the database is not answering.
    </Alert>
  );
}
