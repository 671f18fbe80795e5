import Box, { type BoxProps } from '@mui/material/Box';
import { swatchSurface } from '@/theme/theme';

/** The neutral mid-grey surface every swatch sits on: no saturated accent next to a colour. */
export function SwatchStage({ sx, children, ...rest }: BoxProps) {
  return (
    <Box
      data-surface="swatch-stage"
      sx={{ bgcolor: swatchSurface, color: '#ffffff', borderRadius: 2, p: 3, ...sx }}
      {...rest}
    >
      {children}
    </Box>
  );
}
