import { useNavigate, useParams } from 'react-router-dom';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useAssignment } from '@/features/assignments/api/get-assignment';
import { AssignmentManageActions } from '@/features/assignments/components/assignment-manage-actions';
import { dueWords } from '@/features/assignments/components/due-date';
import { AttemptList } from '@/features/attempts/components/attempt-list';
import { getAssignmentQueryOptions } from '@/features/assignments/api/get-assignment';
import { prefetchLoader } from '@/lib/route-loader';

export default function TeacherAssignmentRoute() {
  const { assignmentId = '' } = useParams();
  const navigate = useNavigate();
  const assignment = useAssignment({ id: assignmentId });
  if (assignment.isPending) return <Loading label="Loading the assignment…" />;
  if (assignment.isError) return <ErrorAlert error={assignment.error} onRetry={() => assignment.refetch()} />;
  const { data } = assignment;
  return (
    <>
      <PageHeader
        title={data.drill.title}
        subtitle={`${data.className} · ${dueWords(data.dueAt)}`}
        actions={
          <AssignmentManageActions
            assignment={data}
            onDeleted={() => navigate(paths.teacher.class.getHref(data.classId), { replace: true })}
          />
        }
      />
      <AttemptList
        filter={{ assignmentId }}
        showStudent
        attemptHref={paths.attempt.getHref}
        emptyText="No student has sent a photo for this assignment yet."
      />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['teacher'], (queryClient, { params }) => [
  queryClient.ensureQueryData(getAssignmentQueryOptions(params.assignmentId ?? '')),
]);
