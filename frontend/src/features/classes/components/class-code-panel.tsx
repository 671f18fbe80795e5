import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';

/** The class code, big enough to read off a projector across a studio. */
export function ClassCodePanel({ code }: { code: string | null }) {
  return (
    <Paper sx={{ p: 3, textAlign: 'center' }}>
      <Typography color="text.secondary">Students join with this code</Typography>
      <Typography
        component="p"
        aria-label={code ? `Class code ${code.split('').join(' ')}` : 'No class code'}
        sx={{ fontSize: { xs: '2.5rem', sm: '3.5rem' }, fontWeight: 800, letterSpacing: '0.18em', fontVariantNumeric: 'tabular-nums' }}
      >
        {code ?? '—'}
      </Typography>
      {!code && <Typography>An archived class takes no new students.</Typography>}
    </Paper>
  );
}
