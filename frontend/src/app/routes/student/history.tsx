import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AttemptList } from '@/features/attempts/components/attempt-list';

export default function HistoryRoute() {
  return (
    <>
      <PageHeader title="Your attempts" subtitle="Every photo you have sent, newest first." />
      <AttemptList attemptHref={paths.attempt.getHref} emptyText="Paint a drill and send a photo; your marks collect here." />
    </>
  );
}
