import { createTheme } from '@mui/material/styles';

/**
 * Mixmark's own look: calm, warm-neutral chrome with a deep slate-teal for actions, and a true
 * neutral mid-grey for every surface that shows swatches (colour is judged against neutral
 * surroundings). The swatch grey is L* ≈ 50, a* = b* = 0 (sRGB #777777 is L* 50.0).
 */
export const swatchSurface = '#777777';

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: { main: '#2f5d62', contrastText: '#ffffff' },
    secondary: { main: '#6b4f3a' },
    background: { default: '#f4f3f1', paper: '#ffffff' },
    text: { primary: '#1f2326', secondary: '#4a5055' },
    success: { main: '#2e6b3f' },
    error: { main: '#a33a2b' },
  },
  shape: { borderRadius: 10 },
  typography: {
    fontFamily: '"Nunito", system-ui, -apple-system, "Segoe UI", sans-serif',
    h1: { fontSize: '2.25rem', fontWeight: 800, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.75rem', fontWeight: 800 },
    h3: { fontSize: '1.35rem', fontWeight: 700 },
    button: { textTransform: 'none', fontWeight: 700 },
  },
  components: {
    MuiAppBar: { defaultProps: { elevation: 0, color: 'inherit' } },
    MuiPaper: { defaultProps: { variant: 'outlined' } },
    MuiButton: { defaultProps: { disableElevation: true } },
    // A wide table scrolls inside its box; being positioned, the box also holds the
    // screen-reader-only headers (position: absolute) that would otherwise widen the page.
    MuiTableContainer: { styleOverrides: { root: { position: 'relative' } } },
  },
});
