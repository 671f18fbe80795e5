import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink, NavLink, Outlet, useNavigate } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import { signOut } from '@/lib/api-client';
import { useAuth, type UserRole } from '@/lib/auth-store';

const navByRole: Record<UserRole, { label: string; href: string }[]> = {
  student: [
    { label: 'Assignments', href: paths.student.assignments.getHref() },
    { label: 'Practice', href: paths.student.library.getHref() },
    { label: 'History', href: paths.student.history.getHref() },
    { label: 'Progress', href: paths.student.progress.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
    { label: 'Join a class', href: paths.student.join.getHref() },
  ],
  teacher: [
    { label: 'Dashboard', href: paths.teacher.dashboard.getHref() },
    { label: 'Drills', href: paths.teacher.drills.getHref() },
    { label: 'Assign', href: paths.teacher.assign.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
  ],
  admin: [
    { label: 'Users', href: paths.admin.users.getHref() },
    { label: 'My palette', href: paths.palette.getHref() },
  ],
};

function RoleNav({ role }: { role: UserRole }) {
  return (
    <Box
      component="nav"
      aria-label="Main"
      sx={{ borderTop: 1, borderColor: 'divider', overflowX: 'auto', bgcolor: 'background.default' }}
    >
      <Container maxWidth="lg">
        <Stack direction="row" spacing={0.5} sx={{ py: 0.5 }}>
          {navByRole[role].map((item) => (
            <Button
              key={item.href}
              component={NavLink}
              to={item.href}
              end
              color="inherit"
              sx={{
                whiteSpace: 'nowrap',
                flexShrink: 0,
                '&.active': { bgcolor: 'action.selected', textDecoration: 'underline' },
              }}
            >
              {item.label}
            </Button>
          ))}
        </Stack>
      </Container>
    </Box>
  );
}

/** The frame of every page: a quiet top bar, the role's places, and the page below it. */
export function AppLayout() {
  const auth = useAuth();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const user = auth.status === 'signed-in' ? auth.user : undefined;

  const onSignOut = async () => {
    await signOut().catch(() => undefined);
    queryClient.clear();
    navigate(paths.auth.signIn.getHref(), { replace: true });
  };

  return (
    <Box sx={{ minHeight: '100vh', display: 'flex', flexDirection: 'column' }}>
      {/* A plain header box where MUI's AppBar and Toolbar would add ~1 KB gzip to every page. */}
      <Box component="header" sx={{ bgcolor: 'background.paper', borderBottom: 1, borderColor: 'divider' }}>
        <Container maxWidth="lg" disableGutters>
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, minHeight: { xs: 56, sm: 64 }, px: { xs: 2, sm: 3 } }}>
            <Link
              component={RouterLink}
              to={user ? homeFor(user.role) : paths.home.getHref()}
              underline="none"
              color="inherit"
            >
              <Typography component="span" sx={{ fontWeight: 800, fontSize: '1.25rem' }}>
                Mixmark
              </Typography>
            </Link>
            <Box sx={{ flexGrow: 1 }} />
            {user ? (
              <>
                <Typography
                  variant="body2"
                  sx={{ display: { xs: 'none', sm: 'block' }, color: 'text.secondary' }}
                >
                  {user.displayName} · {user.role}
                </Typography>
                <Button variant="outlined" onClick={onSignOut}>
                  Sign out
                </Button>
              </>
            ) : auth.status === 'signed-out' ? (
              <>
                <Button component={RouterLink} to={paths.auth.signIn.getHref()} color="inherit">
                  Sign in
                </Button>
                <Button component={RouterLink} to={paths.auth.register.getHref()} variant="contained">
                  Create account
                </Button>
              </>
            ) : null}
          </Box>
        </Container>
        {user && <RoleNav role={user.role} />}
      </Box>
      <Box component="main" sx={{ flexGrow: 1 }}>
        <Container maxWidth="lg" sx={{ py: { xs: 3, md: 5 } }}>
          <Outlet />
        </Container>
      </Box>
      <Box component="footer" sx={{ py: 2, borderTop: 1, borderColor: 'divider' }}>
        <Container maxWidth="lg">
          <Link component={RouterLink} to={paths.status.getHref()} color="text.secondary" variant="body2">
            Server status
          </Link>
        </Container>
      </Box>
    </Box>
  );
}
