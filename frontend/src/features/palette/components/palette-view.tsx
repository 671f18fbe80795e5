import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { ColourSwatch } from '@/components/colour/colour-swatch';
import { PigmentCautions, safetyNoteWords } from '@/components/colour/pigment-cautions';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorAlert } from '@/components/ui/error-alert';
import { Loading } from '@/components/ui/loading';
import { SwatchStage } from '@/components/ui/swatch-stage';
import { useDeletePaint } from '../api/delete-paint';
import { usePalette } from '../api/get-palette';
import { opacityWords, stainingWords, type Paint } from '../types';
import { PaintForm } from './paint-form';

function PaintCard({ paint }: { paint: Paint }) {
  const [editing, setEditing] = useState(false);
  const remove = useDeletePaint();
  if (editing) {
    return (
      <Paper component="li" sx={{ p: 2 }}>
        <PaintForm paint={paint} onDone={() => setEditing(false)} />
      </Paper>
    );
  }
  const traits = [
    paint.opacity && opacityWords[paint.opacity],
    paint.staining && stainingWords[paint.staining],
    paint.granulating && 'Granulating',
  ].filter(Boolean);
  return (
    <Paper component="li" sx={{ p: 2 }}>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        {paint.swatchLab && (
          <SwatchStage sx={{ p: 1.5, flexShrink: 0, alignSelf: 'flex-start' }}>
            <ColourSwatch lab={paint.swatchLab} caption={`${paint.name}, measured`} size={64} />
          </SwatchStage>
        )}
        <Stack spacing={0.75} sx={{ flex: 1, minWidth: 0 }}>
          <Typography variant="h3" component="h3" sx={{ fontSize: '1.1rem' }}>
            {paint.name}
          </Typography>
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 0.75 }} aria-label="Pigments">
            {paint.pigments.length === 0 && (
              <Typography variant="body2" color="text.secondary">
                No pigment codes given
              </Typography>
            )}
            {paint.pigments.map((code) => (
              <Chip key={code} label={code} size="small" variant="outlined" />
            ))}
          </Stack>
          {traits.length > 0 && <Typography variant="body2">{traits.join(' · ')}</Typography>}
          {paint.safety.length > 0 && (
            <Stack direction="row" spacing={0.5} sx={{ alignItems: 'center' }}>
              <WarningAmberOutlined fontSize="small" aria-hidden sx={{ color: 'warning.dark' }} />
              <Typography variant="body2" sx={{ fontWeight: 700 }}>
                Contains {paint.safety.map(safetyNoteWords).join(', ')}: see the cautions above
              </Typography>
            </Stack>
          )}
        </Stack>
        <Stack direction="row" spacing={1}>
          <Button size="small" onClick={() => setEditing(true)} aria-label={`Edit ${paint.name}`}>
            Edit
          </Button>
          <Button
            size="small"
            color="error"
            aria-label={`Delete ${paint.name}`}
            disabled={remove.isPending}
            onClick={() => {
              if (window.confirm(`Delete ${paint.name} from your palette?`)) remove.mutate(paint.id);
            }}
          >
            Delete
          </Button>
        </Stack>
      </Stack>
      {remove.isError && <ErrorAlert error={remove.error} />}
    </Paper>
  );
}

/** The signed-in user's paints, the cautions some pigments call for, and a form to add one. */
export function PaletteView() {
  const palette = usePalette();
  // A fresh form after each paint added (the pigments box keeps its own text).
  const [added, setAdded] = useState(0);
  if (palette.isPending) return <Loading label="Loading your palette…" />;
  if (palette.isError) return <ErrorAlert error={palette.error} onRetry={() => palette.refetch()} />;
  const { paints, cautions } = palette.data;
  return (
    <Stack spacing={3}>
      <PigmentCautions notes={paints.flatMap((p) => p.safety)} cautions={cautions} />
      {paints.length === 0 ? (
        <EmptyState title="No paints yet">Add the tubes or pans you own, with the pigment codes printed on them.</EmptyState>
      ) : (
        <Stack component="ul" spacing={1.5} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Your paints">
          {paints.map((paint) => (
            <PaintCard key={paint.id} paint={paint} />
          ))}
        </Stack>
      )}
      <Paper component="section" sx={{ p: 2.5 }} aria-labelledby="add-paint-title">
        <Typography id="add-paint-title" variant="h3" component="h2" sx={{ mb: 2 }}>
          Add a paint
        </Typography>
        <PaintForm key={added} onDone={() => setAdded((n) => n + 1)} />
      </Paper>
    </Stack>
  );
}
