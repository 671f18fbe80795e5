import { inviteStudentsSchema } from '@mixmark/common';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useState } from 'react';
import { ValidationError } from 'yup';
import { errorMessage } from '@/lib/error-words';
import { useInviteStudents } from '../api/invite-students';

/** Splits what a teacher pastes (one per line, or commas, or spaces) into addresses. */
export function splitEmails(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((part) => part.trim())
    .filter(Boolean);
}

export function InviteForm({ classId }: { classId: string }) {
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string>();
  const invite = useInviteStudents({ classId, onSuccess: () => setText('') });

  const onSubmit = async (event: React.FormEvent) => {
    event.preventDefault();
    setProblem(undefined);
    try {
      const input = await inviteStudentsSchema.validate({ emails: splitEmails(text) }, { abortEarly: false });
      invite.mutate(input);
    } catch (error) {
      if (!(error instanceof ValidationError)) throw error;
      const bad = error.inner.map((e) => e.value).filter((v): v is string => typeof v === 'string');
      setProblem(
        bad.length > 0
          ? `These do not look like e-mail addresses: ${bad.join(', ')}.`
          : 'Enter one to 50 e-mail addresses, one per line.',
      );
    }
  };

  return (
    <Stack component="form" spacing={1.5} onSubmit={onSubmit} noValidate>
      {invite.isSuccess && (
        <Alert severity="success" role="status">
          Invitation sent to {invite.data.length} {invite.data.length === 1 ? 'address' : 'addresses'}.
        </Alert>
      )}
      {invite.isError && <Alert severity="error">{errorMessage(invite.error)}</Alert>}
      <TextField
        label="Invite by e-mail"
        multiline
        minRows={3}
        value={text}
        onChange={(event) => setText(event.target.value)}
        error={Boolean(problem)}
        helperText={problem ?? 'One address per line; each gets a link to join this class.'}
      />
      <Button type="submit" variant="outlined" loading={invite.isPending} sx={{ alignSelf: 'flex-start' }}>
        Send invitations
      </Button>
    </Stack>
  );
}
