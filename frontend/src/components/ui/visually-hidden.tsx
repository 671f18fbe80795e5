import Box from '@mui/material/Box';
import type { ReactNode } from 'react';

/** Text for screen readers only (a table header over action buttons, say). */
export function VisuallyHidden({ children }: { children: ReactNode }) {
  return (
    <Box
      component="span"
      // Pixel units on purpose: in MUI's sx a bare 1 would mean 100 %.
      sx={{ position: 'absolute', width: '1px', height: '1px', p: 0, m: '-1px', overflow: 'hidden', clip: 'rect(0 0 0 0)', whiteSpace: 'nowrap', border: 0 }}
    >
      {children}
    </Box>
  );
}
