import Alert from '@mui/material/Alert';

/** A form-level message (one the server did not tie to a field). Renders nothing when there is none. */
export function FormAlert({ message }: { message: string | undefined }) {
  if (!message) return null;
  return (
    <Alert severity="error" role="alert">
      {message}
    </Alert>
  );
}
