import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

/**
 * Material's "error outline" symbol (the same path as @mui/icons-material's
 * ErrorOutlineOutlined), drawn as a bare SVG: on the sign-in page MUI's SvgIcon machinery would
 * cost ~2.5 KB gzip for this one symbol.
 */
const errorOutlinePath =
  'M11 15h2v2h-2zm0-8h2v6h-2zm.99-5C6.47 2 2 6.48 2 12s4.47 10 9.99 10C17.52 22 22 17.52 22 12S17.52 2 11.99 2M12 20c-4.42 0-8-3.58-8-8s3.58-8 8-8 8 3.58 8 8-3.58 8-8 8';

/**
 * The sentence for a form-wide failure, read out when it appears. Drawn like MUI's error Alert
 * (dark red on pale red, 9:1) without it, so the sign-in page loads less.
 */
export function FormAlert({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <Box
      role="alert"
      sx={{ display: 'flex', gap: 1.5, alignItems: 'flex-start', px: 2, py: 1.5, borderRadius: 1, bgcolor: '#fbeceb', color: '#5f2120' }}
    >
      <Box
        component="svg"
        viewBox="0 0 24 24"
        aria-hidden
        focusable="false"
        sx={{ width: 24, height: 24, flexShrink: 0, fill: 'currentColor', color: 'error.main', mt: '1px' }}
      >
        <path d={errorOutlinePath} />
      </Box>
      <Typography variant="body2" component="p" sx={{ m: 0, pt: '2px' }}>
        {message}
      </Typography>
    </Box>
  );
}
