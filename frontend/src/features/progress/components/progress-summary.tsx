import LocalFireDepartmentOutlined from '@mui/icons-material/LocalFireDepartmentOutlined';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { lazy, Suspense } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { LocalErrorBoundary } from '@/components/errors/local-error-boundary';
import { Loading } from '@/components/ui/loading';
import type { Progress } from '../types';
import { ProgressTable } from './progress-table';

/** The charts library is heavy, so it comes in its own chunk when progress is first shown. */
const ProgressCharts = lazy(() => import('./progress-charts'));

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <Paper sx={{ p: 2, flex: '1 1 140px' }}>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography sx={{ fontSize: '1.6rem', fontWeight: 800 }}>{value}</Typography>
    </Paper>
  );
}

/** Streak, totals, weekly charts and the same numbers as a table; or what to do when empty. */
export function ProgressSummary({ progress, who = 'you' }: { progress: Progress; who?: 'you' | 'student' | 'class' }) {
  const { totals, streakDays, weeks } = progress;
  if (totals.attempts === 0) {
    const body = {
      you: 'Paint a drill and send a photo: your weekly progress appears here.',
      student: 'This student has not sent a photo yet.',
      class: 'Nobody in this class has sent a photo yet.',
    }[who];
    return <EmptyState title="No attempts yet">{body}</EmptyState>;
  }
  const streakWords = streakDays === 1 ? '1 day' : `${streakDays} days`;
  return (
    <Stack spacing={3}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 2 }}>
        <Paper sx={{ p: 2, flex: '1 1 180px' }}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <LocalFireDepartmentOutlined aria-hidden sx={{ color: 'secondary.main' }} />
            <Typography variant="body2" color="text.secondary">
              Practice streak
            </Typography>
          </Stack>
          <Typography sx={{ fontSize: '1.6rem', fontWeight: 800 }}>{streakWords}</Typography>
          <Typography variant="body2" color="text.secondary">
            {streakDays === 0 ? 'Paint today to start a new streak.' : 'Days in a row with at least one attempt.'}
          </Typography>
        </Paper>
        <Figure label="Attempts" value={String(totals.attempts)} />
        <Figure label="Graded" value={String(totals.graded)} />
        <Figure label="Passed" value={String(totals.passed)} />
      </Stack>
      <LocalErrorBoundary what="progress chart">
        <Suspense fallback={<Loading label="Drawing the charts…" />}>
          <ProgressCharts weeks={weeks} />
        </Suspense>
      </LocalErrorBoundary>
      <ProgressTable weeks={weeks} caption="The same numbers, week by week (means over graded attempts; lower errors are closer)" />
    </Stack>
  );
}
