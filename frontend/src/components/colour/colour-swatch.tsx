import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { greyscaleHex, type Lab } from '@mixmark/common';
import { colourFacts } from './colour-facts';

/**
 * One colour as a painted chip on the grey stage, with its numbers below: L*, C*, h and the
 * Munsell value. In greyscale it shows the same value with the hue and chroma taken away.
 */
export function ColourSwatch({
  lab,
  caption,
  greyscale = false,
  size = 120,
}: {
  lab: Lab;
  caption: string;
  greyscale?: boolean;
  size?: number;
}) {
  const facts = colourFacts(lab);
  const fill = greyscale ? greyscaleHex(lab) : facts.hex;
  return (
    <Stack spacing={1} component="figure" sx={{ m: 0, minWidth: size }}>
      <Box
        role="img"
        aria-label={`${caption}: L* ${facts.L.toFixed(1)}, C* ${facts.C.toFixed(1)}, h ${facts.h.toFixed(0)}°`}
        sx={{ width: size, height: size, bgcolor: fill, borderRadius: 1.5 }}
      />
      <Box component="figcaption">
        <Typography sx={{ fontWeight: 800 }}>{caption}</Typography>
        <Typography variant="body2" sx={{ fontVariantNumeric: 'tabular-nums' }}>
          L* {facts.L.toFixed(1)} · C* {facts.C.toFixed(1)} · h {facts.h.toFixed(0)}°
        </Typography>
        <Typography variant="body2">Value {facts.value.toFixed(1)} of 10</Typography>
      </Box>
    </Stack>
  );
}
