import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { JoinClassForm } from '@/features/classes/components/join-class-form';

export default function JoinClassRoute() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Join a class" subtitle="Your teacher shows or sends the class code." />
      <JoinClassForm onJoined={() => setTimeout(() => navigate(paths.student.assignments.getHref()), 1200)} />
    </>
  );
}
