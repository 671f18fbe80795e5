import { targetCountByKind, type DrillKind, type Lab } from '@mixmark/common';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { ErrorAlert } from '@/components/ui/error-alert';
import { errorMessage } from '@/lib/error-words';
import { swatchSurface } from '@/theme/theme';
import { useDownloadCardPdf } from '../api/download-card-pdf';
import { useMeasureTargets, type MeasuredTargets } from '../api/measure-targets';
import { kindWords } from '../types';
import { defaultPaper } from './reference-card';

/** One decimal, as the Lab fields take it. */
const roundLab = ({ L, a, b }: Lab): Lab => ({
  L: +L.toFixed(1),
  a: +a.toFixed(1),
  b: +b.toFixed(1),
});

function CardDownload({ drillId }: { drillId: string }) {
  const paper = defaultPaper();
  const download = useDownloadCardPdf({ drillId });
  return (
    <Stack spacing={1} sx={{ alignItems: 'flex-start' }}>
      <Button
        variant="outlined"
        size="small"
        startIcon={<DownloadOutlined />}
        onClick={() => download.mutate(paper)}
        disabled={download.isPending}
      >
        {download.isPending
          ? 'Preparing the PDF…'
          : `Download this drill's card (PDF, ${paper === 'A4' ? 'A4' : 'US Letter'})`}
      </Button>
      {download.isError && <ErrorAlert error={download.error} />}
    </Stack>
  );
}

/**
 * Targets from the teacher's own painted swatch: print the card, photograph the dry swatch
 * through its window(s), upload; the server measures the photo with the students' pipeline
 * (nothing is stored) and the readings fill the targets. A failed photo says why, in words.
 */
