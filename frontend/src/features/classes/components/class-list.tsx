import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Grid from '@mui/material/Grid';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { useClasses } from '../api/get-classes';

/** The teacher's classes as cards, each with its code and head count. */
export function ClassList({ classHref }: { classHref: (id: string) => string }) {
  const classes = useClasses();
  if (classes.isPending) return <Loading label="Loading your classes…" />;
  if (classes.isError) return <ErrorAlert error={classes.error} onRetry={() => classes.refetch()} />;
  if (classes.data.length === 0) {
    return <EmptyState title="No classes yet">Create your first class above; students join it with its code.</EmptyState>;
  }
  return (
    <Grid container spacing={2}>
      {classes.data.map((item) => (
        <Grid key={item.id} size={{ xs: 12, sm: 6, md: 4 }}>
          <Card>
            <CardActionArea component={RouterLink} to={classHref(item.id)}>
              <CardContent>
                <Typography variant="h3" component="h3">
                  {item.name}
                </Typography>
                <Typography color="text.secondary">
                  {item.studentCount} {item.studentCount === 1 ? 'student' : 'students'}
                  {item.code ? ` · code ${item.code}` : ''}
                </Typography>
              </CardContent>
            </CardActionArea>
          </Card>
        </Grid>
      ))}
    </Grid>
  );
}
