import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import Grid from '@mui/material/Grid';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { ColourSwatch } from '@/components/colour/colour-swatch';
import { LocalErrorBoundary } from '@/components/errors/local-error-boundary';
import { PassBadge } from '@/components/ui/pass-badge';
import { SwatchStage } from '@/components/ui/swatch-stage';
import type { Attempt } from '../types';
import { AttemptImage } from './attempt-image';
import { AttemptProgress } from './attempt-progress';
import { DeltaEParts } from './delta-e-parts';
import { FeedbackList } from './feedback-list';

/** Why the photo could not be measured, and what to do; a retake is not a failed mix. */
function RetakeNotice({ attempt, onRetry }: { attempt: Attempt; onRetry?: () => void }) {
  return (
    <Alert
      severity="warning"
      action={
        onRetry && (
          <Button color="inherit" onClick={onRetry}>
            Retake
          </Button>
        )
      }
    >
      <AlertTitle>The photo could not be measured</AlertTitle>
      <ul style={{ margin: 0, paddingLeft: '1.2em' }}>
        {attempt.quality.errors.map((error) => (
          <li key={error.code}>{error.message}</li>
        ))}
      </ul>
    </Alert>
  );
}

/** An attempt's outcome: measuring, retake, failure, or the mark with its swatches and advice. */
export function AttemptResult({ attempt, onRetry }: { attempt: Attempt; onRetry?: () => void }) {
  const [greyscale, setGreyscale] = useState(false);

  if (attempt.state === 'queued' || attempt.state === 'measuring') return <AttemptProgress state={attempt.state} />;
  if (attempt.state === 'failed') {
    return (
      <Alert severity="error" action={onRetry && <Button color="inherit" onClick={onRetry}>Try again</Button>}>
        <AlertTitle>This photo could not be marked</AlertTitle>
        {attempt.failureReason ?? 'Something went wrong while measuring. Send the photo again.'}
      </Alert>
    );
  }

  const { mark } = attempt;
  return (
    <Stack spacing={3}>
      {attempt.state === 'needs-retake' && <RetakeNotice attempt={attempt} onRetry={onRetry} />}
      {attempt.quality.warnings.length > 0 && (
        <Alert severity="info">
          {attempt.quality.warnings.map((warning) => (
            <div key={warning.code}>{warning.message}</div>
          ))}
        </Alert>
      )}
      {mark && attempt.pass !== null && (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <PassBadge pass={attempt.pass} score={attempt.score} />
          {attempt.override && (
            <Typography>
              Marked by the teacher{attempt.machine ? ` (the machine said ${attempt.machine.score}/100)` : ''}.
            </Typography>
          )}
        </Stack>
      )}
      {attempt.override?.comment && (
        <Paper sx={{ p: 2 }}>
          <Typography variant="body2" color="text.secondary">
            Teacher's comment
          </Typography>
          <Typography>{attempt.override.comment}</Typography>
        </Paper>
      )}
      {mark && (
        <>
          <SwatchStage aria-label="Target and your swatch">
            <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', flexWrap: 'wrap', mb: 2 }}>
              <Typography sx={{ fontWeight: 800 }}>Target and your swatch</Typography>
              <FormControlLabel
                control={<Switch checked={greyscale} onChange={(e) => setGreyscale(e.target.checked)} />}
                label="Value only (greyscale)"
                sx={{ color: '#000', mr: 0 }}
              />
            </Stack>
            <Stack spacing={3}>
              {mark.targets.map((target) => (
                <Grid container spacing={2} key={target.index}>
                  <Grid size={{ xs: 12, md: 6 }}>
                    <Stack direction="row" spacing={2}>
                      <ColourSwatch
                        lab={target.target}
                        greyscale={greyscale}
                        caption={mark.targets.length > 1 ? `Target ${target.index + 1}` : 'Target'}
                      />
                      <ColourSwatch lab={target.reading} greyscale={greyscale} caption="Your swatch" />
                    </Stack>
                  </Grid>
                  <Grid size={{ xs: 12, md: 6 }}>
                    <Box sx={{ bgcolor: 'background.paper', borderRadius: 1 }}>
                      <DeltaEParts mark={target} />
                    </Box>
                  </Grid>
                </Grid>
              ))}
            </Stack>
          </SwatchStage>
          <Box>
            <Typography variant="h3" component="h2">
              What to change
            </Typography>
            <FeedbackList feedback={mark.feedback} />
          </Box>
        </>
      )}
      {attempt.hasOverlay && (
        <Box>
          <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
            What was measured
          </Typography>
          <LocalErrorBoundary what="overlay">
            <AttemptImage
              id={attempt.id}
              which="overlay"
              alt="Your photo with the card's outline and the measured window marked"
            />
          </LocalErrorBoundary>
        </Box>
      )}
      {onRetry && attempt.state === 'graded' && (
        <Button variant="outlined" onClick={onRetry} sx={{ alignSelf: 'flex-start' }}>
          Paint it again
        </Button>
      )}
    </Stack>
  );
}
