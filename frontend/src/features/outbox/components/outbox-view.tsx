import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Grid from '@mui/material/Grid';
import Link from '@mui/material/Link';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Fragment } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { toApiError } from '@/lib/api-client';
import { useClearOutbox } from '../api/clear-outbox';
import { useOutbox } from '../api/get-outbox';
import { useOutboxMessage } from '../api/get-outbox-message';
import type { OutboxMessage } from '../types';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/**
 * The message's HTML as a page of its own: links open in a new tab (the frame is sandboxed
 * without scripts, so a link followed inside it would be stuck there).
 */
export function outboxSrcDoc(html: string): string {
  return `<!doctype html><html><head><meta charset="utf-8"><base target="_blank"></head><body>${html}</body></html>`;
}

/** The plain-text body with its web addresses as links. */
function LinkedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"')]+)/);
  return (
    <Box
      component="pre"
      sx={{ m: 0, p: 2, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', fontFamily: 'monospace', fontSize: '0.875rem', bgcolor: 'background.default', borderRadius: 1 }}
    >
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <Link key={index} href={part} target="_blank" rel="noreferrer">
            {part}
          </Link>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </Box>
  );
}

function MessageBody({ message }: { message: OutboxMessage }) {
  return (
    <Stack spacing={2}>
      <Stack spacing={0.5}>
        <Typography variant="h3" component="h2">
          {message.subject || '(no subject)'}
        </Typography>
        <Typography variant="body2" color="text.secondary">
          From {message.from} to {message.to.join(', ')} · {when(message.receivedAt)}
        </Typography>
      </Stack>
      {message.html ? (
        <section aria-label="As the recipient sees it">
          <Typography variant="subtitle2" component="h3" sx={{ mb: 1 }}>
            As the recipient sees it
          </Typography>
          <Box
            component="iframe"
            title={`The e-mail “${message.subject}”`}
            sandbox="allow-popups allow-popups-to-escape-sandbox"
            srcDoc={outboxSrcDoc(message.html)}
            sx={{ width: '100%', minHeight: 420, border: 1, borderColor: 'divider', borderRadius: 1, bgcolor: '#fff' }}
          />
        </section>
      ) : (
        <Typography color="text.secondary">This message has no HTML part.</Typography>
      )}
      <section aria-label="Plain text">
        <Typography variant="subtitle2" component="h3" sx={{ mb: 1 }}>
          Plain text
        </Typography>
        {message.text ? <LinkedText text={message.text} /> : <Typography color="text.secondary">This message has no plain-text part.</Typography>}
      </section>
    </Stack>
  );
}

function SelectedMessage({ id }: { id: string }) {
  const message = useOutboxMessage({ id });
  if (message.isPending) return <Loading label="Opening the message…" />;
  if (message.isError) {
    return toApiError(message.error).statusCode === 404 ? (
      <Alert severity="info">This message is no longer in the outbox.</Alert>
    ) : (
      <ErrorAlert error={message.error} onRetry={() => message.refetch()} />
    );
  }
  return <MessageBody message={message.data} />;
}

/**
 * The development outbox: the e-mails Mixmark would have sent, newest first, and the chosen
 * one's HTML and text. In production the server has no outbox and the page says so.
 */
export function OutboxView({
  selectedId,
  messageHref,
  onCleared,
}: {
  selectedId?: string;
  messageHref: (id: string) => string;
  onCleared?: () => void;
}) {
  const outbox = useOutbox();
  const clear = useClearOutbox({ onSuccess: onCleared });

  if (outbox.isPending) return <Loading label="Loading the outbox…" />;
  if (outbox.isError) {
    return toApiError(outbox.error).statusCode === 404 ? (
      <Alert severity="info">
        The outbox exists only in development. This server sends its e-mails for real, so there is nothing to show here.
      </Alert>
    ) : (
      <ErrorAlert error={outbox.error} onRetry={() => outbox.refetch()} />
    );
  }
  // The server lists newest first; sorted here too so the order never depends on it.
  const messages = [...outbox.data].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
        <Button variant="outlined" onClick={() => outbox.refetch()} loading={outbox.isFetching}>
          Check for new mail
        </Button>
        {messages.length > 0 && (
          <Button color="error" onClick={() => clear.mutate()} loading={clear.isPending}>
            Empty the outbox
          </Button>
        )}
      </Stack>
      {clear.isError && <ErrorAlert error={clear.error} />}
      {messages.length === 0 ? (
        <EmptyState title="No e-mails yet">
          Invitations, password resets and weekly digests appear here as soon as Mixmark sends them.
        </EmptyState>
      ) : (
        <Grid container spacing={3}>
          <Grid size={{ xs: 12, md: 4 }}>
            <Paper component="nav" aria-label="Messages">
              <List disablePadding>
                {messages.map((entry) => (
                  <ListItemButton
                    key={entry.id}
                    component={RouterLink}
                    to={messageHref(entry.id)}
                    selected={entry.id === selectedId}
                    aria-current={entry.id === selectedId ? 'page' : undefined}
                    divider
                  >
                    <ListItemText
                      primary={entry.subject || '(no subject)'}
                      secondary={`To ${entry.to.join(', ')} · ${when(entry.receivedAt)}`}
                      slotProps={{ secondary: { sx: { overflowWrap: 'anywhere' } } }}
                    />
                  </ListItemButton>
                ))}
              </List>
            </Paper>
          </Grid>
          <Grid size={{ xs: 12, md: 8 }}>
            {selectedId ? (
              <SelectedMessage key={selectedId} id={selectedId} />
            ) : (
              <Typography color="text.secondary">Choose a message to read it.</Typography>
            )}
          </Grid>
        </Grid>
      )}
    </Stack>
  );
}
