import { createTheme } from '@mui/material/styles';

import { endgrainColors } from './endgrain-colors.js';

// WCAG 2.5.5 asks 44 × 44 CSS px for touch targets; gloved hands at a meet need no less.
const TOUCH_TARGET = 44;

export const endgrainTheme = createTheme({
  cssVariables: { colorSchemeSelector: 'data' },
  colorSchemes: {
    light: { palette: { ...endgrainColors.light, divider: 'rgba(42, 33, 26, 0.16)' } },
    dark: { palette: { ...endgrainColors.dark, divider: 'rgba(241, 232, 220, 0.16)' } },
  },
  shape: { borderRadius: 10 },
  typography: {
    fontFamily: '"Nunito Sans", system-ui, -apple-system, "Segoe UI", Roboto, sans-serif',
    h1: { fontSize: 'clamp(1.75rem, 1.3rem + 2vw, 2.5rem)', fontWeight: 700, lineHeight: 1.2 },
    h2: { fontSize: 'clamp(1.35rem, 1.15rem + 1vw, 1.75rem)', fontWeight: 700, lineHeight: 1.25 },
    h3: { fontSize: '1.25rem', fontWeight: 700 },
    button: { textTransform: 'none', fontWeight: 700, fontSize: '1rem' },
    body1: { fontSize: '1rem', lineHeight: 1.6 },
    // Alerts, hints and captions are read at arm's length on a phone: no smaller than 15 px.
    body2: { fontSize: '0.9375rem', lineHeight: 1.5 },
  },
  components: {
    MuiAppBar: { defaultProps: { elevation: 0, color: 'primary' } },
    // Long e-mail addresses wrap instead of turning the message into a scroll box.
    MuiAlert: { styleOverrides: { message: { overflow: 'visible', overflowWrap: 'anywhere', minWidth: 0 } } },
    MuiButton: { styleOverrides: { root: { minHeight: TOUCH_TARGET } } },
    MuiIconButton: { styleOverrides: { root: { minWidth: TOUCH_TARGET, minHeight: TOUCH_TARGET } } },
    MuiToggleButton: { styleOverrides: { root: { minHeight: TOUCH_TARGET, textTransform: 'none' } } },
    MuiMenuItem: { styleOverrides: { root: { minHeight: 48 } } },
    MuiListItemButton: { styleOverrides: { root: { minHeight: 48 } } },
    // Links sit in body text of a similar darkness, so the underline is what tells them apart.
    MuiLink: { defaultProps: { underline: 'always' } },
    MuiTextField: { defaultProps: { fullWidth: true } },
  },
});
