import Alert, { type AlertColor } from '@mui/material/Alert';
import Button from '@mui/material/Button';
import DialogContentText from '@mui/material/DialogContentText';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { errorMessage } from '@/lib/error-words';
import { useInvitations } from '../api/get-invitations';
import { isInvitationGone, useResendInvitation } from '../api/resend-invitation';
import { useWithdrawInvitation } from '../api/withdraw-invitation';
import type { InvitationSummary } from '../types';

type Notice = { severity: AlertColor; text: string };

const longDate = (iso: string) =>
  new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

/**
 * When an invitation link stops working, in words ("expires in 6 days"), rounded to whole days
 * from a day on and to whole hours below a day. Intl.RelativeTimeFormat (ECMA-402) words the
 * interval in the reader's language.
 */
export function expiryInWords(
  expiresAt: string,
  now: number = Date.now(),
  locale?: string,
): string {
  const ms = new Date(expiresAt).getTime() - now;
  if (ms <= 0) return 'link expired';
  const hours = ms / 3_600_000;
  if (hours < 1) return 'link expires within the hour';
  const words = new Intl.RelativeTimeFormat(locale, { numeric: 'always' });
  if (hours < 24) return `link expires ${words.format(Math.round(hours), 'hour')}`;
  return `link expires ${words.format(Math.round(hours / 24), 'day')}`;
}

/** Said when the API answers invitation_not_found: someone else got there first. */
const goneWords = (email: string) =>
  `The invitation to ${email} was no longer waiting: it was accepted or withdrawn in the meantime. The list is up to date again.`;

function InvitationRow({
  classId,
  invitation,
  last,
  onNotice,
}: {
  classId: string;
  invitation: InvitationSummary;
  /** The bottom row goes without a rule under it. */
  last: boolean;
  onNotice: (notice: Notice) => void;
}) {
  const { email } = invitation;
  const [confirming, setConfirming] = useState(false);
  const emailId = useId();
  const resend = useResendInvitation({
    classId,
    onSuccess: (sent) =>
      onNotice({
        severity: 'success',
        text: `A new link is on its way to ${sent.email}. It works until ${longDate(sent.expiresAt)}; the earlier link no longer does.`,
      }),
    onError: (error) =>
      onNotice(
        isInvitationGone(error)
          ? { severity: 'info', text: goneWords(email) }
          : { severity: 'error', text: errorMessage(error) },
      ),
  });
  const withdraw = useWithdrawInvitation({
    classId,
    onSuccess: () => {
      setConfirming(false);
      onNotice({
        severity: 'success',
        text: `${email} can no longer join with the invitation link.`,
      });
    },
    onError: (error) => {
      if (!isInvitationGone(error)) return; // shown in the dialog, which stays open to try again
      setConfirming(false);
      onNotice({ severity: 'info', text: goneWords(email) });
    },
  });
  const busy = resend.isPending || withdraw.isPending;

  return (
    <ListItem
      divider={!last}
      disableGutters
      aria-labelledby={emailId}
      sx={{ display: 'block', py: 1.25 }}
    >
      <Typography id={emailId} sx={{ fontWeight: 600, overflowWrap: 'anywhere' }}>
        {email}
      </Typography>
      <Typography variant="body2" color="text.secondary">
        Sent {longDate(invitation.createdAt)} · {expiryInWords(invitation.expiresAt)}
      </Typography>
      <Stack direction="row" spacing={1} sx={{ mt: 0.75 }}>
        <Button
          size="small"
          variant="outlined"
          onClick={() => resend.mutate(invitation.id)}
          loading={resend.isPending}
          disabled={busy}
          aria-label={`Send the invitation to ${email} again`}
        >
          Send again
        </Button>
        <Button
          size="small"
          color="error"
          onClick={() => {
            withdraw.reset();
            setConfirming(true);
          }}
          disabled={busy}
          aria-label={`Withdraw the invitation to ${email}`}
        >
          Withdraw
        </Button>
      </Stack>
      <ConfirmDialog
        open={confirming}
        title="Withdraw this invitation?"
        confirmLabel="Withdraw"
        cancelLabel="Keep it"
        destructive
        busy={withdraw.isPending}
        onConfirm={() => withdraw.mutate(invitation.id)}
        onCancel={() => {
          setConfirming(false);
          withdraw.reset();
        }}
      >
        <DialogContentText>
          The link sent to <strong>{email}</strong> will stop working. You can invite the address
          again later.
        </DialogContentText>
        {withdraw.isError && !isInvitationGone(withdraw.error) && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {errorMessage(withdraw.error)}
          </Alert>
        )}
      </ConfirmDialog>
    </ListItem>
  );
}

/**
 * The class's invitations nobody has accepted yet, newest first, each with "Send again" and
 * "Withdraw". Rows stack (address, dates, buttons) so a phone-width column reads them as well
 * as a desktop side panel.
 */
export function PendingInvitations({ classId }: { classId: string }) {
  const invitations = useInvitations({ classId });
  const [notice, setNotice] = useState<Notice>();
  const headingId = useId();

  let body: React.ReactNode;
  if (invitations.isPending) body = <Loading label="Loading the invitations…" />;
  else if (invitations.isError && !invitations.data) {
    body = <ErrorAlert error={invitations.error} onRetry={() => invitations.refetch()} />;
  } else if (invitations.data.length === 0) {
    body = (
      <Typography color="text.secondary">No invitations are waiting for an answer.</Typography>
    );
  } else {
    body = (
      <List disablePadding aria-labelledby={headingId}>
        {invitations.data.map((invitation, index, all) => (
          <InvitationRow
            key={invitation.id}
            classId={classId}
            invitation={invitation}
            last={index === all.length - 1}
            onNotice={setNotice}
          />
        ))}
      </List>
    );
  }

  return (
    <Stack component="section" aria-labelledby={headingId} spacing={1}>
      <Typography id={headingId} variant="subtitle1" component="h3" sx={{ fontWeight: 700 }}>
        Waiting to join
      </Typography>
      {notice && (
        <Alert
          severity={notice.severity}
          role={notice.severity === 'error' ? 'alert' : 'status'}
          onClose={() => setNotice(undefined)}
        >
          {notice.text}
        </Alert>
      )}
      {body}
    </Stack>
  );
}
