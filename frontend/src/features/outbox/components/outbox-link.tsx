import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { useOutboxAvailable } from '../api/get-outbox-available';

/** "Outbox (development)" in the app's footer, only when the server keeps e-mails (never in production). */
export function OutboxLink({ href }: { href: string }) {
  const available = useOutboxAvailable();
  if (available.data !== true) return null;
  return (
    <Link component={RouterLink} to={href} color="text.secondary" variant="body2">
      Outbox (development)
    </Link>
  );
}
