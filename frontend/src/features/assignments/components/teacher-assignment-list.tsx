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
import { VisuallyHidden } from '@/components/ui/visually-hidden';
import { useAssignments } from '../api/get-assignments';
import { dueWords } from './due-date';

/** Assignments with how many students stand where; one class's, or all of the teacher's. */
export function TeacherAssignmentList({
  classId,
  assignmentHref,
  showClass = !classId,
}: {
  classId?: string;
  assignmentHref: (id: string) => string;
  showClass?: boolean;
}) {
  const assignments = useAssignments({ classId });
  if (assignments.isPending) return <Loading label="Loading assignments…" />;
  if (assignments.isError) return <ErrorAlert error={assignments.error} onRetry={() => assignments.refetch()} />;
  if (assignments.data.length === 0) {
    return <EmptyState title="Nothing assigned yet">Pick a drill and give it to a class with a due date.</EmptyState>;
  }
  return (
    <TableContainer component={Paper}>
      <Table size="small" aria-label="Assignments">
        <TableHead>
          <TableRow>
            <TableCell>Drill</TableCell>
            {showClass && <TableCell>Class</TableCell>}
            <TableCell>Due</TableCell>
            <TableCell align="right">Passed</TableCell>
            <TableCell align="right">To retake</TableCell>
            <TableCell align="right">Not passed</TableCell>
            <TableCell align="right">Not started</TableCell>
            <TableCell align="right">Late</TableCell>
            <TableCell>
              <VisuallyHidden>Attempts</VisuallyHidden>
            </TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {assignments.data.map((assignment) => {
            const c = assignment.counts;
            return (
              <TableRow key={assignment.id}>
                <TableCell>{assignment.drill.title}</TableCell>
                {showClass && <TableCell>{assignment.className}</TableCell>}
                <TableCell>{dueWords(assignment.dueAt)}</TableCell>
                <TableCell align="right">{c?.passed ?? 0}</TableCell>
                <TableCell align="right">{c?.['needs-retake'] ?? 0}</TableCell>
                <TableCell align="right">{c?.failed ?? 0}</TableCell>
                <TableCell align="right">{c?.['not-started'] ?? 0}</TableCell>
                <TableCell align="right">{c?.late ?? 0}</TableCell>
                <TableCell>
                  <Button size="small" component={RouterLink} to={assignmentHref(assignment.id)} aria-label={`Attempts for ${assignment.drill.title}`}>
                    Attempts
                  </Button>
                </TableCell>
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
