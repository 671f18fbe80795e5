import { pigmentCautions, pigmentSafety } from '@mixmark/common';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { PigmentCautions } from '@/components/colour/pigment-cautions';
import type { AllowedPaint } from '../types';

/** The paints a drill allows, with their Colour Index codes and any cautions they call for. */
export function PaletteList({ palette }: { palette: AllowedPaint[] }) {
  if (palette.length === 0) {
    return <Typography color="text.secondary">Any paints you have.</Typography>;
  }
  return (
    <Stack spacing={1.5}>
      <Stack component="ul" spacing={1} sx={{ listStyle: 'none', p: 0, m: 0 }}>
        {palette.map((paint) => (
          <Stack component="li" key={paint.name} direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            <Typography sx={{ fontWeight: 700 }}>{paint.name}</Typography>
            {paint.pigments.map((code) => (
              <Chip key={code} label={code} size="small" variant="outlined" />
            ))}
          </Stack>
        ))}
      </Stack>
      <PigmentCautions notes={pigmentSafety(palette.flatMap((paint) => paint.pigments))} cautions={pigmentCautions} />
    </Stack>
  );
}
