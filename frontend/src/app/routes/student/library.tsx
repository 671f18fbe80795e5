import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { DrillList } from '@/features/drills/components/drill-list';

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
