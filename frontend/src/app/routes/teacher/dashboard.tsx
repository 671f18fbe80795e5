import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { TeacherAssignmentList } from '@/features/assignments/components/teacher-assignment-list';
import { ClassList } from '@/features/classes/components/class-list';
import { CreateClassForm } from '@/features/classes/components/create-class-form';
import { getAssignmentsQueryOptions } from '@/features/assignments/api/get-assignments';
import { getClassesQueryOptions } from '@/features/classes/api/get-classes';
import { prefetchLoader } from '@/lib/route-loader';

export default function TeacherDashboardRoute() {
  return (
    <Stack spacing={4}>
      <PageHeader
        title="Your studio"
        actions={
          <>
            <Button variant="outlined" component={RouterLink} to={paths.teacher.newDrill.getHref()}>
              New drill
            </Button>
            <Button variant="contained" component={RouterLink} to={paths.teacher.assign.getHref()}>
              Assign a drill
            </Button>
          </>
        }
      />
      <Stack spacing={2} component="section" aria-labelledby="classes-heading">
        <Typography variant="h3" component="h2" id="classes-heading">
          Classes
        </Typography>
        <CreateClassForm />
        <ClassList classHref={paths.teacher.class.getHref} />
      </Stack>
      <Stack spacing={2} component="section" aria-labelledby="assignments-heading">
        <Typography variant="h3" component="h2" id="assignments-heading">
          Assignments
        </Typography>
        <TeacherAssignmentList assignmentHref={paths.teacher.assignment.getHref} />
      </Stack>
    </Stack>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['teacher'], (queryClient) => [
  queryClient.ensureQueryData(getClassesQueryOptions()),
  queryClient.ensureQueryData(getAssignmentsQueryOptions()),
]);
