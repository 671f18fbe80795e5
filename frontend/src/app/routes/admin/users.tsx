import { PageHeader } from '@/components/ui/page-header';
import { UserTable } from '@/features/users/components/user-table';
import { useUser } from '@/lib/auth-store';

export default function AdminUsersRoute() {
  const user = useUser();
  return (
    <>
      <PageHeader title="Accounts and roles" subtitle="Your own role cannot be changed here." />
      <UserTable currentUserId={user?.id} />
    </>
  );
}
