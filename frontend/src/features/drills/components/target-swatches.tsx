import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import type { Target } from '@mixmark/common';
import { useState } from 'react';
import { ColourSwatch } from '@/components/colour/colour-swatch';
import { SwatchStage } from '@/components/ui/swatch-stage';

/** A drill's targets on the grey stage, with a greyscale view to judge value alone. */
export function TargetSwatches({ targets }: { targets: Target[] }) {
  const [greyscale, setGreyscale] = useState(false);
  return (
    <SwatchStage aria-label="Target colours">
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', mb: 2, flexWrap: 'wrap' }}>
        <Typography sx={{ fontWeight: 800 }}>{targets.length === 1 ? 'Target' : `${targets.length} targets`}</Typography>
        <FormControlLabel
          control={<Switch checked={greyscale} onChange={(e) => setGreyscale(e.target.checked)} />}
          label="Value only (greyscale)"
          sx={{ color: '#000', mr: 0 }}
        />
      </Stack>
      <Stack direction="row" spacing={2} useFlexGap sx={{ flexWrap: 'wrap' }}>
        {targets.map((target, index) => (
          <ColourSwatch
            key={index}
            lab={target.lab}
            greyscale={greyscale}
            caption={target.label || (targets.length > 1 ? `Step ${index + 1}` : 'Target')}
            size={targets.length > 3 ? 88 : 120}
          />
        ))}
      </Stack>
    </SwatchStage>
  );
}
