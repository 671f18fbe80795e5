import Grid from '@mui/material/Grid';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useNavigate, useParams } from 'react-router-dom';
import { LocalErrorBoundary } from '@/components/errors/local-error-boundary';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useAttempt } from '@/features/attempts/api/get-attempt';
import type { Attempt } from '@/features/attempts/types';
import { useClasses } from '@/features/classes/api/get-classes';
import { AttemptImage } from '@/features/attempts/components/attempt-image';
import { AttemptResult } from '@/features/attempts/components/attempt-result';
import { OverrideForm } from '@/features/attempts/components/override-form';
import { isPending } from '@/features/attempts/types';
import { useUser, type SessionUser } from '@/lib/auth-store';
import { getAttemptQueryOptions } from '@/features/attempts/api/get-attempt';
import { prefetchLoader } from '@/lib/route-loader';

/**
 * Who marked an overridden attempt, in words for the reader: "you" for the marker, the teacher's
 * name for a student (the API gives the marker's id; the student's classes give their teachers'
 * names), else a plain fallback. Asks for the classes only when there is an override to name.
 */
function useMarkedBy(
  attempt: Attempt | undefined,
  user: SessionUser | undefined,
): string | undefined {
  const by = attempt?.override?.by ?? null;
  const isStudent = user?.role === 'student';
  const classes = useClasses({
    queryConfig: { enabled: Boolean(by) && isStudent && by !== user?.id },
  });
  if (!attempt?.override) return undefined;
  if (by && by === user?.id) return 'you';
  if (isStudent) {
    const teacher = by
      ? classes.data?.find((klass) => klass.teacher.id === by)?.teacher
      : undefined;
    return teacher?.displayName ?? 'your teacher';
  }
  if (user?.role === 'teacher') return 'another account';
  return 'the teacher';
}

/** A student's result, or for the teacher the same with the photo and the override form. */
export default function AttemptRoute() {
  const { attemptId = '' } = useParams();
  const user = useUser();
  const navigate = useNavigate();
  const attempt = useAttempt({ id: attemptId });
  const markedBy = useMarkedBy(attempt.data, user);

  if (attempt.isPending) return <Loading label="Loading the attempt…" />;
  if (attempt.isError)
    return <ErrorAlert error={attempt.error} onRetry={() => attempt.refetch()} />;
  const { data } = attempt;
  const when = new Date(data.createdAt).toLocaleString(undefined, {
    dateStyle: 'medium',
    timeStyle: 'short',
  });

  if (user?.role !== 'teacher') {
    return (
      <>
        <PageHeader title={data.drill.title} subtitle={`Your attempt of ${when}`} />
        <AttemptResult
          attempt={data}
          markedBy={markedBy}
          onRetry={() =>
            navigate(paths.student.drill.getHref(data.drill.id, data.assignmentId ?? undefined))
          }
        />
      </>
    );
  }

  return (
    <>
      <PageHeader
        title={`${data.student.displayName}: ${data.drill.title}`}
        subtitle={`Sent ${when}`}
      />
      <Grid container spacing={3}>
        <Grid size={{ xs: 12, lg: 7 }}>
          <AttemptResult attempt={data} markedBy={markedBy} />
        </Grid>
        <Grid size={{ xs: 12, lg: 5 }}>
          <Stack spacing={3}>
            <Paper sx={{ p: 2 }}>
              <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
                The photo
              </Typography>
              <LocalErrorBoundary what="photo">
                <AttemptImage
                  id={data.id}
                  which="photo"
                  alt={`Photo sent by ${data.student.displayName}`}
                />
              </LocalErrorBoundary>
            </Paper>
            {!isPending(data.state) && data.state !== 'failed' && (
              <Paper sx={{ p: 2 }}>
                <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
                  Your mark
                </Typography>
                <OverrideForm attempt={data} />
              </Paper>
            )}
          </Stack>
        </Grid>
      </Grid>
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student', 'teacher', 'admin'], (queryClient, { params }) => [
  queryClient.ensureQueryData(getAttemptQueryOptions(params.attemptId ?? '')),
]);
