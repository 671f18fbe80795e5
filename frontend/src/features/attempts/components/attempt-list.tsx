import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PassBadge } from '@/components/ui/pass-badge';
import { VisuallyHidden } from '@/components/ui/visually-hidden';
import { useAttempts, type AttemptFilter } from '../api/get-attempts';
import type { Attempt } from '../types';

const stateWords: Record<Attempt['state'], string> = {
  queued: 'In the queue',
  measuring: 'Being measured',
  graded: 'Marked',
  'needs-retake': 'Photo to retake',
  failed: 'Could not be marked',
};

/**
 * The mark that stands: the teacher's when they marked it (also on a photo the machine could not
 * measure), else the machine's once graded; otherwise where the attempt is.
 */
function Outcome({ attempt }: { attempt: Attempt }) {
  if (attempt.override)
    return <PassBadge pass={attempt.override.pass} score={attempt.override.score} />;
  if (attempt.state === 'graded' && attempt.pass !== null)
    return <PassBadge pass={attempt.pass} score={attempt.score} />;
  return <>{stateWords[attempt.state]}</>;
}

/** Attempts newest first: the caller's own, or (for a teacher) filtered by assignment. */
export function AttemptList({
  filter,
  attemptHref,
  showStudent = false,
  emptyText,
}: {
  filter?: AttemptFilter;
  attemptHref: (id: string) => string;
  showStudent?: boolean;
  emptyText: string;
}) {
  const attempts = useAttempts(filter);
  if (attempts.isPending) return <Loading label="Loading attempts…" />;
  if (attempts.isError)
    return <ErrorAlert error={attempts.error} onRetry={() => attempts.refetch()} />;
  if (attempts.data.length === 0)
    return <EmptyState title="No attempts yet">{emptyText}</EmptyState>;
  return (
    <TableContainer component={Paper}>
      <Table size="small" aria-label="Attempts">
        <TableHead>
          <TableRow>
            <TableCell>When</TableCell>
            {showStudent && <TableCell>Student</TableCell>}
            <TableCell>Drill</TableCell>
            <TableCell>Outcome</TableCell>
            <TableCell>
              <VisuallyHidden>Open</VisuallyHidden>
            </TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {attempts.data.map((attempt) => (
            <TableRow key={attempt.id}>
              <TableCell>
                {new Date(attempt.createdAt).toLocaleString(undefined, {
                  dateStyle: 'medium',
                  timeStyle: 'short',
                })}
              </TableCell>
              {showStudent && <TableCell>{attempt.student.displayName}</TableCell>}
              <TableCell>{attempt.drill.title}</TableCell>
              <TableCell>
                <Outcome attempt={attempt} />
                {attempt.override ? " (teacher's mark)" : ''}
              </TableCell>
              <TableCell>
                <Button size="small" component={RouterLink} to={attemptHref(attempt.id)}>
                  {showStudent ? 'Review' : 'Open'}
                </Button>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
