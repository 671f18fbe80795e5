import Grid from '@mui/material/Grid';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AssignmentBrief } from '@/features/assignments/components/assignment-brief';
import { PhotoUpload } from '@/features/attempts/components/photo-upload';
import { useDrill } from '@/features/drills/api/get-drill';
import { PaletteList } from '@/features/drills/components/palette-list';
import { PhotoGuide } from '@/features/drills/components/photo-guide';
import { ReferenceCard } from '@/features/drills/components/reference-card';
import { TargetSwatches } from '@/features/drills/components/target-swatches';
import { kindWords } from '@/features/drills/types';
import { getDrillQueryOptions } from '@/features/drills/api/get-drill';
import { prefetchLoader } from '@/lib/route-loader';

export default function StudentDrillRoute() {
  const { drillId = '' } = useParams();
  const [search] = useSearchParams();
  const assignmentId = search.get('assignmentId') ?? undefined;
  const navigate = useNavigate();
  const drill = useDrill({ id: drillId });

  if (drill.isPending) return <Loading label="Loading the drill…" />;
  if (drill.isError) return <ErrorAlert error={drill.error} onRetry={() => drill.refetch()} />;
  const { data } = drill;
  return (
    <>
      <PageHeader
        title={data.title}
        subtitle={`${kindWords[data.kind].name}: ${kindWords[data.kind].what}${assignmentId ? '' : ' (practice)'}`}
      />
      {/* Phone first: the targets, then the upload, then the details and the photo guide. */}
      <Grid container spacing={3}>
        <Grid size={{ xs: 12, md: 7 }}>
          <TargetSwatches targets={data.targets} />
        </Grid>
        <Grid size={{ xs: 12, md: 5 }}>
          <Paper sx={{ p: 2.5 }}>
            <Typography variant="h3" component="h2" sx={{ mb: 1.5 }}>
              Send your swatch
            </Typography>
            {assignmentId && <AssignmentBrief assignmentId={assignmentId} />}
            <Typography variant="body2" sx={{ mb: 2 }}>
              Lay the printed reference card over your dry swatch so it shows through the window.
            </Typography>
            <PhotoUpload
              drillId={data.id}
              assignmentId={assignmentId}
              onUploaded={(attempt) => navigate(paths.attempt.getHref(attempt.id))}
            />
          </Paper>
        </Grid>
        <Grid size={{ xs: 12, md: 7 }}>
          <Stack spacing={3}>
            {data.instructions && (
              <section>
                <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
                  Instructions
                </Typography>
                <Typography sx={{ whiteSpace: 'pre-line' }}>{data.instructions}</Typography>
              </section>
            )}
            <section>
              <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
                Paints
              </Typography>
              <PaletteList palette={data.palette} />
            </section>
          </Stack>
        </Grid>
        <Grid size={{ xs: 12, md: 5 }}>
          <Stack spacing={3}>
            <Paper sx={{ p: 2.5 }}>
              <ReferenceCard drillId={data.id} />
            </Paper>
            <Paper sx={{ p: 2.5 }}>
              <PhotoGuide />
            </Paper>
          </Stack>
        </Grid>
      </Grid>
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student'], (queryClient, { params }) => [
  queryClient.ensureQueryData(getDrillQueryOptions(params.drillId ?? '')),
]);
