import MoreHoriz from '@mui/icons-material/MoreHoriz';
import BottomNavigation from '@mui/material/BottomNavigation';
import BottomNavigationAction from '@mui/material/BottomNavigationAction';
import Drawer from '@mui/material/Drawer';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import { useState } from 'react';
import { Link } from 'react-router';

import { places } from '../../config/places.js';
import { PlaceIcon } from './place-icon.js';
import { useCurrentPlace } from './use-current-place.js';

export const BOTTOM_BAR_HEIGHT = 64;

const barPlaces = places.filter((place) => place.inBottomBar);
const morePlaces = places.filter((place) => !place.inBottomBar);

/** Phone navigation: the four places used most, and "More" for the rest. */
export function BottomBar() {
  const current = useCurrentPlace();
  const [moreOpen, setMoreOpen] = useState(false);
  const currentIsMore = current !== undefined && !current.inBottomBar;

  return (
    <Paper
      component="nav"
      aria-label="Places"
      elevation={8}
      square
      sx={{ position: 'fixed', left: 0, right: 0, bottom: 0, pb: 'env(safe-area-inset-bottom)', zIndex: 'appBar' }}
    >
      <BottomNavigation showLabels value={currentIsMore ? 'more' : (current?.key ?? false)} sx={{ height: BOTTOM_BAR_HEIGHT }}>
        {barPlaces.map((place) => (
          <BottomNavigationAction
            key={place.key}
            value={place.key}
            label={place.label}
            icon={<PlaceIcon place={place.key} />}
            component={Link}
            to={place.href}
            aria-current={current?.key === place.key ? 'page' : undefined}
            sx={{ minWidth: 0, px: 0.5 }}
          />
        ))}
        <BottomNavigationAction
          value="more"
          label="More"
          icon={<MoreHoriz aria-hidden />}
          aria-haspopup="dialog"
          aria-expanded={moreOpen}
          onClick={() => setMoreOpen(true)}
          sx={{ minWidth: 0, px: 0.5 }}
        />
      </BottomNavigation>
      <Drawer
        anchor="bottom"
        open={moreOpen}
        onClose={() => setMoreOpen(false)}
        slotProps={{ paper: { role: 'dialog', 'aria-modal': true, 'aria-label': 'More places' } }}
      >
        <List component="div" sx={{ pb: 'calc(env(safe-area-inset-bottom) + 8px)' }}>
          {morePlaces.map((place) => (
            <ListItemButton
              key={place.key}
              component={Link}
              to={place.href}
              selected={current?.key === place.key}
              aria-current={current?.key === place.key ? 'page' : undefined}
              onClick={() => setMoreOpen(false)}
            >
              <ListItemIcon>
                <PlaceIcon place={place.key} />
              </ListItemIcon>
              <ListItemText primary={place.label} />
            </ListItemButton>
          ))}
        </List>
      </Drawer>
    </Paper>
  );
}
