import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { useParams } from 'react-router-dom';
import { useStudentProgress } from '@/features/progress/api/get-student-progress';
import { ProgressSummary } from '@/features/progress/components/progress-summary';

export default function TeacherStudentProgressRoute() {
  const { studentId = '' } = useParams();
  const progress = useStudentProgress({ id: studentId });
  const name = progress.data?.student?.displayName;
  return (
    <>
      <PageHeader title={name ? `Progress of ${name}` : 'Student progress'} subtitle="Every attempt this student has sent, by week." />
      {progress.isPending && <Loading label="Loading the student's progress…" />}
      {progress.isError && <ErrorAlert error={progress.error} onRetry={() => progress.refetch()} />}
      {progress.data && <ProgressSummary progress={progress.data} who="student" />}
    </>
  );
}
