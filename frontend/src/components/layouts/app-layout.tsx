import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { Component, lazy, Suspense, useEffect, useId, useState, type ReactNode } from 'react';
import { Link as RouterLink, NavLink, Outlet, useNavigate } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import { signOut } from '@/lib/api-client';
import { useAuth, type SessionUser, type UserRole } from '@/lib/auth-store';

const loadUserMenu = () => import('./user-menu');
const UserMenu = lazy(loadUserMenu);

/** If the menu's code cannot be loaded (offline, a new release), the header offers plain links. */
class MenuBoundary extends Component<{ fallback: ReactNode; children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  override render() {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}

/** The name in the top bar, opening the person's menu (account settings, sign out). */
function UserMenuButton({ user, onSignOut }: { user: SessionUser; onSignOut: () => void }) {
  const menuId = useId();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  // Signed in: fetch the menu's code now, so the first click opens it at once.
  useEffect(() => {
    void loadUserMenu().catch(() => undefined);
  }, []);
  const plainLinks = (
    <>
      <Button component={RouterLink} to={paths.account.getHref()} color="inherit">
        Account
      </Button>
      <Button variant="outlined" onClick={onSignOut}>
        Sign out
      </Button>
    </>
  );
  return (
    <MenuBoundary fallback={plainLinks}>
      <Button
        variant="outlined"
        aria-haspopup="menu"
        aria-expanded={anchor ? 'true' : undefined}
        aria-controls={anchor ? menuId : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
        sx={{ maxWidth: { xs: 180, sm: 280 } }}
      >
        <Box component="span" sx={{ overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' }}>
          {user.displayName}
        </Box>
        <Box component="span" aria-hidden sx={{ ml: 0.75 }}>
          ▾
        </Box>
      </Button>
      {anchor && (
        <Suspense fallback={null}>
          <UserMenu id={menuId} anchorEl={anchor} user={user} onClose={() => setAnchor(null)} onSignOut={onSignOut} />
        </Suspense>
      )}
    </MenuBoundary>
  );
}

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

/**
 * The frame of every page: a quiet top bar, the role's places, and the page below it.
 * `footerLinks` come from the app (such as the development outbox), beside "Server status".
 */
export function AppLayout({ footerLinks }: { footerLinks?: ReactNode } = {}) {
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
              <UserMenuButton user={user} onSignOut={onSignOut} />
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
          <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap', gap: 1 }}>
            <Link component={RouterLink} to={paths.status.getHref()} color="text.secondary" variant="body2">
              Server status
            </Link>
            {footerLinks}
          </Stack>
        </Container>
      </Box>
    </Box>
  );
}
