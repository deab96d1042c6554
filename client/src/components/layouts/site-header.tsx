import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Link } from 'react-router';

import { paths } from '../../config/paths.js';
import { SearchBox } from './search-box.js';

function RingsMark() {
  // Growth rings on a block's end grain: the product's mark.
  return (
    <Box component="svg" viewBox="0 0 32 32" aria-hidden sx={{ width: 28, height: 28, flexShrink: 0 }}>
      <circle cx="16" cy="16" r="15" fill="currentColor" opacity="0.25" />
      <circle cx="16" cy="16" r="11.5" fill="none" stroke="currentColor" strokeWidth="1.8" />
      <circle cx="15.5" cy="16.5" r="7.5" fill="none" stroke="currentColor" strokeWidth="1.8" />
      <circle cx="15" cy="16.5" r="3.5" fill="none" stroke="currentColor" strokeWidth="1.8" />
    </Box>
  );
}

export function SiteHeader({ accountMenu }: { accountMenu: ReactNode }) {
  return (
    <AppBar position="sticky" component="header" sx={{ zIndex: (theme) => theme.zIndex.drawer + 1 }}>
      <Toolbar sx={{ gap: { xs: 1, sm: 2 }, minHeight: { xs: 56, sm: 64 } }}>
        <Box
          component={Link}
          to={paths.home.href()}
          sx={{
            display: 'flex',
            alignItems: 'center',
            gap: 1,
            color: 'inherit',
            textDecoration: 'none',
            minHeight: 44,
            flexShrink: 0,
          }}
        >
          <RingsMark />
          <Typography component="span" sx={{ fontWeight: 800, fontSize: { xs: '1.15rem', sm: '1.35rem' } }}>
            Endgrain
          </Typography>
        </Box>
        <SearchBox />
        {accountMenu}
      </Toolbar>
    </AppBar>
  );
}
