import IconButton from '@mui/material/IconButton';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';

/** One entry of a row's menu: a link (`to`) or a button (`onSelect`). */
export type RowAction =
  | { label: string; to: string; onSelect?: never; disabled?: boolean }
  | { label: string; onSelect: () => void; to?: never; disabled?: boolean };

/**
 * A table row's actions behind one small button, for phone width where the row's own action
 * column lies past the right edge of the table's box. The button's label names the row
 * ("Actions for Ines Podmore"); the menu has the same actions in plain words. Shown below MUI's
 * `sm` width only: above it the row's own buttons stay as they were.
 */
export function RowActionsMenu({ rowName, actions }: { rowName: string; actions: RowAction[] }) {
  const menuId = useId();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const close = () => setAnchor(null);
  return (
    <>
      <IconButton
        size="small"
        aria-label={`Actions for ${rowName}`}
        aria-haspopup="menu"
        aria-expanded={anchor ? 'true' : 'false'}
        aria-controls={anchor ? menuId : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
        sx={{ display: { xs: 'inline-flex', sm: 'none' }, ml: 0.5 }}
      >
        <svg width="20" height="20" viewBox="0 0 24 24" aria-hidden focusable="false">
          <circle cx="12" cy="5" r="2" fill="currentColor" />
          <circle cx="12" cy="12" r="2" fill="currentColor" />
          <circle cx="12" cy="19" r="2" fill="currentColor" />
        </svg>
      </IconButton>
      <Menu
        id={menuId}
        anchorEl={anchor}
        open={Boolean(anchor)}
        onClose={close}
        slotProps={{ list: { 'aria-label': `Actions for ${rowName}` } }}
      >
        {actions.map((action) =>
          action.to !== undefined ? (
            <MenuItem
              key={action.label}
              component={RouterLink}
              to={action.to}
              disabled={action.disabled}
              onClick={close}
            >
              {action.label}
            </MenuItem>
          ) : (
            <MenuItem
              key={action.label}
              disabled={action.disabled}
              onClick={() => {
                close();
                action.onSelect();
              }}
            >
              {action.label}
            </MenuItem>
          ),
        )}
      </Menu>
    </>
  );
}

/** The `sx` of a row's own action cell (and its heading): hidden where RowActionsMenu stands in. */
export const wideOnlyCell = { display: { xs: 'none', sm: 'table-cell' } } as const;
