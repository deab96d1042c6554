import AccountCircle from '@mui/icons-material/AccountCircle';
import Check from '@mui/icons-material/Check';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import ListSubheader from '@mui/material/ListSubheader';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import { useColorScheme } from '@mui/material/styles';
import { useId, useState, type ReactElement } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';

import { paths } from '../../../config/paths.js';
import { useAuth } from '../hooks/use-auth.js';

const colorModes = [
  { mode: 'system', label: 'Match this device' },
  { mode: 'light', label: 'Light' },
  { mode: 'dark', label: 'Dark' },
] as const;

export function AccountMenu() {
  const { user, signOut } = useAuth();
  const { mode, setMode } = useColorScheme();
  const navigate = useNavigate();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const menuId = useId();
  const close = () => setAnchor(null);

  const sessionItems: ReactElement[] = user
    ? [
        <ListSubheader key="who" role="none" sx={{ lineHeight: 1.4, py: 1 }}>
          {user.displayName}
        </ListSubheader>,
        <MenuItem key="account" component={RouterLink} to={paths.account.href()} onClick={close}>
          Account
        </MenuItem>,
        <MenuItem
          key="sign-out"
          onClick={() => {
            close();
            signOut();
            void navigate(paths.home.href());
          }}
        >
          Sign out
        </MenuItem>,
      ]
    : [
        <MenuItem key="sign-in" component={RouterLink} to={paths.auth.signIn.href()} onClick={close}>
          Sign in
        </MenuItem>,
        <MenuItem key="sign-up" component={RouterLink} to={paths.auth.signUp.href()} onClick={close}>
          Create account
        </MenuItem>,
      ];

  return (
    <>
      <IconButton
        color="inherit"
        aria-label={user ? `Account menu for ${user.displayName}` : 'Account menu'}
        aria-controls={anchor ? menuId : undefined}
        aria-haspopup="menu"
        aria-expanded={anchor ? true : undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
        sx={{ ml: 'auto' }}
      >
        <AccountCircle />
      </IconButton>
      {/* Rendered inside the header (no portal) so the open menu stays within a landmark. */}
      <Menu id={menuId} anchorEl={anchor} open={Boolean(anchor)} onClose={close} disablePortal>
        {sessionItems}
        <Divider />
        <ListSubheader role="none" sx={{ lineHeight: 1.4, py: 1 }}>
          Theme
        </ListSubheader>
        {colorModes.map((option) => (
          <MenuItem
            key={option.mode}
            role="menuitemradio"
            aria-checked={(mode ?? 'system') === option.mode}
            onClick={() => setMode(option.mode)}
          >
            <ListItemIcon>{(mode ?? 'system') === option.mode && <Check fontSize="small" />}</ListItemIcon>
            <ListItemText>{option.label}</ListItemText>
          </MenuItem>
        ))}
      </Menu>
    </>
  );
}
