import Button from '@mui/material/Button';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useGradebook } from '@/features/assignments/api/get-gradebook';
import { GradebookTable } from '@/features/assignments/components/gradebook-table';
import { getGradebookQueryOptions } from '@/features/assignments/api/get-gradebook';
import { prefetchLoader } from '@/lib/route-loader';

export default function TeacherGradebookRoute() {
  const { classId = '' } = useParams();
  const book = useGradebook({ classId });
  return (
    <>
      <PageHeader
        title={book.data ? `Gradebook: ${book.data.className}` : 'Gradebook'}
        subtitle="Best score and standing per assignment; open a mark to see the latest attempt."
        actions={
          <Button component={RouterLink} to={paths.teacher.class.getHref(classId)}>
            Back to the class
          </Button>
        }
      />
      {book.isPending && <Loading label="Loading the gradebook…" />}
      {book.isError && <ErrorAlert error={book.error} onRetry={() => book.refetch()} />}
      {book.data && <GradebookTable book={book.data} />}
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['teacher'], (queryClient, { params }) => [
  queryClient.ensureQueryData(getGradebookQueryOptions(params.classId ?? '')),
]);
