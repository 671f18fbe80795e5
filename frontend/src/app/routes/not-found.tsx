import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

export default function NotFoundRoute() {
  return (
    <Stack spacing={2} sx={{ py: 6, alignItems: 'flex-start' }}>
      <Typography variant="h2">Page not found</Typography>
      <Typography>There is no page at this address. It may have moved, or the link may be mistyped.</Typography>
      <Button variant="contained" component={RouterLink} to={paths.home.getHref()}>
        Go to the start page
      </Button>
    </Stack>
  );
}
