import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { useMyProgress } from '@/features/progress/api/get-my-progress';
import { ProgressSummary } from '@/features/progress/components/progress-summary';
import { getMyProgressQueryOptions } from '@/features/progress/api/get-my-progress';
import { prefetchLoader } from '@/lib/route-loader';

export default function StudentProgressRoute() {
  const progress = useMyProgress();
  return (
    <>
      <PageHeader title="Your progress" subtitle="Value, temperature and chroma errors week by week: watch them shrink." />
      {progress.isPending && <Loading label="Loading your progress…" />}
      {progress.isError && <ErrorAlert error={progress.error} onRetry={() => progress.refetch()} />}
      {progress.data && <ProgressSummary progress={progress.data} />}
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient) => [queryClient.ensureQueryData(getMyProgressQueryOptions())]);
