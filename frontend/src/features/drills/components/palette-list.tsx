import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { hazardousPigments, studioCautions } from '../pigment-hazards';
import type { AllowedPaint } from '../types';

/** The cautions for the hazardous pigments among some paints, or nothing when there are none. */
export function PigmentCautions({ pigments }: { pigments: string[] }) {
  const hazards = hazardousPigments(pigments);
  if (hazards.length === 0) return null;
  return (
    <Alert severity="warning" role="note" icon={<WarningAmberOutlined />}>
      <AlertTitle>Handle with care</AlertTitle>
      <Typography variant="body2" sx={{ mb: 1 }}>
        {hazards.map((h) => `${h.code} (${h.compound})`).join(', ')}: common studio practice for these pigments:
      </Typography>
      <ul style={{ margin: 0, paddingLeft: '1.2em' }}>
        {studioCautions.map((line) => (
          <li key={line}>
            <Typography variant="body2">{line}</Typography>
          </li>
        ))}
      </ul>
      <Typography variant="body2" sx={{ mt: 1 }}>
        The paint's own label and your local rules come first.
      </Typography>
    </Alert>
  );
}

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
      <PigmentCautions pigments={palette.flatMap((paint) => paint.pigments)} />
    </Stack>
  );
}
