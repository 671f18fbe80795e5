import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Navigate, Link as RouterLink, useLocation } from 'react-router-dom';
import { wasPickedFromMenu } from '@/components/layouts/nav-items';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { StudentAssignmentList } from '@/features/assignments/components/student-assignment-list';
import { useUser } from '@/lib/auth-store';
import { getAssignmentsQueryOptions } from '@/features/assignments/api/get-assignments';
import { getClassesQueryOptions, useClasses } from '@/features/classes/api/get-classes';
import { prefetchLoader } from '@/lib/route-loader';

/** For a student on no class: where to practise instead, and how to join one. */
function NoClassNotice() {
  return (
    <Paper
      variant="outlined"
      component="section"
      aria-labelledby="no-class-title"
      sx={{ p: 2, mb: 3 }}
    >
      <Typography id="no-class-title" variant="h3" component="h2" sx={{ mb: 0.5 }}>
        You are not on a class
      </Typography>
      <Typography sx={{ mb: 1.5 }}>
        Assignments come from a teacher’s class. Until then, pick any drill from the practice
        library: it is marked the same way.
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1}>
        <Button variant="contained" component={RouterLink} to={paths.student.library.getHref()}>
          Open the practice library
        </Button>
        <Button variant="outlined" component={RouterLink} to={paths.student.join.getHref()}>
          Join a class with a code
        </Button>
      </Stack>
    </Paper>
  );
}

/**
 * A student's start page. A self-learner reaching it as their start (after signing in, from the
 * Mixmark name in the top bar) goes on to the practice library; picked from the main menu, the
 * page stays and says where to go instead. A student on a class always sees their assignments.
 */
export default function StudentAssignmentsRoute() {
  const user = useUser();
  const location = useLocation();
  // Every class the student is on, archived ones too (their assignments stay on this page). None
  // means a self-learner: PRODUCT.md's student account with no teacher.
  const classes = useClasses({ archived: true });
  const picked = wasPickedFromMenu(location.state);
  // If the classes cannot be read, the page shows as before (the list words its own errors). An
  // empty list still being asked again (cached from before a class was joined) is not an answer.
  const noClass = classes.isSuccess && classes.data.length === 0;
  if (!picked && (classes.isPending || (noClass && classes.isFetching))) {
    return <Loading label="Opening your start page…" />;
  }
  if (!picked && noClass) return <Navigate to={paths.student.library.getHref()} replace />;
  return (
    <>
      <PageHeader
        title="Your assignments"
        subtitle={user ? `Hello, ${user.displayName}.` : undefined}
        actions={
          noClass ? undefined : (
            <Button variant="outlined" component={RouterLink} to={paths.student.library.getHref()}>
              Practise on your own
            </Button>
          )
        }
      />
      {noClass && <NoClassNotice />}
      <StudentAssignmentList
        drillHref={(drillId, assignmentId) => paths.student.drill.getHref(drillId, assignmentId)}
        emptyAction={
          noClass ? undefined : (
            <Button component={RouterLink} to={paths.student.join.getHref()} sx={{ ml: 1 }}>
              Join a class with its code
            </Button>
          )
        }
      />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient) => [
  queryClient.ensureQueryData(getAssignmentsQueryOptions()),
  queryClient.ensureQueryData(getClassesQueryOptions({ archived: true })),
]);
