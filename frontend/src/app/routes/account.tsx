import Paper from '@mui/material/Paper';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { getProfileQueryOptions, useProfile } from '@/features/account/api/get-profile';
import { AccountForm } from '@/features/account/components/account-form';
import { prefetchLoader } from '@/lib/route-loader';

export default function AccountRoute() {
  const profile = useProfile();
  return (
    <>
      <PageHeader
        title="Your account"
        subtitle="The name others see, and the mail Mixmark sends you."
      />
      {profile.isPending ? (
        <Loading label="Loading your account…" />
      ) : profile.isError ? (
        <ErrorAlert error={profile.error} onRetry={() => profile.refetch()} />
      ) : (
        <Paper sx={{ p: { xs: 2, sm: 3 } }}>
          <AccountForm key={profile.data.id} profile={profile.data} />
        </Paper>
      )}
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student', 'teacher', 'admin'], (queryClient) => [queryClient.ensureQueryData(getProfileQueryOptions())]);
