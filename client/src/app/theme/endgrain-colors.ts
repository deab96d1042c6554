// Our palette: spruce greens, sawdust tans, heartwood browns; signal orange only for warnings and safety.
// Every text/background pair is checked against WCAG AA in endgrain-theme.test.ts.
export const endgrainColors = {
  light: {
    primary: { main: '#1F4D3A', light: '#3E7059', dark: '#143326', contrastText: '#FFFFFF' },
    secondary: { main: '#7A4A2A', light: '#9B6A47', dark: '#55321B', contrastText: '#FFFFFF' },
    warning: { main: '#D9620B', contrastText: '#1A0F05' },
    error: { main: '#B3261E', contrastText: '#FFFFFF' },
    info: { main: '#2D5B73', contrastText: '#FFFFFF' },
    success: { main: '#2E6B3F', contrastText: '#FFFFFF' },
    background: { default: '#F4EBDD', paper: '#FBF6EE' },
    text: { primary: '#2A211A', secondary: '#5C4E42' },
  },
  dark: {
    primary: { main: '#7FC4A0', light: '#A6D9BE', dark: '#4F9A74', contrastText: '#0E1F17' },
    secondary: { main: '#D9A877', light: '#E8C49D', dark: '#B07F4F', contrastText: '#1E1409' },
    warning: { main: '#FF9A4D', contrastText: '#1E1409' },
    error: { main: '#F2A29C', contrastText: '#2B0906' },
    info: { main: '#8CC3DE', contrastText: '#0B1C25' },
    success: { main: '#8FD0A0', contrastText: '#0E1F14' },
    background: { default: '#14110E', paper: '#1E1A16' },
    text: { primary: '#F1E8DC', secondary: '#C9B9A6' },
  },
} as const;
