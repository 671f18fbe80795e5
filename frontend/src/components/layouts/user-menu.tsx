import Divider from '@mui/material/Divider';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { SessionUser } from '@/lib/auth-store';

const roleWords = { admin: 'Admin', teacher: 'Teacher', student: 'Student' } as const;

/**
 * The signed-in person's menu: who they are, their account settings, sign out. Loaded on its
 * own (see `app-layout.tsx`): MUI's Menu brings Popover and Modal, which no public page needs.
 */
export default function UserMenu({
  id,
  anchorEl,
  user,
  onClose,
  onSignOut,
}: {
  id: string;
  anchorEl: HTMLElement;
  user: SessionUser;
  onClose: () => void;
  onSignOut: () => void;
}) {
  return (
    <Menu
      id={id}
      anchorEl={anchorEl}
      open
      onClose={onClose}
      anchorOrigin={{ vertical: 'bottom', horizontal: 'right' }}
      transformOrigin={{ vertical: 'top', horizontal: 'right' }}
      slotProps={{ list: { 'aria-label': 'Your account', dense: false } }}
    >
      <Typography
        component="li"
        role="presentation"
        variant="body2"
        sx={{ px: 2, pt: 0.5, pb: 1, color: 'text.secondary' }}
      >
        {roleWords[user.role]} · {user.email}
      </Typography>
      <MenuItem component={RouterLink} to={paths.account.getHref()} onClick={onClose}>
        Account settings
      </MenuItem>
      <Divider />
      <MenuItem
        onClick={() => {
          onClose();
          onSignOut();
        }}
      >
        Sign out
      </MenuItem>
    </Menu>
  );
}
