import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Typography from '@mui/material/Typography';

/** Shown by the root error boundary when something in the app breaks. */
export function MainErrorFallback({ message }: { message?: string }) {
  return (
    <Container maxWidth="sm" sx={{ py: 8 }} role="alert">
      <Typography variant="h2" gutterBottom>
        Something went wrong
      </Typography>
      <Typography sx={{ mb: 3 }}>
        {message ?? 'This page could not be shown.'} Your work is saved on the server; reloading usually helps.
      </Typography>
      <Button variant="contained" onClick={() => window.location.assign(window.location.pathname)}>
        Reload the page
      </Button>
    </Container>
  );
}
