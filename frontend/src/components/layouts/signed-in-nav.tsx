import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Container from '@mui/material/Container';
import Stack from '@mui/material/Stack';
import { lazy, Suspense, useEffect, useId, useRef, useState } from 'react';
import { NavLink } from 'react-router-dom';
import type { SessionUser, UserRole } from '@/lib/auth-store';
import { navByRole, pickedFromMenu } from './nav-items';

// The top bar's signed-in parts, in a chunk of their own (see `app-layout.tsx`). The person's menu
// and the phone menu drawer come in one more chunk, fetched as soon as someone is signed in (the
// first tap opens either at once): MUI's Menu and Drawer bring Popover and Modal.
const loadUserMenu = () => import('./user-menu');
const UserMenu = lazy(loadUserMenu);
const NavDrawer = lazy(() => loadUserMenu().then((m) => ({ default: m.NavDrawer })));

/** The name in the top bar, opening the person's menu (account settings, sign out). */
export function UserMenuButton({ user, onSignOut }: { user: SessionUser; onSignOut: () => void }) {
  const menuId = useId();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  // Signed in: fetch the menu's code now, so the first click opens it at once.
  useEffect(() => {
    void loadUserMenu().catch(() => undefined);
  }, []);
  return (
    <>
      <Button
        variant="outlined"
        aria-haspopup="menu"
        aria-expanded={anchor ? 'true' : undefined}
        aria-controls={anchor ? menuId : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
        sx={{ maxWidth: { xs: 180, sm: 280 } }}
      >
        <Box
          component="span"
          sx={{ overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' }}
        >
          {user.displayName}
        </Box>
        <Box component="span" aria-hidden sx={{ ml: 0.75 }}>
          ▾
        </Box>
      </Button>
      {anchor && (
        <Suspense fallback={null}>
          <UserMenu
            id={menuId}
            anchorEl={anchor}
            user={user}
            onClose={() => setAnchor(null)}
            onSignOut={onSignOut}
          />
        </Suspense>
      )}
    </>
  );
}

/**
 * Below MUI's `sm` width: the button opening the drawer with the role's places (`nav-drawer.tsx`).
 * It says whether the drawer is open (`aria-expanded`), names it (`aria-controls`) while it is,
 * and has the focus back when the drawer closes (Escape, its close button, the backdrop, or a
 * link followed). A plain Button with three drawn bars: IconButton and an icon package would each
 * bring one more shared chunk.
 */
export function NavMenuButton({ role }: { role: UserRole }) {
  const drawerId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const [open, setOpen] = useState(false);
  const [wanted, setWanted] = useState(false);
  const wasOpen = useRef(false);
  useEffect(() => {
    // After the drawer's own focus handling (its effects run first): the button has the focus.
    if (wasOpen.current && !open) button.current?.focus();
    wasOpen.current = open;
  }, [open]);
  return (
    <>
      <Button
        ref={button}
        aria-label="Menu"
        aria-expanded={open}
        aria-controls={open ? drawerId : undefined}
        onClick={() => {
          setWanted(true);
          setOpen(true);
        }}
        color="inherit"
        sx={{ display: { xs: 'inline-flex', sm: 'none' }, minWidth: 0, p: 1, ml: -1 }}
      >
        <svg width="24" height="24" viewBox="0 0 24 24" aria-hidden focusable="false">
          <path
            d="M3 6h18M3 12h18M3 18h18"
            stroke="currentColor"
            strokeWidth="2"
            strokeLinecap="round"
          />
        </svg>
      </Button>
      {wanted && (
        <Suspense fallback={null}>
          <NavDrawer id={drawerId} open={open} role={role} onClose={() => setOpen(false)} />
        </Suspense>
      )}
    </>
  );
}

/** From MUI's `sm` width up: the role's places as a row of links under the top bar. */
export function RoleNav({ role }: { role: UserRole }) {
  return (
    <Box
      component="nav"
      aria-label="Main"
      sx={{
        display: { xs: 'none', sm: 'block' },
        borderTop: 1,
        borderColor: 'divider',
        overflowX: 'auto',
        bgcolor: 'background.default',
      }}
    >
      <Container maxWidth="lg">
        <Stack direction="row" spacing={0.5} sx={{ py: 0.5 }}>
          {navByRole[role].map((item) => (
            <Button
              key={item.href}
              component={NavLink}
              to={item.href}
              state={pickedFromMenu}
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
