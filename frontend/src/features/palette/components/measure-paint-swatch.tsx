import type { Lab } from '@mixmark/common';
import CheckOutlined from '@mui/icons-material/CheckOutlined';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { KindCardButtons } from '@/components/cards/card-pdf-buttons';
import { roundLab } from '@/components/colour/round-lab';
import { MeasureWarnings } from '@/components/photo/measure-warnings';
import { MeasurePhotoPicker, MeasurePhotoStatus } from '@/components/photo/measure-photo-step';
import { SwatchStage } from '@/components/ui/swatch-stage';
import { useMeasurePaintSwatch } from '../api/measure-paint-swatch';

/**
 * "Measure from a photo" in the paint form: paint a flat swatch, lay a Mixmark card over it,
 * photograph it, send it. The server reads it (nothing is stored) and the reading goes into the
 * form's `swatchLab` for the person to save; a card with several windows lets them pick one.
 */
export function MeasurePaintSwatch({ onReading }: { onReading: (lab: Lab) => void }) {
  const panelId = useId();
  const [open, setOpen] = useState(false);
  const [chosen, setChosen] = useState<number>();
  const measure = useMeasurePaintSwatch({
    onSuccess: (measured) => {
      const [only] = measured.swatches;
      if (measured.swatches.length === 1 && only) {
        setChosen(0);
        onReading(roundLab(only.lab));
      } else setChosen(undefined);
    },
  });
  const measured = measure.isPending ? undefined : measure.data;
  const several = (measured?.swatches.length ?? 0) > 1;

  return (
    <Box>
      <Button
        variant="outlined"
        size="small"
        startIcon={<PhotoCameraOutlined />}
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen(!open)}
      >
        Measure from a photo
      </Button>
      {open && (
        <Paper
          id={panelId}
          variant="outlined"
          component="section"
          aria-labelledby={`${panelId}-title`}
          sx={{ p: 2, mt: 1.5 }}
        >
          <Stack spacing={2}>
            <Typography
              id={`${panelId}-title`}
              variant="h4"
              component="h3"
              sx={{ fontSize: '1.05rem', fontWeight: 800 }}
            >
              Measure this paint from a photo
            </Typography>
            <Box component="ol" sx={{ m: 0, pl: 2.5, '& > li': { mb: 1.5 } }}>
              <li>
                <Typography>
                  <strong>Paint a flat swatch</strong> of this paint, a little larger than the
                  card's window, and let it dry.
                </Typography>
              </li>
              <li>
                <Typography>
                  <strong>Lay a Mixmark card over it</strong> so the window shows only the paint.
                  Any Mixmark card will do; to print one, print at 100 % on matte paper and cut out
                  the window.
                </Typography>
                <KindCardButtons kind="match" what="a match card" />
              </li>
              <li>
                <Typography>
                  <strong>Photograph it in even daylight</strong>: flat, no shadow or glare, the
                  whole card in the frame.
                </Typography>
              </li>
              <li>
                <Typography>
                  <strong>Send the photo.</strong> Nothing is kept: the reading goes into this form
                  for you to save.
                </Typography>
                <MeasurePhotoPicker measure={measure} measured={Boolean(measured)} sx={{ mt: 1 }} />
              </li>
            </Box>

            <MeasurePhotoStatus measure={measure} />

            {measured && (
              <Stack spacing={1.5}>
                <Alert severity={chosen === undefined ? 'info' : 'success'} role="status">
                  {chosen === undefined
                    ? `The card had ${measured.swatches.length} windows. Choose the one that shows this paint.`
                    : several
                      ? `Window ${chosen + 1}'s reading is in the form. Save the paint to keep it.`
                      : 'Measured: the reading is in the form. Save the paint to keep it.'}
                </Alert>
                <MeasureWarnings warnings={measured.warnings} />
                {several && (
                  <SwatchStage
                    component="ul"
                    aria-label="Readings from your photo"
                    sx={{ listStyle: 'none', m: 0, p: 2, display: 'grid', gap: 1.5 }}
                  >
                    {measured.swatches.map((reading, window) => {
                      const lab = roundLab(reading.lab);
                      const inUse = chosen === window;
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
                          <Typography
                            variant="body2"
                            sx={{ fontVariantNumeric: 'tabular-nums', minWidth: 0 }}
                          >
                            Window {window + 1} · L* {lab.L.toFixed(1)} a* {lab.a.toFixed(1)} b*{' '}
                            {lab.b.toFixed(1)}
                          </Typography>
                          <Button
                            size="small"
                            variant={inUse ? 'contained' : 'outlined'}
                            aria-pressed={inUse}
                            startIcon={inUse ? <CheckOutlined /> : undefined}
                            sx={{ bgcolor: inUse ? undefined : '#fff' }}
                            onClick={() => {
                              setChosen(window);
                              onReading(lab);
                            }}
                          >
                            {inUse ? 'In the form' : `Use window ${window + 1}`}
                          </Button>
                        </Box>
                      );
                    })}
                  </SwatchStage>
                )}
              </Stack>
            )}
          </Stack>
        </Paper>
      )}
    </Box>
  );
}
