import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Paper from '@mui/material/Paper';
import { EmptyState } from '@/components/ui/empty-state';
import { VisuallyHidden } from '@/components/ui/visually-hidden';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { useRemoveStudent } from '../api/remove-student';
import { useRoster } from '../api/get-roster';

/** The class's students; `progressHref` links each name to that student's progress. */
export function RosterTable({ classId, progressHref }: { classId: string; progressHref?: (studentId: string) => string }) {
  const roster = useRoster({ classId });
  const remove = useRemoveStudent({ classId });
  if (roster.isPending) return <Loading label="Loading the roster…" />;
  if (roster.isError) return <ErrorAlert error={roster.error} onRetry={() => roster.refetch()} />;
  if (roster.data.length === 0) {
    return <EmptyState title="No students yet">Share the class code or invite students by e-mail.</EmptyState>;
  }
  return (
    <>
      {remove.isError && <ErrorAlert error={remove.error} />}
      <TableContainer component={Paper}>
        <Table size="small" aria-label="Students in this class">
          <TableHead>
            <TableRow>
              <TableCell>Name</TableCell>
              <TableCell>E-mail</TableCell>
              <TableCell>Joined</TableCell>
              <TableCell align="right">
                <VisuallyHidden>Actions</VisuallyHidden>
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {roster.data.map((student) => (
              <TableRow key={student.id}>
                <TableCell>
                  {progressHref ? (
                    <Link component={RouterLink} to={progressHref(student.id)} aria-label={`${student.displayName}: progress`}>
                      {student.displayName}
                    </Link>
                  ) : (
                    student.displayName
                  )}
                </TableCell>
                <TableCell>{student.email}</TableCell>
                <TableCell>{new Date(student.joinedAt).toLocaleDateString()}</TableCell>
                <TableCell align="right">
                  <Button
                    size="small"
                    color="error"
                    aria-label={`Remove ${student.displayName} from the class`}
                    disabled={remove.isPending}
                    onClick={() => {
                      if (window.confirm(`Remove ${student.displayName} from this class?`)) remove.mutate(student.id);
                    }}
                  >
                    Remove
                  </Button>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </TableContainer>
    </>
  );
}
