import Box, { type BoxProps } from '@mui/material/Box';
import { swatchSurface } from '@/theme/theme';

/**
 * The neutral mid-grey surface every swatch sits on: no saturated accent next to a colour.
 * Text on it is black: 4.7:1 against #777777 (WCAG AA); white would be 4.5:1, just short.
 */
export function SwatchStage({ sx, children, ...rest }: BoxProps) {
  return (
    <Box
      data-surface="swatch-stage"
      sx={{ bgcolor: swatchSurface, color: '#000000', borderRadius: 2, p: 3, ...sx }}
      {...rest}
    >
      {children}
    </Box>
  );
}
