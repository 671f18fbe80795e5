import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AttemptList } from '@/features/attempts/components/attempt-list';
import { getAttemptsQueryOptions } from '@/features/attempts/api/get-attempts';
import { prefetchLoader } from '@/lib/route-loader';

export default function HistoryRoute() {
  return (
    <>
      <PageHeader title="Your attempts" subtitle="Every photo you have sent, newest first." />
      <AttemptList attemptHref={paths.attempt.getHref} emptyText="Paint a drill and send a photo; your marks collect here." />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient) => [queryClient.ensureQueryData(getAttemptsQueryOptions())]);
