import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import Link from '@mui/material/Link';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The frame of every page: a quiet top bar and the page below it. */
export function AppLayout() {
  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      <AppBar position="static" sx={{ borderBottom: 1, borderColor: 'divider' }}>
        <Toolbar>
          <Link component={RouterLink} to={paths.home.getHref()} underline="none" color="inherit">
            <Typography component="span" sx={{ fontWeight: 800, fontSize: '1.25rem' }}>
              Mixmark
            </Typography>
          </Link>
          <Box sx={{ flexGrow: 1 }} />
          <Link component={RouterLink} to={paths.status.getHref()} color="inherit">
            Server status
          </Link>
        </Toolbar>
      </AppBar>
      <Box component="main" sx={{ flexGrow: 1 }}>
        <Container maxWidth="lg" sx={{ py: { xs: 3, md: 5 } }}>
          <Outlet />
        </Container>
      </Box>
    </Box>
  );
}
