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
import { useId, useState } from 'react';
import type { Mark } from '@mixmark/common';
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

const dateTime = (value: string) =>
  new Date(value).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** The machine's ΔE00 in one phrase: one number for one target, the range for several. */
function machineDeltaE(mark: Mark): string | undefined {
  const values = mark.targets.map((target) => target.deltaE);
  if (values.length === 0) return undefined;
  if (values.length === 1) return `ΔE00 ${values[0].toFixed(1)}`;
  const low = Math.min(...values).toFixed(1);
  const high = Math.max(...values).toFixed(1);
  return low === high
    ? `ΔE00 ${low} on each of its ${values.length} swatches`
    : `ΔE00 from ${low} to ${high} across its ${values.length} swatches`;
}

/** What the machine said, in one sentence, once a teacher's mark has replaced it. */
function machineSentence(attempt: Attempt): string {
  const { machine, mark } = attempt;
  if (!machine) return 'The machine could not measure this photo, so it gave no mark of its own.';
  const verdict = `${machine.pass ? 'Pass' : 'Not yet'} · ${machine.score}/100`;
  const deltaE = mark ? machineDeltaE(mark) : undefined;
  return deltaE
    ? `The machine measured ${deltaE} and marked it ${verdict}.`
    : `The machine marked it ${verdict}.`;
}

/** The teacher's mark, first and as the one that stands: outcome, score, their words, who and when. */
function TeacherMark({
  override,
  markedBy,
}: {
  override: NonNullable<Attempt['override']>;
  markedBy: string;
}) {
  const headingId = useId();
  return (
    <Paper component="section" aria-labelledby={headingId} variant="outlined" sx={{ p: 2.5 }}>
      <Stack spacing={1.5}>
        <Typography variant="h3" component="h2" id={headingId}>
          The teacher's mark
        </Typography>
        <Stack
          direction="row"
          spacing={2}
          sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 1 }}
        >
          <PassBadge pass={override.pass} score={override.score} />
          <Typography sx={{ fontWeight: 700 }}>This is the mark that stands.</Typography>
        </Stack>
        {override.comment ? (
          <Box
            component="blockquote"
            aria-label="The teacher's comment"
            sx={{ m: 0, pl: 2, py: 0.5, borderLeft: 4, borderColor: 'divider' }}
          >
            <Typography sx={{ whiteSpace: 'pre-line', overflowWrap: 'anywhere' }}>
              {override.comment}
            </Typography>
          </Box>
        ) : (
          <Typography color="text.secondary">No comment was left with this mark.</Typography>
        )}
        <Typography variant="body2" color="text.secondary">
          Marked by {markedBy} on {dateTime(override.at)}.
        </Typography>
      </Stack>
    </Paper>
  );
}

/**
 * An attempt's outcome: measuring, retake, failure, or the mark with its swatches and advice.
 * When a teacher has marked it, their mark comes first and the machine's follows, kept for reference.
 * `markedBy` names who marked it in words for the reader ("you", a name); "the teacher" when unknown.
 */
export function AttemptResult({
  attempt,
  onRetry,
  markedBy = 'the teacher',
}: {
  attempt: Attempt;
  onRetry?: () => void;
  markedBy?: string;
}) {
  const [greyscale, setGreyscale] = useState(false);
  const machineHeadingId = useId();

  if (attempt.state === 'queued' || attempt.state === 'measuring')
    return <AttemptProgress state={attempt.state} />;
  if (attempt.state === 'failed') {
    return (
      <Alert
        severity="error"
        action={
          onRetry && (
            <Button color="inherit" onClick={onRetry}>
              Try again
            </Button>
          )
        }
      >
        <AlertTitle>This photo could not be marked</AlertTitle>
        {attempt.failureReason ?? 'Something went wrong while measuring. Send the photo again.'}
      </Alert>
    );
  }

  const { mark, override } = attempt;
  const measured = (
    <>
      {attempt.state === 'needs-retake' && <RetakeNotice attempt={attempt} onRetry={onRetry} />}
      {attempt.quality.warnings.length > 0 && (
        <Alert severity="info">
          {attempt.quality.warnings.map((warning) => (
            <div key={warning.code}>{warning.message}</div>
          ))}
        </Alert>
      )}
      {!override && mark && attempt.pass !== null && (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <PassBadge pass={attempt.pass} score={attempt.score} />
        </Stack>
      )}
      {mark && (
        <>
          <SwatchStage aria-label="Target and your swatch">
            <Stack
              direction="row"
              sx={{
                justifyContent: 'space-between',
                alignItems: 'center',
                flexWrap: 'wrap',
                mb: 2,
              }}
            >
              <Typography sx={{ fontWeight: 800 }}>Target and your swatch</Typography>
              <FormControlLabel
                control={
                  <Switch checked={greyscale} onChange={(e) => setGreyscale(e.target.checked)} />
                }
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
                      <ColourSwatch
                        lab={target.reading}
                        greyscale={greyscale}
                        caption="Your swatch"
                      />
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
            <Typography variant="h3" component={override ? 'h3' : 'h2'}>
              {override ? "The machine's advice" : 'What to change'}
            </Typography>
            <FeedbackList feedback={mark.feedback} />
          </Box>
        </>
      )}
      {attempt.hasOverlay && (
        <Box>
          <Typography variant="h3" component={override ? 'h3' : 'h2'} sx={{ mb: 1 }}>
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
    </>
  );

  return (
    <Stack spacing={3}>
      {override ? (
        <>
          <TeacherMark override={override} markedBy={markedBy} />
          <Stack component="section" aria-labelledby={machineHeadingId} spacing={3}>
            <Box>
              <Typography variant="h3" component="h2" id={machineHeadingId}>
                What the machine measured
              </Typography>
              <Typography color="text.secondary">
                {machineSentence(attempt)} The teacher's mark above replaces it; the measurement is
                kept here for reference.
              </Typography>
            </Box>
            {measured}
          </Stack>
        </>
      ) : (
        measured
      )}
      {onRetry && attempt.state === 'graded' && (
        <Button variant="outlined" onClick={onRetry} sx={{ alignSelf: 'flex-start' }}>
          Paint it again
        </Button>
      )}
    </Stack>
  );
}
