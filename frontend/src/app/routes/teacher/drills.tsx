import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { DrillList } from '@/features/drills/components/drill-list';
import { DrillManageActions } from '@/features/drills/components/drill-manage-actions';
import { getDrillsQueryOptions } from '@/features/drills/api/get-drills';
import { prefetchLoader } from '@/lib/route-loader';

export default function TeacherDrillsRoute() {
  return (
    <>
      <PageHeader
        title="Your drills"
        actions={
          <Button variant="contained" component={RouterLink} to={paths.teacher.newDrill.getHref()}>
            New drill
          </Button>
        }
      />
      <DrillList
        scope="mine"
        empty="Create a drill: a colour to match, a value ladder, a warm and cool pair, a neutral grey or a wash."
        actions={(drill) => (
          <>
            <Button component={RouterLink} to={paths.teacher.editDrill.getHref(drill.id)} aria-label={`Edit ${drill.title}`}>
              Edit
            </Button>
            <Button component={RouterLink} to={paths.teacher.assign.getHref({ drillId: drill.id })} aria-label={`Assign ${drill.title}`}>
              Assign
            </Button>
            <DrillManageActions drill={drill} />
          </>
        )}
      />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['teacher'], (queryClient) => [
  queryClient.ensureQueryData(getDrillsQueryOptions({ scope: 'mine' })),
]);
