import Button from '@mui/material/Button';
import type { ReactNode } from 'react';

/** The form's main button: shows progress and refuses a second press while the request runs. */
export function SubmitButton({ pending, children }: { pending: boolean; children: ReactNode }) {
  return (
    <Button type="submit" variant="contained" size="large" fullWidth loading={pending} loadingPosition="start" disabled={pending}>
      {children}
    </Button>
  );
}
