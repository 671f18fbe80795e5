import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { Component, lazy, Suspense, type ReactNode } from 'react';
import { Link as RouterLink, Outlet, useNavigate } from 'react-router-dom';
import { homeFor, paths } from '@/config/paths';
import { signOut } from '@/lib/api-client';
import { useAuth } from '@/lib/auth-store';

// The top bar's signed-in parts (the person's menu button, the role's places, the phone menu
// button) load on their own once someone is signed in (`signed-in-nav.tsx`): the sign-in page, the
// first download for most people, never carries them (its size aim, `npm run bench:web -w frontend`).
const loadSignedInNav = () => import('./signed-in-nav');
const UserMenuButton = lazy(() => loadSignedInNav().then((m) => ({ default: m.UserMenuButton })));
const NavMenuButton = lazy(() => loadSignedInNav().then((m) => ({ default: m.NavMenuButton })));
const RoleNav = lazy(() => loadSignedInNav().then((m) => ({ default: m.RoleNav })));

/** If the menus' code cannot be loaded (offline, a new release), the header offers plain links. */
class MenuBoundary extends Component<
  { fallback: ReactNode; children: ReactNode },
  { failed: boolean }
> {
  override state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  override render() {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}

/**
 * The frame of every page: a quiet top bar, the role's places (a row of links, or below MUI's
 * `sm` width a menu button opening a drawer), and the page below it.
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
      <Box
        component="header"
        sx={{ bgcolor: 'background.paper', borderBottom: 1, borderColor: 'divider' }}
      >
        <Container maxWidth="lg" disableGutters>
          <Box
            sx={{
              display: 'flex',
              alignItems: 'center',
              gap: 1,
              minHeight: { xs: 56, sm: 64 },
              px: { xs: 2, sm: 3 },
            }}
          >
            {user && (
              <MenuBoundary fallback={null}>
                <Suspense fallback={null}>
                  <NavMenuButton role={user.role} />
                </Suspense>
              </MenuBoundary>
            )}
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
              <MenuBoundary
                fallback={
                  <>
                    <Button component={RouterLink} to={paths.account.getHref()} color="inherit">
                      Account
                    </Button>
                    <Button variant="outlined" onClick={onSignOut}>
                      Sign out
                    </Button>
                  </>
                }
              >
                <Suspense fallback={null}>
                  <UserMenuButton user={user} onSignOut={onSignOut} />
                </Suspense>
              </MenuBoundary>
            ) : auth.status === 'signed-out' ? (
              <>
                <Button component={RouterLink} to={paths.auth.signIn.getHref()} color="inherit">
                  Sign in
                </Button>
                <Button
                  component={RouterLink}
                  to={paths.auth.register.getHref()}
                  variant="contained"
                >
                  Create account
                </Button>
              </>
            ) : null}
          </Box>
        </Container>
        {user && (
          <MenuBoundary fallback={null}>
            {/* While its code loads, the row's height is kept (from `sm` up), so the page does not jump. */}
            <Suspense
              fallback={
                <Box
                  sx={{
                    display: { xs: 'none', sm: 'block' },
                    height: 45.5,
                    borderTop: 1,
                    borderColor: 'divider',
                  }}
                />
              }
            >
              <RoleNav role={user.role} />
            </Suspense>
          </MenuBoundary>
        )}
      </Box>
      <Box component="main" sx={{ flexGrow: 1 }}>
        <Container maxWidth="lg" sx={{ py: { xs: 3, md: 5 } }}>
          <Outlet />
        </Container>
      </Box>
      <Box component="footer" sx={{ py: 2, borderTop: 1, borderColor: 'divider' }}>
        <Container maxWidth="lg">
          <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap', gap: 1 }}>
            <Link
              component={RouterLink}
              to={paths.status.getHref()}
              color="text.secondary"
              variant="body2"
            >
              Server status
            </Link>
            {footerLinks}
          </Stack>
        </Container>
      </Box>
    </Box>
  );
}
