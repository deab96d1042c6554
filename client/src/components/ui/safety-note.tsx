import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import type { ReactNode } from 'react';

/** Safety wording always uses the warning colour, and nothing else does. */
export function SafetyNote({ title = 'Safety', children }: { title?: string; children: ReactNode }) {
  return (
    <Alert severity="warning" variant="outlined" role="note" sx={{ borderWidth: 2 }}>
      <AlertTitle>{title}</AlertTitle>
      {children}
    </Alert>
  );
}
