import Box from '@mui/material/Box';
import ButtonBase from '@mui/material/ButtonBase';
import Typography from '@mui/material/Typography';
import { NavLink } from 'react-router';

import { places } from '../../config/places.js';
import { PlaceIcon } from './place-icon.js';

export const NAV_RAIL_WIDTH = 96;

/** Desktop and tablet navigation: every place, icon over label, down the left edge. */
export function NavRail() {
  return (
    <Box
      component="nav"
      aria-label="Places"
      sx={{
        position: 'fixed',
        top: 64,
        bottom: 0,
        left: 0,
        width: NAV_RAIL_WIDTH,
        overflowY: 'auto',
        py: 1,
        bgcolor: 'background.paper',
        borderRight: 1,
        borderColor: 'divider',
      }}
    >
      {places.map((place) => (
        <ButtonBase
          key={place.key}
          component={NavLink}
          to={place.href}
          sx={{
            display: 'flex',
            flexDirection: 'column',
            width: '100%',
            minHeight: 64,
            gap: 0.5,
            px: 0.5,
            color: 'text.secondary',
            '&:hover': { color: 'text.primary' },
            '&.active': { color: 'primary.main', fontWeight: 700 },
            '&.active .rail-icon': { bgcolor: 'action.selected' },
            '&.Mui-focusVisible': { outline: '2px solid', outlineColor: 'primary.main', outlineOffset: -2 },
          }}
        >
          <Box className="rail-icon" sx={{ display: 'grid', placeItems: 'center', width: 56, height: 32, borderRadius: 4 }}>
            <PlaceIcon place={place.key} />
          </Box>
          <Typography component="span" variant="caption" sx={{ fontWeight: 'inherit', textAlign: 'center', lineHeight: 1.2 }}>
            {place.label}
          </Typography>
        </ButtonBase>
      ))}
    </Box>
  );
}
