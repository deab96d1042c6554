import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import Link from '@mui/material/Link';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import type { ReactNode } from 'react';

import { BOTTOM_BAR_HEIGHT, BottomBar } from './bottom-bar.js';
import { NAV_RAIL_WIDTH, NavRail } from './nav-rail.js';
import { SiteHeader } from './site-header.js';

export interface AppShellProps {
  accountMenu: ReactNode;
  /** Notices above every page, e.g. "confirm your e-mail". */
  banner?: ReactNode;
  children: ReactNode;
}

export function AppShell({ accountMenu, banner, children }: AppShellProps) {
  const theme = useTheme();
  const isPhone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });

  return (
    <Box sx={{ minHeight: '100vh', bgcolor: 'background.default' }}>
      <Link
        href="#main"
        sx={{
          position: 'absolute',
          left: 8,
          top: -64,
          zIndex: 'tooltip',
          p: 1.5,
          bgcolor: 'background.paper',
          '&:focus': { top: 8 },
        }}
      >
        Skip to main content
      </Link>
      <SiteHeader accountMenu={accountMenu} />
      {isPhone ? <BottomBar /> : <NavRail />}
      <Box
        component="main"
        id="main"
        tabIndex={-1}
        sx={{
          ml: isPhone ? 0 : `${NAV_RAIL_WIDTH}px`,
          pb: isPhone ? `calc(${BOTTOM_BAR_HEIGHT + 24}px + env(safe-area-inset-bottom))` : 4,
          outline: 'none',
        }}
      >
        <Container maxWidth="lg" sx={{ pt: { xs: 2, sm: 3 } }}>
          {banner}
          {children}
        </Container>
      </Box>
    </Box>
  );
}
