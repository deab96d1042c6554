import Box from '@mui/material/Box';

/** The club's own two colours as a small flag; purely decorative, the name carries the meaning. */
export function ClubColours({ primary, secondary, size = 28 }: { primary: string; secondary: string; size?: number }) {
  return (
    <Box
      aria-hidden
      sx={{
        width: size,
        height: size,
        flexShrink: 0,
        borderRadius: '50%',
        border: 1,
        borderColor: 'divider',
        background: `linear-gradient(135deg, ${primary} 0 50%, ${secondary} 50% 100%)`,
      }}
    />
  );
}
