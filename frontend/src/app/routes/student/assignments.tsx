import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { StudentAssignmentList } from '@/features/assignments/components/student-assignment-list';
import { useUser } from '@/lib/auth-store';
import { getAssignmentsQueryOptions } from '@/features/assignments/api/get-assignments';
import { prefetchLoader } from '@/lib/route-loader';

export default function StudentAssignmentsRoute() {
  const user = useUser();
  return (
    <>
      <PageHeader
        title="Your assignments"
        subtitle={user ? `Hello, ${user.displayName}.` : undefined}
        actions={
          <Button variant="outlined" component={RouterLink} to={paths.student.library.getHref()}>
            Practise on your own
          </Button>
        }
      />
      <StudentAssignmentList
        drillHref={(drillId, assignmentId) => paths.student.drill.getHref(drillId, assignmentId)}
        emptyAction={
          <Button component={RouterLink} to={paths.student.join.getHref()} sx={{ ml: 1 }}>
            Join a class with its code
          </Button>
        }
      />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient) => [queryClient.ensureQueryData(getAssignmentsQueryOptions())]);
