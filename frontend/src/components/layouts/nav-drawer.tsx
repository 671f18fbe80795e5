import Box from '@mui/material/Box';
import Divider from '@mui/material/Divider';
import Drawer from '@mui/material/Drawer';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEffect, useRef } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import type { UserRole } from '@/lib/auth-store';
import { navByRole, phoneQuery, pickedFromMenu } from './nav-items';

const roleWords = { admin: 'Admin', teacher: 'Teacher', student: 'Student' } as const;

/**
 * The phone-width menu: the role's places in a drawer from the left, the current page marked
 * (`aria-current="page"`, from NavLink). It closes on Escape, on the backdrop, on its close
 * button, when a link is followed (or the address changes any other way), and when the window
 * grows past the phone width, where the top bar shows the links itself. Loaded with the person's
 * menu (`user-menu.tsx` passes it on): one chunk, and no new split of MUI's shared modules.
 */
export default function NavDrawer({
  id,
  open,
  role,
  onClose,
}: {
  id: string;
  open: boolean;
  role: UserRole;
  onClose: () => void;
}) {
  const { pathname } = useLocation();
  const shownAt = useRef(pathname);
  useEffect(() => {
    if (shownAt.current !== pathname) {
      shownAt.current = pathname;
      onClose();
    }
  }, [pathname, onClose]);
  useEffect(() => {
    if (!open || !window.matchMedia) return;
    const phone = window.matchMedia(phoneQuery);
    const onChange = () => {
      if (!phone.matches) onClose();
    };
    phone.addEventListener('change', onChange);
    return () => phone.removeEventListener('change', onChange);
  }, [open, onClose]);
  const titleId = `${id}-title`;
  return (
    <Drawer
      open={open}
      onClose={onClose}
      anchor="left"
      slotProps={{
        paper: {
          id,
          role: 'dialog',
          'aria-modal': true,
          'aria-labelledby': titleId,
          sx: { width: 280, maxWidth: '85vw' },
        },
      }}
    >
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, minHeight: 56, pl: 2, pr: 1 }}>
        <Typography
          id={titleId}
          component="h2"
          sx={{ fontWeight: 800, fontSize: '1.25rem', flexGrow: 1 }}
        >
          Menu
        </Typography>
        <Button
          aria-label="Close the menu"
          onClick={onClose}
          color="inherit"
          sx={{ minWidth: 0, p: 1 }}
        >
          <svg width="24" height="24" viewBox="0 0 24 24" aria-hidden focusable="false">
            <path
              d="M6 6l12 12M18 6L6 18"
              stroke="currentColor"
              strokeWidth="2"
              strokeLinecap="round"
            />
          </svg>
        </Button>
      </Box>
      <Divider />
      <Box component="nav" aria-label="Main">
        <Typography variant="body2" sx={{ px: 2, pt: 1.5, color: 'text.secondary' }}>
          {roleWords[role]}
        </Typography>
        <Stack component="ul" sx={{ listStyle: 'none', m: 0, px: 1, py: 1 }}>
          {navByRole[role].map((item) => (
            <li key={item.href}>
              <Button
                component={NavLink}
                to={item.href}
                state={pickedFromMenu}
                end
                onClick={onClose}
                color="inherit"
                fullWidth
                sx={{
                  justifyContent: 'flex-start',
                  minHeight: 48,
                  px: 2,
                  fontSize: '1.05rem',
                  fontWeight: 400,
                  '&.active': {
                    bgcolor: 'action.selected',
                    fontWeight: 700,
                    boxShadow: (theme) => `inset 4px 0 0 ${theme.palette.primary.main}`,
                  },
                }}
              >
                {item.label}
              </Button>
            </li>
          ))}
        </Stack>
      </Box>
    </Drawer>
  );
}
