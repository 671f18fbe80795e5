import { useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { OutboxView } from '@/features/outbox/components/outbox-view';

/** The development outbox (`/dev/outbox`, one message at `/dev/outbox/:messageId`); open to anyone, like the API route. */
export default function DevOutboxRoute() {
  const { messageId } = useParams();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="Outbox (development)"
        subtitle="The e-mails this development server would have sent, kept here instead of delivered."
      />
      <OutboxView
        selectedId={messageId}
        messageHref={paths.devOutbox.message.getHref}
        onCleared={() => navigate(paths.devOutbox.getHref(), { replace: true })}
      />
    </>
  );
}
