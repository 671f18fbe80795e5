import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { DrillList } from '@/features/drills/components/drill-list';
import { getDrillsQueryOptions } from '@/features/drills/api/get-drills';
import { prefetchLoader } from '@/lib/route-loader';

export default function PracticeLibraryRoute() {
  return (
    <>
      <PageHeader title="Practice library" subtitle="Drills anyone can paint, marked the same way as your assignments." />
      <DrillList
        scope="library"
        empty="No public drills yet. Check back soon."
        actions={(drill) => (
          <Button component={RouterLink} to={paths.student.drill.getHref(drill.id)} aria-label={`Practise ${drill.title}`}>
            Practise
          </Button>
        )}
      />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient) => [
  queryClient.ensureQueryData(getDrillsQueryOptions({ scope: 'library' })),
]);
