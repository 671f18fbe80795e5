import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';

/** Milder problems a measured photo had (each a code and a sentence from the API), as a list. */
export function MeasureWarnings({ warnings }: { warnings: { code: string; message: string }[] }) {
  if (warnings.length === 0) return null;
  return (
    <Alert severity="warning">
      <Typography variant="body2" sx={{ fontWeight: 700 }}>
        Measured, with a caution:
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {warnings.map((warning) => (
          <li key={`${warning.code}-${warning.message}`}>{warning.message}</li>
        ))}
      </Box>
    </Alert>
  );
}
