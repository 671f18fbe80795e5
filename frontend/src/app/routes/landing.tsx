import Button from '@mui/material/Button';
import Grid from '@mui/material/Grid';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { SwatchStage } from '@/components/ui/swatch-stage';
import { homeFor, paths } from '@/config/paths';
import { useUser } from '@/lib/auth-store';
import { HealthStatus } from '@/features/health/components/health-status';

const ladder = ['#f1ece4', '#d2c6b5', '#ae9f8a', '#897a66', '#655746', '#43392d'];

/** What Mixmark does, in a teacher's words. */
export default function LandingRoute() {
  const user = useUser();
  return (
    <Stack spacing={4}>
      <Stack spacing={2} sx={{ maxWidth: 720 }}>
        <Typography variant="h1">Mix the colour you meant to mix</Typography>
        <Typography sx={{ fontSize: '1.15rem' }}>
          Mixmark sets colour-mixing drills, reads a phone photo of your painted swatch through a printed reference card,
          and tells you how close you came: too light or too dark, too warm or too cool, too intense or too grey, with
          the numbers for those who want them.
        </Typography>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          {user ? (
            <Button variant="contained" size="large" component={RouterLink} to={homeFor(user.role)}>
              Go to your start page
            </Button>
          ) : (
            <>
              <Button variant="contained" size="large" component={RouterLink} to={paths.auth.register.getHref()}>
                Start practising
              </Button>
              <Button variant="outlined" size="large" component={RouterLink} to={`${paths.auth.register.getHref()}?role=teacher`}>
                I teach a class
              </Button>
              <Button size="large" component={RouterLink} to={paths.auth.signIn.getHref()}>
                Sign in
              </Button>
            </>
          )}
        </Stack>
      </Stack>
      <SwatchStage aria-label="A value ladder from light to dark">
        <Typography sx={{ mb: 2, fontWeight: 700 }}>A six-step value ladder in a warm earth</Typography>
        <Grid container spacing={1}>
          {ladder.map((hex) => (
            <Grid key={hex} size={2}>
              <div style={{ background: hex, height: 56, borderRadius: 6 }} title={hex} />
            </Grid>
          ))}
        </Grid>
      </SwatchStage>
      <HealthStatus />
    </Stack>
  );
}
