import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import type { ReactNode } from 'react';

import { endgrainTheme } from './endgrain-theme.js';

// Where the chosen theme (device, light, dark) is remembered between visits.
export const COLOR_MODE_STORAGE_KEY = 'endgrain.colorMode';

/** Our theme, following the device until someone picks light or dark in the account menu. */
export function EndgrainThemeProvider({ children }: { children: ReactNode }) {
  return (
    <ThemeProvider
      theme={endgrainTheme}
      defaultMode="system"
      modeStorageKey={COLOR_MODE_STORAGE_KEY}
      colorSchemeStorageKey="endgrain.colorScheme"
      disableTransitionOnChange
    >
      <CssBaseline enableColorScheme />
      {children}
    </ThemeProvider>
  );
}
