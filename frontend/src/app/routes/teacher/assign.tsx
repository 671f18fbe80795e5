import Button from '@mui/material/Button';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AssignForm } from '@/features/assignments/components/assign-form';
import { useClasses } from '@/features/classes/api/get-classes';
import { useDrills } from '@/features/drills/api/get-drills';

export default function AssignRoute() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const classes = useClasses();
  const drills = useDrills({ scope: 'all' });

  let body;
  if (classes.isPending || drills.isPending) body = <Loading />;
  else if (classes.isError) body = <ErrorAlert error={classes.error} onRetry={() => classes.refetch()} />;
  else if (drills.isError) body = <ErrorAlert error={drills.error} onRetry={() => drills.refetch()} />;
  else if (classes.data.length === 0 || drills.data.length === 0) {
    body = (
      <EmptyState title={classes.data.length === 0 ? 'Create a class first' : 'Create a drill first'}>
        <Button
          component={RouterLink}
          to={classes.data.length === 0 ? paths.teacher.dashboard.getHref() : paths.teacher.newDrill.getHref()}
        >
          {classes.data.length === 0 ? 'Go to your classes' : 'New drill'}
        </Button>
      </EmptyState>
    );
  } else {
    body = (
      <AssignForm
        classes={classes.data.filter((c) => !c.archived)}
        drills={drills.data}
        defaultClassId={search.get('classId') ?? ''}
        defaultDrillId={search.get('drillId') ?? ''}
        onAssigned={(created) => navigate(paths.teacher.class.getHref(created.classId))}
      />
    );
  }
  return (
    <>
      <PageHeader title="Assign a drill" subtitle="Every student in the class sees it with its due date." />
      {body}
    </>
  );
}
