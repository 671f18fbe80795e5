import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { errorMessage } from '@/lib/error-words';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';
import type { ClassSummary, InvitationPreview } from '../types';

/**
 * What an invitation link is for, and the button to accept it. `canAccept` is false when the
 * visitor is not signed in as a student; `signInAction` then says how to become one.
 */
export function InvitationCard({
  token,
  canAccept,
  signInAction,
  onAccepted,
}: {
  token: string;
  canAccept: boolean;
  /** Given the invitation, so a "create an account" link can carry the invited address. */
  signInAction?: (invitation: InvitationPreview) => React.ReactNode;
  onAccepted: (joined: ClassSummary) => void;
}) {
  const invitation = useInvitation({ token });
  const accept = useAcceptInvitation({ onSuccess: onAccepted });
  if (invitation.isPending) return <Loading label="Reading the invitation…" />;
  if (invitation.isError) return <ErrorAlert error={invitation.error} />;
  const { className, teacherName, email, expiresAt } = invitation.data;
  return (
    <Stack spacing={2}>
      <Typography>
        <strong>{teacherName}</strong> invites <strong>{email}</strong> to the class{' '}
        <strong>{className}</strong>.
      </Typography>
      <Typography color="text.secondary">
        The link works until{' '}
        {new Date(expiresAt).toLocaleDateString(undefined, { dateStyle: 'long' })}.
      </Typography>
      {accept.isError && <Alert severity="error">{errorMessage(accept.error)}</Alert>}
      {canAccept ? (
        <Button variant="contained" onClick={() => accept.mutate(token)} loading={accept.isPending}>
          Join {className}
        </Button>
      ) : (
        signInAction?.(invitation.data)
      )}
    </Stack>
  );
}
