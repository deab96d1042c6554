import Paper from '@mui/material/Paper';
import type { ReactNode } from 'react';

/** A single column card for short forms: comfortable on a phone, not stretched on a laptop. */
export function NarrowPage({ children }: { children: ReactNode }) {
  return (
    <Paper variant="outlined" sx={{ maxWidth: 480, mx: 'auto', p: { xs: 2.5, sm: 4 } }}>
      {children}
    </Paper>
  );
}
