import { targetCountByKind, type DrillKind, type Lab } from '@mixmark/common';
import PhotoCameraOutlined from '@mui/icons-material/PhotoCameraOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { CardPdfButtons, KindCardButtons } from '@/components/cards/card-pdf-buttons';
import { roundLab } from '@/components/colour/round-lab';
import { MeasureWarnings } from '@/components/photo/measure-warnings';
import { MeasurePhotoPicker, MeasurePhotoStatus } from '@/components/photo/measure-photo-step';
import { swatchSurface } from '@/theme/theme';
import { useDownloadCardPdf } from '../api/download-card-pdf';
import { useMeasureTargets, type MeasuredTargets } from '../api/measure-targets';
import { kindWords } from '../types';

/** The saved drill's own card, in A4 or US Letter. */
function DrillCardButtons({ drillId }: { drillId: string }) {
  const download = useDownloadCardPdf({ drillId });
  return (
    <CardPdfButtons
      what="this drill's card"
      pending={download.isPending}
      error={download.isError ? download.error : undefined}
      onDownload={(paper) => download.mutate(paper)}
    />
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
                  <DrillCardButtons drillId={drillId} />
                ) : (
                  <>
                    <Typography variant="body2" color="text.secondary">
                      The drill is not saved yet, so this prints a{' '}
                      {kindWords[kind].name.toLowerCase()} card
                      {kind === 'value-ladder' ? ` with ${targetCount} steps` : ''}, for the drill
                      as it is set now.
                    </Typography>
                    <KindCardButtons
                      kind={kind}
                      steps={kind === 'value-ladder' ? targetCount : undefined}
                      what={`a ${kindWords[kind].name.toLowerCase()} card`}
                    />
                  </>
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
                <MeasurePhotoPicker measure={measure} measured={Boolean(measured)} sx={{ mt: 1 }} />
              </li>
            </Box>

            <MeasurePhotoStatus measure={measure} />

            {measured && !measure.isPending && (
              <Stack spacing={1.5}>
                <Alert severity={filled ? 'success' : 'info'} role="status">
                  {filled
                    ? `Measured ${measured.targets.length} ${measured.targets.length === 1 ? 'window' : 'windows'}: the targets above now hold your swatch, as Lab.`
                    : `Measured ${measured.targets.length} ${measured.targets.length === 1 ? 'window' : 'windows'}; a ${kindWords[kind].name.toLowerCase()} drill takes ${min === max ? min : `${min} to ${max}`} ${max === 1 ? 'target' : 'targets'}. Choose where each reading goes.`}
                  {measured.cardKind !== kind &&
                    ` The card in the photo was printed for a ${kindWords[measured.cardKind].name.toLowerCase()} drill.`}
                </Alert>
                <MeasureWarnings warnings={measured.warnings} />
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
