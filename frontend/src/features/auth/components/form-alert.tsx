import ErrorOutlineOutlined from '@mui/icons-material/ErrorOutlineOutlined';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

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
      <ErrorOutlineOutlined aria-hidden sx={{ color: 'error.main', mt: '1px' }} />
      <Typography variant="body2" component="p" sx={{ m: 0, pt: '2px' }}>
        {message}
      </Typography>
    </Box>
  );
}