export function MeasureSwatch({
  drillId,
  kind,
  targetCount,
  onFill,
  onUse,
}: {
  /** The saved drill whose card can be printed; a new drill has none yet. */
  drillId?: string;
  kind: DrillKind;
  targetCount: number;
  /** Replace every target with these readings, in window order. */
  onFill: (labs: Lab[]) => void;
  /** Put one reading into one target. */
  onUse: (index: number, lab: Lab) => void;
}) {
  const panelId = useId();
  const inputId = useId();
  const [open, setOpen] = useState(false);
  const [filled, setFilled] = useState(false);
  const [used, setUsed] = useState<Record<number, number>>({});
  const [min, max] = targetCountByKind[kind];
  const measure = useMeasureTargets({
    onSuccess: (measured) => {
      setUsed({});
      const fits = measured.targets.length >= min && measured.targets.length <= max;
      setFilled(fits);
      if (fits) onFill(measured.targets.map((t) => roundLab(t.lab)));
    },
  });
  const measured: MeasuredTargets | undefined = measure.data;

  return (
    <Box>
      <Button
        variant="outlined"
        startIcon={<PhotoCameraOutlined />}
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen(!open)}
      >
        Measure my painted swatch
      </Button>
      {open && (
        <Paper
          id={panelId}
          component="section"
          aria-labelledby={`${panelId}-title`}
          sx={{ p: 2, mt: 1.5 }}
        >
          <Stack spacing={2}>
            <Typography
              id={`${panelId}-title`}
              variant="h4"
              component="h3"
              sx={{ fontSize: '1.1rem', fontWeight: 800 }}
            >
              Targets from your own painted swatch
            </Typography>
            <Box component="ol" sx={{ m: 0, pl: 2.5, '& > li': { mb: 1.5 } }}>
              <li>
                <Typography>
                  <strong>Print the card</strong> at 100 %, on matte paper, and cut out its
                  window(s).
                </Typography>
                {drillId ? (
                  <CardDownload drillId={drillId} />
                ) : (
                  <Typography variant="body2" color="text.secondary">
                    A new drill has no card yet: save it first and print its card on the edit page,
                    or use the card of any drill you have printed (its windows are read in order).
                  </Typography>
                )}
              </li>
              <li>
                <Typography>
                  <strong>Photograph your dry swatch</strong> under the card, flat, in even
                  daylight, with no shadow or glare and the whole card in the frame.
                </Typography>
              </li>
              <li>
                <Typography>
                  <strong>Send the photo.</strong> Each window's reading becomes a target (window 1
                  first).
                </Typography>
                <input
                  id={inputId}
                  type="file"
                  accept="image/*"
                  capture="environment"
                  style={{ position: 'absolute', width: 1, height: 1, opacity: 0 }}
                  onChange={(event) => {
                    const photo = event.target.files?.[0];
                    event.target.value = '';
                    if (photo) measure.mutate(photo);
                  }}
                />
                <Button
                  component="label"
                  htmlFor={inputId}
                  variant="contained"
                  startIcon={<PhotoCameraOutlined />}
                  disabled={measure.isPending}
                  sx={{ mt: 1 }}
                >
                  {measured || measure.isError
                    ? 'Measure another photo'
                    : 'Take or choose the photo'}
                </Button>
              </li>
            </Box>

            {measure.isPending && (
              <Stack spacing={0.5}>
                <LinearProgress
                  variant={measure.progress < 1 ? 'determinate' : 'indeterminate'}
                  value={Math.round(measure.progress * 100)}
                  aria-label="Upload progress"
                />
                <Typography variant="body2" role="status">
                  {measure.progress < 1
                    ? `Sending… ${Math.round(measure.progress * 100)} %`
                    : 'Measuring the swatch…'}
                </Typography>
              </Stack>
            )}
            {measure.isError && (
              <Alert severity="error" role="alert">
                <strong>The swatch could not be measured.</strong> {errorMessage(measure.error)}
              </Alert>
            )}

            {measured && !measure.isPending && (
              <Stack spacing={1.5}>
                <Alert severity={filled ? 'success' : 'info'} role="status">
                  {filled
                    ? `Measured ${measured.targets.length} ${measured.targets.length === 1 ? 'window' : 'windows'}: the targets above now hold your swatch, as Lab.`
                    : `Measured ${measured.targets.length} ${measured.targets.length === 1 ? 'window' : 'windows'}; a ${kindWords[kind].name.toLowerCase()} drill takes ${min === max ? min : `${min} to ${max}`} ${max === 1 ? 'target' : 'targets'}. Choose where each reading goes.`}
                  {measured.cardKind !== kind &&
                    ` The card in the photo was printed for a ${kindWords[measured.cardKind].name.toLowerCase()} drill.`}
                </Alert>
                {measured.warnings.length > 0 && (
                  <Alert severity="warning">
                    <Typography variant="body2" sx={{ fontWeight: 700 }}>
                      Measured, with a caution:
                    </Typography>
                    <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
                      {measured.warnings.map((warning) => (
                        <li key={`${warning.code}-${warning.message}`}>{warning.message}</li>
                      ))}
                    </Box>
                  </Alert>
                )}
                <Box
                  component="ul"
                  aria-label="Readings from your swatch"
                  sx={{
                    listStyle: 'none',
                    m: 0,
                    p: 2,
                    bgcolor: swatchSurface,
                    color: '#000',
                    borderRadius: 1.5,
                    display: 'grid',
                    gap: 1.5,
                  }}
                >
                  {measured.targets.map((reading, window) => {
                    const lab = roundLab(reading.lab);
                    return (
                      <Box
                        component="li"
                        key={window}
                        sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}
                      >
                        <Box
                          role="img"
                          aria-label={`Window ${window + 1}: ${reading.hex}`}
                          sx={{ width: 56, height: 40, bgcolor: reading.hex, borderRadius: 1 }}
                        />
                        <Typography variant="body2" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                          Window {window + 1} · {reading.hex} · L* {lab.L.toFixed(1)} a*{' '}
                          {lab.a.toFixed(1)} b* {lab.b.toFixed(1)}
                        </Typography>
                        {!filled &&
                          Array.from({ length: targetCount }, (_, index) => (
                            <Button
                              key={index}
                              size="small"
                              variant={used[index] === window ? 'contained' : 'outlined'}
                              sx={{ bgcolor: used[index] === window ? undefined : '#fff' }}
                              onClick={() => {
                                onUse(index, lab);
                                setUsed({ ...used, [index]: window });
                              }}
                            >
                              {used[index] === window
                                ? `In target ${index + 1}`
                                : `Use for target ${index + 1}`}
                            </Button>
                          ))}
                      </Box>
                    );
                  })}
                </Box>
              </Stack>
            )}
          </Stack>
        </Paper>
      )}
    </Box>
  );
}
