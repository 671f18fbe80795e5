import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { useAssignments } from '../api/get-assignments';
import type { AssignmentView } from '../types';
import { AssignmentStatusChip } from './assignment-status-chip';
import { DueDate } from './due-date';

const finished = (a: AssignmentView) => a.status === 'passed';

/** A student's assignments, the ones still to do first, soonest due first. */
export function StudentAssignmentList({
  drillHref,
  emptyAction,
}: {
  drillHref: (drillId: string, assignmentId: string) => string;
  emptyAction?: React.ReactNode;
}) {
  const assignments = useAssignments();
  if (assignments.isPending) return <Loading label="Loading your assignments…" />;
  if (assignments.isError) return <ErrorAlert error={assignments.error} onRetry={() => assignments.refetch()} />;
  if (assignments.data.length === 0) {
    return (
      <EmptyState title="No assignments yet">
        When your teacher sets a drill for your class, it shows here. {emptyAction}
      </EmptyState>
    );
  }
  const sorted = [...assignments.data].sort(
    (a, b) => Number(finished(a)) - Number(finished(b)) || a.dueAt.localeCompare(b.dueAt),
  );
  return (
    <Stack spacing={1.5} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }}>
      {sorted.map((assignment) => (
        <Paper component="li" key={assignment.id} sx={{ p: 2 }}>
          <Stack
            direction={{ xs: 'column', sm: 'row' }}
            spacing={1.5}
            sx={{ justifyContent: 'space-between', alignItems: { xs: 'flex-start', sm: 'center' } }}
          >
            <Stack spacing={0.5}>
              <Typography variant="h3" component="h2">
                {assignment.drill.title}
              </Typography>
              <Typography variant="body2">
                {assignment.className} · {assignment.drill.kind.replace('-', ' ')} · <DueDate dueAt={assignment.dueAt} />
              </Typography>
              {assignment.note && <Typography variant="body2">“{assignment.note}”</Typography>}
            </Stack>
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
              {assignment.status && <AssignmentStatusChip status={assignment.status} />}
              <Button
                variant={finished(assignment) ? 'outlined' : 'contained'}
                component={RouterLink}
                to={drillHref(assignment.drill.id, assignment.id)}
                aria-label={`Open ${assignment.drill.title}`}
              >
                Open
              </Button>
            </Stack>
          </Stack>
        </Paper>
      ))}
    </Stack>
  );
}
