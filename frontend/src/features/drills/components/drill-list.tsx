import { labToHex } from '@mixmark/common';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { swatchSurface } from '@/theme/theme';
import { useDrills } from '../api/get-drills';
import { kindWords, type Drill, type DrillScope } from '../types';

/** Drills as cards: title, kind, the targets as a strip of chips on grey, and the caller's actions. */
export function DrillList({
  scope,
  actions,
  empty,
}: {
  scope: DrillScope;
  actions: (drill: Drill) => ReactNode;
  empty: ReactNode;
}) {
  const drills = useDrills({ scope });
  if (drills.isPending) return <Loading label="Loading drills…" />;
  if (drills.isError) return <ErrorAlert error={drills.error} onRetry={() => drills.refetch()} />;
  if (drills.data.length === 0) return <EmptyState title="No drills here yet">{empty}</EmptyState>;
  return (
    <Grid container spacing={2}>
      {drills.data.map((drill) => (
        <Grid key={drill.id} size={{ xs: 12, sm: 6, md: 4 }}>
          <Card component="article" sx={{ height: '100%', display: 'flex', flexDirection: 'column' }}>
            <Stack direction="row" spacing={0.5} sx={{ bgcolor: swatchSurface, p: 1.5 }} aria-hidden>
              {drill.targets.map((target, index) => (
                <Box key={index} sx={{ flex: 1, height: 40, borderRadius: 1, bgcolor: labToHex(target.lab) }} />
              ))}
            </Stack>
            <CardContent sx={{ flexGrow: 1 }}>
              <Typography variant="h3" component="h2">
                {drill.title}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                {kindWords[drill.kind].name}
                {drill.visibility === 'public' ? ' · in the public library' : ''}
              </Typography>
            </CardContent>
            <CardActions>{actions(drill)}</CardActions>
          </Card>
        </Grid>
      ))}
    </Grid>
  );
}
