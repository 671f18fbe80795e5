import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import Grid from '@mui/material/Grid';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { TeacherAssignmentList } from '@/features/assignments/components/teacher-assignment-list';
import { useClass } from '@/features/classes/api/get-class';
import { ClassCodePanel } from '@/features/classes/components/class-code-panel';
import { ClassSettings } from '@/features/classes/components/class-settings';
import { InviteForm } from '@/features/classes/components/invite-form';
import { PendingInvitations } from '@/features/classes/components/pending-invitations';
import { RosterTable } from '@/features/classes/components/roster-table';
import { useClassProgress } from '@/features/progress/api/get-class-progress';
import { ProgressSummary } from '@/features/progress/components/progress-summary';
import { getAssignmentsQueryOptions } from '@/features/assignments/api/get-assignments';
import { getClassQueryOptions } from '@/features/classes/api/get-class';
import { getInvitationsQueryOptions } from '@/features/classes/api/get-invitations';
import { getRosterQueryOptions } from '@/features/classes/api/get-roster';
import { getClassProgressQueryOptions } from '@/features/progress/api/get-class-progress';
import { prefetchLoader } from '@/lib/route-loader';

function ClassProgress({ classId }: { classId: string }) {
  const progress = useClassProgress({ id: classId });
  if (progress.isPending) return <Loading label="Loading the class's progress…" />;
  if (progress.isError)
    return <ErrorAlert error={progress.error} onRetry={() => progress.refetch()} />;
  return <ProgressSummary progress={progress.data} who="class" />;
}

export default function TeacherClassRoute() {
  const { classId = '' } = useParams();
  const item = useClass({ id: classId });
  if (item.isPending) return <Loading label="Loading the class…" />;
  if (item.isError) return <ErrorAlert error={item.error} onRetry={() => item.refetch()} />;
  const { data } = item;
  return (
    <>
      <PageHeader
        title={data.name}
        subtitle={`${data.studentCount} ${data.studentCount === 1 ? 'student' : 'students'}${data.archived ? ' · archived' : ''}`}
        actions={
          <>
            <Button
              variant="outlined"
              component={RouterLink}
              to={paths.teacher.gradebook.getHref(data.id)}
            >
              Gradebook
            </Button>
            <Button
              variant="contained"
              component={RouterLink}
              to={paths.teacher.assign.getHref({ classId: data.id })}
            >
              Assign a drill
            </Button>
          </>
        }
      />
      <Grid container spacing={3}>
        <Grid size={{ xs: 12, md: 8 }}>
          <Stack spacing={3}>
            <section>
              <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
                Assignments
              </Typography>
              <TeacherAssignmentList
                classId={data.id}
                assignmentHref={paths.teacher.assignment.getHref}
              />
            </section>
            <section>
              <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
                Students
              </Typography>
              <RosterTable classId={data.id} progressHref={paths.teacher.studentProgress.getHref} />
            </section>
            <section>
              <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
                Class progress
              </Typography>
              <ClassProgress classId={data.id} />
            </section>
          </Stack>
        </Grid>
        <Grid size={{ xs: 12, md: 4 }}>
          <Stack spacing={3}>
            <ClassCodePanel code={data.code} />
            <Paper component="section" aria-labelledby="invite-heading" sx={{ p: 2 }}>
              <Typography id="invite-heading" variant="h3" component="h2" sx={{ mb: 1.5 }}>
                Invite students
              </Typography>
              <InviteForm classId={data.id} />
              <Divider sx={{ my: 2 }} />
              <PendingInvitations classId={data.id} />
            </Paper>
            <Paper sx={{ p: 2 }}>
              <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
                Settings
              </Typography>
              <ClassSettings key={data.name} item={data} />
            </Paper>
          </Stack>
        </Grid>
      </Grid>
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['teacher'], (queryClient, { params }) => {
  const classId = params.classId ?? '';
  return [
    queryClient.ensureQueryData(getClassQueryOptions(classId)),
    queryClient.ensureQueryData(getRosterQueryOptions(classId)),
    queryClient.ensureQueryData(getAssignmentsQueryOptions({ classId })),
    queryClient.ensureQueryData(getClassProgressQueryOptions(classId)),
    queryClient.ensureQueryData(getInvitationsQueryOptions(classId)),
  ];
});
